import fs from "node:fs";
import os from "node:os";
import path from "node:path";

/**
 * Points DATABASE_URL at a fresh temp SQLite file, runs the committed migrations and returns the
 * shared `db`. Call before importing anything that opens the database (lib/auth, lib/auth/session …).
 */
export async function useTempDatabase(label: string) {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), `knotwork-${label}-`));
  process.env.DATABASE_URL = `file:${path.join(dir, "test.db")}`;
  process.env.BETTER_AUTH_SECRET ??= "test-secret-for-vitest-only-0123456789abcdef";
  process.env.BETTER_AUTH_URL ??= "http://localhost:3000";
  process.env.__NEXT_EXPERIMENTAL_AUTH_INTERRUPTS = "true";
  const { db, dbClient } = await import("../../db");
  const { runMigrations } = await import("../../db/migrate");
  await runMigrations(db);
  return {
    db,
    client: dbClient(),
    dir,
    cleanup() {
      dbClient().close();
      fs.rmSync(dir, { recursive: true, force: true });
    },
  };
}

/** Row count of a table, for "nothing was stored" checks. */
export async function countRows(client: { execute(sql: string): Promise<{ rows: unknown[] }> }, table: string) {
  const res = await client.execute(`SELECT count(*) AS n FROM "${table}"`);
  return Number((res.rows[0] as unknown as { n: number }).n);
}
