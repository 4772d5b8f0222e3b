/**
 * Fixed-window counters kept in the database, so a limit reached through one app server is in force
 * on every other server that shares the database (an in-process Map is not). Each hit is one atomic
 * upsert (`INSERT … ON CONFLICT DO UPDATE … RETURNING`), so concurrent requests on several servers
 * never lose a count. Used for the sign-up limit per address and the per-account sign-in failures;
 * better-auth's own per-address limits use its `rateLimit.storage: "database"` (lib/auth.ts).
 * (OWASP Authentication Cheat Sheet, "Login Throttling"; better-auth docs, "Rate Limit → Storage".)
 */
import { sql } from "drizzle-orm";
import { db as appDb, type Db } from "../../db";

export interface WindowCount {
  count: number;
  /** When the window ends, ms since the epoch. */
  resetAt: number;
}

/** Rows whose window has ended are deleted about once every CLEANUP_EVERY hits. */
const CLEANUP_EVERY = 200;

/** A counter family under one scope (e.g. "sign-up"); keys are stored as "<scope>:<key>". */
export function dbCounter(scope: string, windowMs: number, database: Db = appDb) {
  const k = (key: string) => `${scope}:${key}`;
  let hits = 0;
  return {
    /** Counts one event for `key` and returns the window's count including it. */
    async hit(key: string, now: number = Date.now()): Promise<WindowCount> {
      const reset = now + windowMs;
      const rows = await database.all<{ count: number; reset_at: number }>(sql`
        insert into limit_counter (key, count, reset_at) values (${k(key)}, 1, ${reset})
        on conflict (key) do update set
          count = case when limit_counter.reset_at <= ${now} then 1 else limit_counter.count + 1 end,
          reset_at = case when limit_counter.reset_at <= ${now} then ${reset} else limit_counter.reset_at end
        returning count, reset_at`);
      if (++hits % CLEANUP_EVERY === 0) await database.run(sql`delete from limit_counter where reset_at <= ${now}`);
      const row = rows[0]!;
      return { count: Number(row.count), resetAt: Number(row.reset_at) };
    },
    /** The current window of `key`, or null when it has none (or it ended). */
    async peek(key: string, now: number = Date.now()): Promise<WindowCount | null> {
      const rows = await database.all<{ count: number; reset_at: number }>(sql`select count, reset_at from limit_counter where key = ${k(key)} and reset_at > ${now}`);
      return rows[0] ? { count: Number(rows[0].count), resetAt: Number(rows[0].reset_at) } : null;
    },
    /** Forgets `key`. */
    async clear(key: string): Promise<void> {
      await database.run(sql`delete from limit_counter where key = ${k(key)}`);
    },
  };
}

/** A limiter: `take(key)` is false once `key` has used `max` events in its window. */
export function dbRateLimiter(scope: string, max: number, windowMs: number, database?: Db) {
  const counter = dbCounter(scope, windowMs, database);
  return {
    async take(key: string, now?: number): Promise<boolean> {
      return (await counter.hit(key, now)).count <= max;
    },
  };
}

/** Failures per key: blocked once `max` failures fall in one window (the window starts at the first). */
export function dbFailureCounter(scope: string, max: number, windowMs: number, database?: Db) {
  const counter = dbCounter(scope, windowMs, database);
  return {
    /** Milliseconds until the key may try again, or 0 when it still has tries left. */
    async blockedFor(key: string, now: number = Date.now()): Promise<number> {
      const w = await counter.peek(key, now);
      return w && w.count >= max ? w.resetAt - now : 0;
    },
    fail: (key: string, now?: number) => counter.hit(key, now).then(() => undefined),
    clear: (key: string) => counter.clear(key),
  };
}
