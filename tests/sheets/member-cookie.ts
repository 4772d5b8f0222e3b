/** Signs a demo member in through better-auth and returns the Cookie header a browser would send. */
export async function memberCookie(email: string, password: string): Promise<string> {
  const { auth } = await import("../../lib/auth");
  const res = await auth.api.signInEmail({ body: { email, password }, returnHeaders: true });
  const cookies = res.headers.getSetCookie().map((c) => c.split(";")[0]);
  if (!cookies.some((c) => c.includes("session_token"))) throw new Error(`no session cookie for ${email}`);
  return cookies.join("; ");
}
