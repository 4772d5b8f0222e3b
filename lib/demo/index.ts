/**
 * The invented demo studio: one teacher, three students with hand profiles, the demo pieces and a
 * saved drill sheet with an assignment. Node only, for `npm run db:seed` / `db:reset`
 * (scripts/db-seed.ts, scripts/db-reset.ts) and the test servers; the app never imports it.
 *
 * - seed.ts: `seedDemo` (idempotent) and the demo sign-ins
 * - pieces.ts: the demo pieces read from fixtures/pieces
 * - sheet.ts: the demo drill sheet, generated like a teacher's
 */
export * from "./pieces";
export * from "./seed";
export * from "./sheet";
