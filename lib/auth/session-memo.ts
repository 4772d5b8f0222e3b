/**
 * Verified sessions remembered for a short while per exact cookie pair. With the cookie cache on,
 * better-auth answers a request from the signed `session_data` cookie without the database; checking
 * its two HMAC signatures and running the endpoint still costs about half a millisecond per request.
 * Once better-auth has accepted a given (session_token, session_data) pair, the same pair gives the
 * same answer until the copy's own expiry, so the answer is kept until then, capped at MEMO_MS.
 * Nothing stays valid longer than the cookie cache already allows (DEVELOPERS.md, "Sessions").
 */
import { Lru } from "../lru";

const MEMO_MS = 30_000;
const MAX_SESSIONS = 2_000;
const TOKEN = /(?:^|;\s*)((?:__Secure-)?better-auth\.session_token)=([^;]*)/;
const DATA = /(?:^|;\s*)((?:__Secure-)?better-auth\.session_data)=([^;]*)/;

interface Entry<S> {
  session: S;
  until: number;
}

/** The expiry written into a compact session_data copy (read only after better-auth accepted it). */
function copyExpiry(data: string): number | null {
  try {
    const json = JSON.parse(Buffer.from(decodeURIComponent(data), "base64url").toString("utf8")) as { expiresAt?: unknown };
    return typeof json.expiresAt === "number" && Number.isFinite(json.expiresAt) ? json.expiresAt : null;
  } catch {
    return null;
  }
}

/** The memo key for a Cookie header: both cookies, exactly as sent; null without a (single-chunk) copy. */
export function sessionMemoKey(cookieHeader: string | null): string | null {
  if (!cookieHeader) return null;
  const token = TOKEN.exec(cookieHeader)?.[2];
  const data = DATA.exec(cookieHeader)?.[2];
  return token && data ? `${token}\n${data}` : null;
}

/** A memo of verified sessions; `load` is better-auth's own look-up. */
export function createSessionMemo<S extends { session: { expiresAt: Date } }>(now: () => number = Date.now) {
  const entries = new Lru<string, Entry<S>>({ maxEntries: MAX_SESSIONS });
  return {
    async get(cookieHeader: string | null, load: () => Promise<S | null>): Promise<S | null> {
      const key = sessionMemoKey(cookieHeader);
      if (key) {
        const hit = entries.get(key);
        if (hit && hit.until > now()) return hit.session;
      }
      const session = await load();
      if (key && session) {
        const copyUntil = copyExpiry(key.slice(key.indexOf("\n") + 1));
        if (copyUntil !== null) {
          entries.set(key, { session, until: Math.min(copyUntil, session.session.expiresAt.getTime(), now() + MEMO_MS) });
        }
      }
      return session;
    },
  };
}
