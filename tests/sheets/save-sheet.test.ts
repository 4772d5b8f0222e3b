import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { countRows, useTempDatabase } from "../db/temp-db";
import { otherStudio, seededKnot } from "./fixture";

let t: Awaited<ReturnType<typeof useTempDatabase>>;
let sheets: typeof import("../../db/queries/sheets");
let knotQueries: typeof import("../../db/queries/knot-drills");
let gen: typeof import("../../lib/knots/generate");
let req: typeof import("../../lib/knots/generate-request");
let save: typeof import("../../lib/sheets/save");
let access: typeof import("../../lib/sheets/access");
let knotRequest: typeof import("../../lib/knots/request");
let studioId: string;
let knotId: string;
let teacherId: string;

beforeAll(async () => {
  t = await useTempDatabase("sheets");
  const seed = await import("../../lib/demo/seed");
  ({ studioId } = await seed.seedDemo(t.db));
  sheets = await import("../../db/queries/sheets");
  knotQueries = await import("../../db/queries/knot-drills");
  gen = await import("../../lib/knots/generate");
  req = await import("../../lib/knots/generate-request");
  save = await import("../../lib/sheets/save");
  access = await import("../../lib/sheets/access");
  knotRequest = await import("../../lib/knots/request");
  const knot = await seededKnot(t.db);
  knotId = knot.id;
  teacherId = knot.createdBy!;
});
afterAll(() => t.cleanup());

async function generated() {
  const src = await knotQueries.getKnotSource(t.db, studioId, knotId);
  const request = req.GenerateRequest.parse({ families: ["blocking", "note-pairs"] });
  return { request, out: gen.generateForKnot(src!, request) };
}

describe("saving a drill sheet", () => {
  test("stores the picked drills in the teacher's order with their notes, tempo goals and MusicXML", async () => {
    const { out } = await generated();
    expect(out.drills.length).toBeGreaterThanOrEqual(3);
    const order = [out.drills[2].key, out.drills[0].key, out.drills[1].key];
    const rows = save.pickedDrills(out, order.map((key, i) => ({ key, studentNote: `note ${i}`, tempo: { start: 50 + i, target: 90 } })));
    const id = await sheets.saveSheet(t.db, { studioId, createdBy: teacherId, passageId: knotId, title: "Even thumbs", drills: rows });
    const sheet = await sheets.getSheet(t.db, studioId, id);
    expect(sheet!.drills.map((d) => d.position)).toEqual([0, 1, 2]);
    expect(sheet!.drills.map((d) => `${d.family}:${d.variant}:0`)).toEqual(order);
    expect(sheet!.drills.map((d) => d.studentNote)).toEqual(["note 0", "note 1", "note 2"]);
    expect(sheet!.drills[1].meta.tempo).toEqual({ start: 51, target: 90 });
    // A stored score-partwise document, independent of later generator changes (MusicXML 4.0 root element).
    for (const d of sheet!.drills) expect(d.musicxml).toMatch(/<score-partwise[\s>]/);
  });

  test("is all-or-nothing: a failing drill insert leaves no sheet row and no drill rows", async () => {
    const { out } = await generated();
    const rows = save.pickedDrills(out, out.drills.slice(0, 2).map((d) => ({ key: d.key, studentNote: "", tempo: { start: 60, target: 80 } })));
    const before = [await countRows(t.client, "sheet"), await countRows(t.client, "sheet_drill")];
    // The second drill breaks the NOT NULL constraint on sheet_drill.musicxml.
    const broken = [rows[0], { ...rows[1], musicxml: null as unknown as string }];
    await expect(
      sheets.saveSheet(t.db, { studioId, createdBy: teacherId, passageId: knotId, title: "Half saved", drills: broken }),
    ).rejects.toThrow();
    expect([await countRows(t.client, "sheet"), await countRows(t.client, "sheet_drill")]).toEqual(before);
  });

  test("a pick that matches no generated drill is refused with a clear message", async () => {
    const { out } = await generated();
    expect(() => save.pickedDrills(out, [{ key: "blocking:nope:0", studentNote: "", tempo: { start: 60, target: 80 } }])).toThrow(/not among the generated drills/);
  });
});

describe("request validation", () => {
  test("unknown families are named in the message", () => {
    const r = req.GenerateRequest.safeParse({ families: ["blocking", "juggling"] });
    expect(r.success).toBe(false);
    expect(req.requestProblems(r.error!)).toContain('Unknown drill family "juggling".');
  });

  test("bad options are checked by the family's own schema and name the option", () => {
    const r = req.GenerateRequest.safeParse({ families: ["blocking"], options: { blocking: { groupBy: "every-other-tuesday" } } });
    expect(r.success).toBe(false);
    const lines = req.requestProblems(r.error!);
    expect(lines.some((l) => l.includes("groupBy"))).toBe(true);
    expect(r.error!.issues[0].path.slice(0, 3)).toEqual(["options", "blocking", "groupBy"]);
  });

  test("good options pass and keep the family's defaults", () => {
    const r = req.GenerateRequest.safeParse({ families: ["blocking"], options: { blocking: { groupBy: "bar" } } });
    expect(r.success).toBe(true);
  });

  test("a sheet needs a name and at least one drill", () => {
    const r = save.SaveSheetRequest.safeParse({ knotId, title: "  ", request: { families: ["blocking"] }, drills: [] });
    expect(r.success).toBe(false);
    const lines = req.requestProblems(r.error!);
    expect(lines).toContain("Give the sheet a name.");
    expect(lines).toContain("Pick at least one drill.");
  });
});

describe("studio scope", () => {
  test("another studio's knot and sheet are not found; the owner's are", async () => {
    const elsewhere = await otherStudio(t.db);
    const [first] = await sheets.listSheets(t.db, studioId);
    expect(await knotQueries.getKnotSource(t.db, elsewhere, knotId)).toBeNull();
    expect(await knotQueries.getKnotSource(t.db, studioId, knotId)).not.toBeNull();
    expect(await sheets.getSheet(t.db, elsewhere, first.id)).toBeNull();
    expect(await knotRequest.drillsForStudioKnot(elsewhere, knotId, req.GenerateRequest.parse({ families: ["blocking"] }))).toBeNull();
    expect(await access.canReadSheet({ role: "teacher", studioId: elsewhere, membershipId: "x" }, first.id)).toBe(false);
    expect(await access.canReadSheet({ role: "teacher", studioId, membershipId: "x" }, first.id)).toBe(true);
    expect(await access.canReadSheet({ role: "teacher", studioId, membershipId: "x" }, "no-such-sheet")).toBe(false);
  });
});
