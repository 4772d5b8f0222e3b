/**
 * The Origin rule for every request that can change data (anything but GET, HEAD and OPTIONS), checked
 * in proxy.ts before any route handler or server action runs: the Origin header must be present and be
 * one of Knotwork's own origins (BETTER_AUTH_URL, plus its localhost / 127.0.0.1 twin for a local demo,
 * the same list better-auth's `trustedOrigins` gets in lib/auth.ts). A missing, "null" or foreign
 * Origin is refused with 403. Browsers send Origin on every non-GET fetch and form post.
 * (OWASP Cross-Site Request Forgery Prevention Cheat Sheet, "Verifying Origin With Standard Headers";
 * better-auth docs, "Security → Trusted origins / CSRF protection".)
 */

const SAFE_METHODS = new Set(["GET", "HEAD", "OPTIONS"]);

/** The configured origin and its localhost / 127.0.0.1 twin. */
export function ownOrigins(baseURL: string): string[] {
  const url = new URL(baseURL);
  const twin = new URL(baseURL);
  if (url.hostname === "localhost") twin.hostname = "127.0.0.1";
  else if (url.hostname === "127.0.0.1") twin.hostname = "localhost";
  else return [url.origin];
  return [url.origin, twin.origin];
}

/**
 * Why a request must be refused, or null when it may go on.
 *
 * @example
 * originProblem("POST", null, ["http://localhost:3000"]); // "This request has no Origin header …"
 * originProblem("POST", "http://localhost:3000", ["http://localhost:3000"]); // null
 */
export function originProblem(method: string, origin: string | null, allowed: readonly string[]): string | null {
  if (SAFE_METHODS.has(method.toUpperCase())) return null;
  if (!origin || origin === "null") return "This request has no Origin header, so Knotwork cannot tell that it comes from its own pages.";
  let normalized: string;
  try {
    normalized = new URL(origin).origin;
  } catch {
    return "This request's Origin header is not a valid origin.";
  }
  if (normalized !== origin || !allowed.includes(normalized)) return "This request comes from another site; Knotwork only accepts changes from its own pages.";
  return null;
}
