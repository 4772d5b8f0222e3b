/**
 * Runs once when the server starts. In the Node runtime it makes X-Forwarded-For trustworthy before
 * any request reaches Next: the socket address unless TRUSTED_PROXY names the proxy in front
 * (lib/security/client-address.ts).
 */
export async function register(): Promise<void> {
  if (process.env.NEXT_RUNTIME !== "nodejs") return;
  const { installClientAddress } = await import("./lib/security/install-client-address");
  installClientAddress();
}
