/**
 * A per-account sign-in limit that does not depend on the caller's address: better-auth's own
 * limiter (and lib/auth/rate-limit) key on the first X-Forwarded-For address, which a client can change
 * on every request. Here failed passwords are counted per e-mail address in a fixed window; once an
 * address has used up its tries, every sign-in for it (even with the right password) answers 429
 * until the window ends. A successful sign-in clears the count. Kept in the database
 * (lib/limits/counter.ts), so the count holds across app servers sharing it.
 */
import { APIError, createAuthMiddleware, isAPIError } from "better-auth/api";
import { dbFailureCounter } from "../limits/counter";

/** Failed sign-ins allowed per e-mail address and window (common practice: about 10 per 15 minutes). */
export const SIGN_IN_FAILURES_MAX = 10;
export const SIGN_IN_FAILURE_WINDOW_MS = 15 * 60 * 1000;
const MAX_TRACKED = 50_000;

export const TOO_MANY_FAILURES_MESSAGE = "Too many wrong passwords for this account. Please wait 15 minutes or reset your password.";

interface Failures {
  count: number;
  resetAt: number;
}

/** Counts failures per key in fixed windows. */
export function createFailureCounter(max: number, windowMs: number) {
  const entries = new Map<string, Failures>();
  const live = (key: string, now: number) => {
    const e = entries.get(key);
    if (e && e.resetAt <= now) {
      entries.delete(key);
      return undefined;
    }
    return e;
  };
  return {
    /** Milliseconds until the key may try again, or 0 when it still has tries left. */
    blockedFor(key: string, now: number = Date.now()): number {
      const e = live(key, now);
      return e && e.count >= max ? e.resetAt - now : 0;
    },
    /** Records one failure (the window starts at the first failure). */
    fail(key: string, now: number = Date.now()): void {
      const e = live(key, now);
      if (e) {
        e.count += 1;
        return;
      }
      if (entries.size >= MAX_TRACKED) {
        for (const [k, v] of entries) if (v.resetAt <= now) entries.delete(k);
        // Still full: forget the oldest windows first (Map keeps insertion order).
        for (const k of entries.keys()) {
          if (entries.size < MAX_TRACKED) break;
          entries.delete(k);
        }
      }
      entries.set(key, { count: 1, resetAt: now + windowMs });
    },
    /** Forgets the key (after a successful sign-in). */
    clear(key: string): void {
      entries.delete(key);
    },
  };
}

// In the database, so the count holds across app servers (lib/limits/counter.ts); createFailureCounter above is the in-memory model of the same rule.
const failures = dbFailureCounter("sign-in-failures", SIGN_IN_FAILURES_MAX, SIGN_IN_FAILURE_WINDOW_MS);

/** The e-mail address a sign-in body names, normalised as better-auth stores it (lower case). */
function emailOf(body: unknown): string | null {
  const email = (body as { email?: unknown } | null)?.email;
  return typeof email === "string" && email.trim() ? email.trim().toLowerCase() : null;
}

const SIGN_IN_PATH = "/sign-in/email";

/** better-auth `hooks`: refuse a locked account before the password is checked, count the outcome after. */
export const signInLimitHooks = {
  before: createAuthMiddleware(async (ctx) => {
    if (ctx.path !== SIGN_IN_PATH) return;
    const email = emailOf(ctx.body);
    if (!email) return;
    const wait = await failures.blockedFor(email);
    if (wait > 0) {
      throw new APIError("TOO_MANY_REQUESTS", { message: TOO_MANY_FAILURES_MESSAGE, code: "TOO_MANY_FAILED_SIGN_INS" }, { "Retry-After": String(Math.ceil(wait / 1000)) });
    }
  }),
  after: createAuthMiddleware(async (ctx) => {
    if (ctx.path !== SIGN_IN_PATH) return;
    const email = emailOf(ctx.body);
    if (!email) return;
    const returned = ctx.context.returned;
    if (isAPIError(returned)) {
      // 401: better-auth's INVALID_EMAIL_OR_PASSWORD (unknown e-mail or wrong password alike).
      if (returned.statusCode === 401) await failures.fail(email);
    } else if (returned !== undefined) {
      await failures.clear(email);
    }
  }),
};
