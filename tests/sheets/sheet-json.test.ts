/**
 * GET /api/sheets/:id: the sheet's JSON for the studio's teacher and the student it is assigned
 * to; every other member gets 404 (nothing about the sheet leaks) and a signed-out caller 401.
 */
import { asc, eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, test, vi } from "vitest";
import { useTempDatabase } from "../db/temp-db";
import { memberCookie } from "./member-cookie";

const request = vi.hoisted(() => ({ headers: new Headers() }));
vi.mock("next/headers", () => ({
  headers: async () => request.headers,
  cookies: async () => ({ get: () => undefined, getAll: () => [], set: () => undefined, delete: () => undefined }),
}));

let t: Awaited<ReturnType<typeof useTempDatabase>>;
let route: typeof import("../../app/api/sheets/[sheetId]/route");
let schema: typeof import("../../db/schema");
let seed: typeof import("../../lib/demo/seed");
let sheetId: string;
const cookies: Record<"teacher" | "assigned" | "unassigned" | "otherTeacher", string> = { teacher: "", assigned: "", unassigned: "", otherTeacher: "" };

beforeAll(async () => {
  t = await useTempDatabase("sheet-json");
  seed = await import("../../lib/demo/seed");
  await seed.seedDemo(t.db);
  schema = await import("../../db/schema");
  route = await import("../../app/api/sheets/[sheetId]/route");
  const [row] = await t.db.select({ id: schema.sheet.id }).from(schema.sheet).limit(1);
  sheetId = row!.id;
  const { createTeacherAccount } = await import("../../lib/auth/teacher-sign-up");
  const other = await createTeacherAccount(t.db, { name: "Ivo Marlow", email: "ivo@elsewhere.test", password: "another-studio", studioName: "Quillon Keys" });
  if (!other.ok) throw new Error(other.message);
  cookies.teacher = await memberCookie(seed.DEMO_TEACHER.email, seed.DEMO_PASSWORD);
  cookies.assigned = await memberCookie(seed.DEMO_STUDENTS[0].email, seed.DEMO_PASSWORD);
  cookies.unassigned = await memberCookie(seed.DEMO_STUDENTS[1].email, seed.DEMO_PASSWORD);
  cookies.otherTeacher = await memberCookie("ivo@elsewhere.test", "another-studio");
});
afterAll(() => t.cleanup());

async function get(who: keyof typeof cookies | "anonymous", id = sheetId, query = "") {
  request.headers = new Headers(who === "anonymous" ? {} : { cookie: cookies[who] });
  const res = await route.GET(new Request(`http://localhost/api/sheets/${id}${query}`), { params: Promise.resolve({ sheetId: id }) });
  return { status: res.status, body: await res.json() };
}

async function storedDrills() {
  return t.db.select().from(schema.sheetDrill).where(eq(schema.sheetDrill.sheetId, sheetId)).orderBy(asc(schema.sheetDrill.position));
}

describe("sheet JSON", () => {
  test("the teacher gets title, knot, piece and the drills in order with metadata, without MusicXML", async () => {
    const { status, body } = await get("teacher");
    expect(status).toBe(200);
    const stored = await storedDrills();
    expect(body.sheet.title).toBe("Even triplets, bars 1–2");
    expect(body.sheet.knot).toMatchObject({ fromBar: 1, toBar: 2, hand: "right" });
    expect(body.sheet.knot.piece.title).toBeTruthy();
    expect(body.sheet.drills.map((d: { id: string }) => d.id)).toEqual(stored.map((d) => d.id));
    expect(body.sheet.drills.map((d: { position: number }) => d.position)).toEqual(stored.map((_, i) => i));
    for (const [i, d] of body.sheet.drills.entries()) {
      expect(d.meta).toEqual(stored[i].meta);
      expect(d.tempoGoal).toEqual({ start: stored[i].meta.tempo?.start ?? null, target: stored[i].meta.tempo?.target ?? null });
      expect(d).not.toHaveProperty("musicxml");
      expect(d).toHaveProperty("teacherNote");
    }
  });

  test("?include=musicxml adds each drill's stored MusicXML", async () => {
    const { body } = await get("teacher", sheetId, "?include=musicxml");
    const stored = await storedDrills();
    expect(body.sheet.drills.map((d: { musicxml: string }) => d.musicxml)).toEqual(stored.map((d) => d.musicxml));
    // A score-partwise document (MusicXML 4.0 root element).
    expect(body.sheet.drills[0].musicxml).toMatch(/<score-partwise[\s>]/);
  });

  test("the assigned student gets it with her assignment's tempo goals and without the teacher's notes", async () => {
    const { status, body } = await get("assigned");
    expect(status).toBe(200);
    const [a] = await t.db.select().from(schema.assignment).where(eq(schema.assignment.sheetId, sheetId));
    expect(body.sheet.assignment).toEqual({ id: a.id, dueDate: a.dueDate });
    for (const d of body.sheet.drills) {
      expect(d).not.toHaveProperty("teacherNote");
      if (a.tempoGoals[d.id] !== undefined) expect(d.tempoGoal.target).toBe(a.tempoGoals[d.id]);
    }
    expect(body.sheet.drills.some((d: { id: string }) => a.tempoGoals[d.id] !== undefined)).toBe(true);
  });

  test("a student of the studio without the sheet, a teacher of another studio and an unknown id get 404", async () => {
    for (const who of ["unassigned", "otherTeacher"] as const) {
      const res = await get(who);
      expect(res.status, who).toBe(404);
      expect(JSON.stringify(res.body)).not.toContain("Even triplets");
    }
    expect((await get("teacher", crypto.randomUUID())).status).toBe(404);
  });

  test("a sheet without drills (and without a knot) answers with an empty list", async () => {
    const [teacher] = await t.db.select().from(schema.sheet).where(eq(schema.sheet.id, sheetId));
    const id = crypto.randomUUID();
    await t.db.insert(schema.sheet).values({ id, studioId: teacher.studioId, passageId: null, title: "Blank page", createdBy: teacher.createdBy });
    const { status, body } = await get("teacher", id);
    expect(status).toBe(200);
    expect(body.sheet).toMatchObject({ title: "Blank page", knot: null, drills: [] });
  });

  test("a signed-out caller gets 401", async () => {
    expect((await get("anonymous")).status).toBe(401);
  });
});
