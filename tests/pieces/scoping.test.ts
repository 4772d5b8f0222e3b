// Route handlers and queries for pieces and knots only ever see the caller's studio: another
// studio's id answers 404 and changes nothing.
import fs from "node:fs";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, test, vi } from "vitest";
import { countRows, useTempDatabase } from "../db/temp-db";
import { makeStudio, pieceFile, type Studio } from "./studio-fixtures";

const session = vi.hoisted(() => ({ current: null as null | { studioId: string; userId: string; role: "teacher" | "student" } }));
vi.mock("@/lib/auth/session", () => ({
  getStudioContext: async () =>
    session.current && {
      user: { id: session.current.userId, name: "Test", email: "t@knotwork.test" },
      studioId: session.current.studioId,
      studioName: "Test",
      membershipId: "m",
      role: session.current.role,
    },
}));
vi.mock("next/cache", () => ({ revalidatePath: () => undefined }));

type Env = Awaited<ReturnType<typeof useTempDatabase>>;
let env: Env;
let a: Studio;
let b: Studio;
let pieceOfA: string;
let knotOfA: string;
let list: typeof import("../../app/api/pieces/route");
let one: typeof import("../../app/api/pieces/[pieceId]/route");
let passages: typeof import("../../db/queries/passages");
let scores: typeof import("../../db/queries/scores");

const params = (pieceId: string) => ({ params: Promise.resolve({ pieceId }) });
const as = (s: Studio, role: "teacher" | "student" = "teacher") => (session.current = { ...s, role });

function uploadRequest(file: File) {
  const form = new FormData();
  form.append("file", file);
  form.append("confirm", "yes");
  return new Request("http://localhost/api/pieces", { method: "POST", body: form });
}

beforeAll(async () => {
  env = await useTempDatabase("pieces-scoping");
  process.env.UPLOADS_DIR = path.join(env.dir, "uploads");
  list = await import("../../app/api/pieces/route");
  one = await import("../../app/api/pieces/[pieceId]/route");
  passages = await import("../../db/queries/passages");
  scores = await import("../../db/queries/scores");
  a = await makeStudio(env.db, "Ashgrove Studio", "ash@knotwork.test");
  b = await makeStudio(env.db, "Birchlow Studio", "birch@knotwork.test");
  as(a);
  const res = await list.POST(uploadRequest(pieceFile("pebble-study.musicxml")));
  expect(res.status).toBe(201);
  pieceOfA = ((await res.json()) as { id: string }).id;
  knotOfA = (await passages.insertPassage(env.db, { studioId: a.studioId, scoreId: pieceOfA, createdBy: a.userId, part: "P1", hand: "right", fromBar: 1, toBar: 2, tags: ["evenness"], note: null }))!;
});
afterAll(() => env?.cleanup());

describe("pieces route handlers", () => {
  test("anonymous callers get 401 and students 403, before anything is read", async () => {
    session.current = null;
    expect((await list.GET()).status).toBe(401);
    expect((await one.DELETE(new Request("http://x"), params(pieceOfA))).status).toBe(401);
    as(a, "student");
    expect((await list.POST(uploadRequest(pieceFile("two-ribbons.musicxml")))).status).toBe(403);
    expect(await countRows(env.client, "score")).toBe(1);
  });

  test("the list holds only the caller's pieces, with knot counts", async () => {
    as(a);
    const mine = (await (await list.GET()).json()) as { pieces: { id: string; knots: number }[] };
    expect(mine.pieces).toEqual([expect.objectContaining({ id: pieceOfA, knots: 1 })]);
    as(b);
    expect(((await (await list.GET()).json()) as { pieces: unknown[] }).pieces).toEqual([]);
  });

  test("another studio's piece id gives 404 for reading and deleting, and nothing is removed", async () => {
    as(b);
    expect((await one.GET(new Request("http://x"), params(pieceOfA))).status).toBe(404);
    expect((await one.DELETE(new Request("http://x"), params(pieceOfA))).status).toBe(404);
    expect(await countRows(env.client, "score")).toBe(1);
    expect(await countRows(env.client, "passage")).toBe(1);
    as(a);
    const own = await one.GET(new Request("http://x"), params(pieceOfA));
    expect(own.status).toBe(200);
    expect(await own.text()).toContain("<score-partwise");
  });

  test("a request that is not multipart is refused with 415", async () => {
    as(a);
    const res = await list.POST(new Request("http://localhost/api/pieces", { method: "POST", body: "<score-partwise/>", headers: { "content-type": "application/xml" } }));
    expect(res.status).toBe(415);
  });
});

describe("knot queries", () => {
  test("another studio cannot read, list or attach knots to a piece it does not own", async () => {
    expect(await passages.getPassage(env.db, b.studioId, knotOfA)).toBeNull();
    expect(await passages.listPassagesForScore(env.db, b.studioId, pieceOfA)).toEqual([]);
    expect(await passages.listPassages(env.db, b.studioId)).toEqual([]);
    const id = await passages.insertPassage(env.db, { studioId: b.studioId, scoreId: pieceOfA, createdBy: b.userId, part: "P1", hand: "left", fromBar: 1, toBar: 1, tags: [], note: null });
    expect(id).toBeNull();
    expect(await scores.getScore(env.db, b.studioId, pieceOfA)).toBeNull();
  });
});

describe("deleting a piece", () => {
  test("removes the row, its knots (schema: passage.score_id on delete cascade) and the stored file", async () => {
    as(a);
    const impact = await scores.scoreDeletionImpact(env.db, a.studioId, pieceOfA);
    expect(impact).toEqual({ knots: 1, sheets: 0 });
    const uploads = process.env.UPLOADS_DIR!;
    expect(fs.readdirSync(uploads)).toHaveLength(1);
    const res = await one.DELETE(new Request("http://x"), params(pieceOfA));
    expect(res.status).toBe(200);
    expect(await countRows(env.client, "score")).toBe(0);
    expect(await countRows(env.client, "passage")).toBe(0);
    expect(fs.readdirSync(uploads)).toHaveLength(0);
    expect((await one.GET(new Request("http://x"), params(pieceOfA))).status).toBe(404);
  });
});
