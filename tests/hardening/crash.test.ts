/**
 * Crash safety, CI size: five SIGKILLs of the production server during concurrent writes (save
 * sheet, assign, log practice); after each restart the database is intact, every acknowledged write
 * is there and nothing is half saved. `npm run crash` runs the full 50.
 */
import { describe, expect, test } from "vitest";
import { check, crashTest } from "../../scripts/crash-test";

describe("crash safety", () => {
  test("five kills at random moments lose no acknowledged write and leave nothing half saved", async () => {
    const lines: string[] = [];
    // The suite's global set-up built the app; never rebuild under the running server.
    const acks = await crashTest(5, (l) => lines.push(l), { build: false });
    expect(lines).toHaveLength(5);
    // The load really wrote through every path before the kills.
    expect(acks.sheets.length).toBeGreaterThan(0);
    expect(acks.assignmentBatches.length).toBeGreaterThan(0);
    expect(acks.practice.length).toBeGreaterThan(0);
  });
});

describe("the crash checker itself", () => {
  test("reports a half-saved sheet, a half-saved assignment batch and lost acknowledged writes", async () => {
    const fs = await import("node:fs");
    const os = await import("node:os");
    const path = await import("node:path");
    const { createClient } = await import("@libsql/client");
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), "knotwork-crash-check-"));
    const url = `file:${path.join(dir, "check.db")}`;
    const db = createClient({ url });
    await db.executeMultiple(`
      create table sheet (id text primary key, title text);
      create table sheet_drill (id text primary key, sheet_id text);
      create table assignment (id text primary key, note text);
      create table practice_entry (id text primary key, comment text);
      insert into sheet values ('s1', 'crash sheet 1-0'), ('s2', 'crash sheet 1-1');
      insert into sheet_drill values ('d1', 's1'), ('d2', 's1'), ('d3', 's1'), ('d4', 's2');
      insert into assignment values ('a1', 'crash batch 1-2');
    `);
    db.close();
    const problems = await check(url, { sheets: ["s1", "s9"], assignmentBatches: [{ note: "crash batch 1-3", ids: ["a7", "a8"] }], practice: ["p1"], attempts: 4 });
    fs.rmSync(dir, { recursive: true, force: true });
    expect(problems).toEqual(
      expect.arrayContaining([
        expect.stringContaining("sheet s9 is missing"),
        expect.stringContaining("sheet s2 is half saved: 1 of 3"),
        expect.stringContaining('batch "crash batch 1-2" is half saved: 1 of 2'),
        expect.stringContaining("assignment a7 is missing"),
        expect.stringContaining("practice entry p1 is missing"),
      ]),
    );
    expect(problems.some((p) => p.includes("s1"))).toBe(false);
  });
});
