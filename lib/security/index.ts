/**
 * Request security around the auth service: which address a request comes from (the socket, unless
 * TRUSTED_PROXY names the proxy), the Origin rule for every request that can change data (checked in
 * proxy.ts), and what a password reset revokes. Server only; proxy.ts and instrumentation.ts import
 * the single files they need.
 *
 * - client-address.ts / install-client-address.ts: the X-Forwarded-For rewrite
 * - origin.ts: `originProblem(method, origin)`, `ownOrigins(baseURL)`
 * - password-reset.ts: `afterPasswordReset` (voids the account's other reset links)
 */
import "server-only";

export * from "./client-address";
export * from "./origin";
export * from "./password-reset";
