import fs from "node:fs";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { countRows, useTempDatabase } from "./temp-db";

let t: Awaited<ReturnType<typeof useTempDatabase>>;
let seed: typeof import("../../lib/demo/seed");

beforeAll(async () => {
  t = await useTempDatabase("seed");
  seed = await import("../../lib/demo/seed");
});
afterAll(() => t.cleanup());

const piecesDir = path.resolve(__dirname, "../../fixtures/pieces");

describe("demo seed", () => {
  test("is idempotent: a second run adds nothing", async () => {
    await seed.seedDemo(t.db);
    const tables = ["user", "account", "studio", "membership", "hand_profile", "score", "passage"];
    const first = await Promise.all(tables.map((x) => countRows(t.client, x)));
    await seed.seedDemo(t.db);
    const second = await Promise.all(tables.map((x) => countRows(t.client, x)));
    expect(second).toEqual(first);
    expect(first[tables.indexOf("studio")]).toBe(1);
    expect(first[tables.indexOf("membership")]).toBe(1 + seed.DEMO_STUDENTS.length);
  });

  test("students have hand profiles; the demo sign-ins work", async () => {
    const profiles = await t.client.execute(
      "SELECT u.email, h.span_mm, h.octave_mm FROM hand_profile h JOIN membership m ON m.id = h.membership_id JOIN user u ON u.id = m.user_id WHERE m.role = 'student' ORDER BY h.span_mm",
    );
    expect(profiles.rows.map((r) => Number((r as unknown as { span_mm: number }).span_mm))).toEqual([178, 203, 216]);
    const { auth } = await import("../../lib/auth");
    for (const email of [seed.DEMO_TEACHER.email, seed.DEMO_STUDENTS[0].email]) {
      const res = await auth.api.signInEmail({ body: { email, password: seed.DEMO_PASSWORD } });
      expect(res.user.email).toBe(email);
    }
  });

  test("stores every demo piece's MusicXML as-is with a bar count from its measures", async () => {
    const files = fs.existsSync(piecesDir) ? fs.readdirSync(piecesDir).filter((f) => f.endsWith(".musicxml")) : [];
    expect(await countRows(t.client, "score")).toBe(files.length);
    for (const file of files) {
      const xml = fs.readFileSync(path.join(piecesDir, file), "utf8");
      const res = await t.client.execute({ sql: "SELECT musicxml, bars, title FROM score WHERE original_name = ?", args: [file] });
      const row = res.rows[0] as unknown as { musicxml: string; bars: number; title: string };
      expect(row.musicxml).toBe(xml);
      // MusicXML 4.0: a <measure implicit="yes"> is a pickup and does not count as a bar number (spec, measure element).
      const firstPart = xml.split(/<part\s+id=/)[1].split("</part>")[0];
      const counted = (firstPart.match(/<measure\b/g) ?? []).length - (firstPart.match(/<measure\b[^>]*implicit="yes"/g) ?? []).length;
      expect(Number(row.bars)).toBe(counted);
      expect(row.title.length).toBeGreaterThan(0);
    }
  });
});
