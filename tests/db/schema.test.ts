import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { countRows, useTempDatabase } from "./temp-db";

let t: Awaited<ReturnType<typeof useTempDatabase>>;
beforeAll(async () => {
  t = await useTempDatabase("schema");
});
afterAll(() => t.cleanup());

const APP_TABLES = [
  "studio", "membership", "hand_profile", "score", "passage", "sheet", "sheet_drill",
  "assignment", "practice_entry", "invitation", "outbox",
];
const AUTH_TABLES = ["user", "session", "account", "verification"];

async function columns(table: string): Promise<string[]> {
  const res = await t.client.execute(`PRAGMA table_info("${table}")`);
  return res.rows.map((r) => String((r as unknown as { name: string }).name));
}

describe("db schema", () => {
  test("migrations create every app and better-auth table", async () => {
    const res = await t.client.execute("SELECT name FROM sqlite_master WHERE type = 'table'");
    const names = res.rows.map((r) => String((r as unknown as { name: string }).name));
    for (const table of [...APP_TABLES, ...AUTH_TABLES]) expect(names).toContain(table);
  });

  test("better-auth columns match the fields better-auth 1.7 reads and writes", async () => {
    // Field list from better-auth 1.7's getAuthTables (@better-auth/core db/get-tables), snake_cased.
    expect(await columns("user")).toEqual(
      expect.arrayContaining(["id", "name", "email", "email_verified", "image", "created_at", "updated_at"]),
    );
    expect(await columns("session")).toEqual(
      expect.arrayContaining(["id", "expires_at", "token", "ip_address", "user_agent", "user_id"]),
    );
    expect(await columns("account")).toEqual(
      expect.arrayContaining(["account_id", "provider_id", "user_id", "password", "access_token", "scope"]),
    );
    expect(await columns("verification")).toEqual(
      expect.arrayContaining(["identifier", "value", "expires_at"]),
    );
  });

  test("every studio or user key column is the first column of some index", async () => {
    const keyColumns = /^(studio_id|user_id|membership_id|student_membership_id|score_id|sheet_id|passage_id|assignment_id|created_by|uploaded_by|invited_by)$/;
    for (const table of [...APP_TABLES, "session", "account"]) {
      const idx = await t.client.execute(`PRAGMA index_list("${table}")`);
      const firstCols = new Set<string>();
      for (const row of idx.rows) {
        const name = String((row as unknown as { name: string }).name);
        const info = await t.client.execute(`PRAGMA index_info("${name}")`);
        const first = info.rows.find((r) => Number((r as unknown as { seqno: number }).seqno) === 0);
        if (first) firstCols.add(String((first as unknown as { name: string }).name));
      }
      for (const col of await columns(table)) {
        if (keyColumns.test(col)) {
          expect(firstCols, `${table}.${col} needs an index`).toContain(col);
        }
      }
    }
  });

  test("foreign keys are enforced and WAL is on for file databases", async () => {
    const fk = await t.client.execute("PRAGMA foreign_keys");
    expect(Number(Object.values(fk.rows[0] as object)[0])).toBe(1);
    const jm = await t.client.execute("PRAGMA journal_mode");
    expect(String(Object.values(jm.rows[0] as object)[0]).toLowerCase()).toBe("wal");
    await expect(
      t.client.execute(
        "INSERT INTO membership (id, studio_id, user_id, role) VALUES ('m1', 'no-such-studio', 'no-such-user', 'teacher')",
      ),
    ).rejects.toThrow(/FOREIGN KEY/);
  });

  test("deleting a studio cascades to its scores and passages; membership is unique per user and studio", async () => {
    const c = t.client;
    await c.execute("INSERT INTO studio (id, name) VALUES ('s1', 'Quince Row Studio')");
    await c.execute("INSERT INTO user (id, name, email) VALUES ('u1', 'Teacher One', 'one@knotwork.test')");
    await c.execute("INSERT INTO membership (id, studio_id, user_id, role) VALUES ('m1', 's1', 'u1', 'teacher')");
    await expect(
      c.execute("INSERT INTO membership (id, studio_id, user_id, role) VALUES ('m2', 's1', 'u1', 'student')"),
    ).rejects.toThrow(/UNIQUE/);
    await c.execute(
      "INSERT INTO score (id, studio_id, title, bars, parts, musicxml) VALUES ('sc1', 's1', 'Study', 8, '[]', '<score-partwise/>')",
    );
    await c.execute(
      "INSERT INTO passage (id, studio_id, score_id, part, hand, from_bar, to_bar) VALUES ('p1', 's1', 'sc1', 'P1', 'right', 2, 3)",
    );
    const before = await countRows(c, "passage");
    await c.execute("DELETE FROM studio WHERE id = 's1'");
    expect(await countRows(c, "score")).toBe(0);
    expect(await countRows(c, "passage")).toBe(before - 1);
    expect(await countRows(c, "membership")).toBe(0);
    expect(await countRows(c, "user")).toBe(1);
  });
});
