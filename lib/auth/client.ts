/**
 * Browser-side calls to the auth routes under /api/auth as plain same-origin POSTs, so pages that
 * only sign in, sign out or reset a password do not ship the full auth client. The browser sends the
 * Origin header the auth server checks; cookies are set by the response.
 */
export interface AuthAnswer {
  ok: boolean;
  status: number;
}

/** POSTs a JSON body to `/api/auth/<path>`; a network failure answers with status 0. */
export async function authRequest(path: string, body: Record<string, unknown> = {}): Promise<AuthAnswer> {
  try {
    const res = await fetch(`/api/auth/${path}`, {
      method: "POST",
      headers: { "content-type": "application/json", accept: "application/json" },
      credentials: "same-origin",
      body: JSON.stringify(body),
    });
    return { ok: res.ok, status: res.status };
  } catch {
    return { ok: false, status: 0 };
  }
}
