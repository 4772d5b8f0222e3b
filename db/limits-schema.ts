/**
 * Counters that must hold across app servers sharing one database: better-auth's rate limits
 * (`rateLimit`, the table its `rateLimit.storage: "database"` reads and writes, fields as its schema
 * names them) and Knotwork's own fixed-window counters (`limit_counter`: the per-account sign-in
 * failures and the sign-up limit, lib/limits/counter.ts).
 */
import { integer, sqliteTable, text } from "drizzle-orm/sqlite-core";

/** better-auth 1.7 rate-limit rows: one per (address, path) key; `lastRequest` in ms since the epoch. */
export const rateLimit = sqliteTable("rate_limit", {
  id: text("id").primaryKey(),
  key: text("key").notNull().unique(),
  count: integer("count").notNull(),
  lastRequest: integer("last_request").notNull(),
});

/** A fixed-window counter: `key` is "<scope>:<subject>", `resetAt` in ms since the epoch. */
export const limitCounter = sqliteTable("limit_counter", {
  key: text("key").primaryKey(),
  count: integer("count").notNull(),
  resetAt: integer("reset_at").notNull(),
});
