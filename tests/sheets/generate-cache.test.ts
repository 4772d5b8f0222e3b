/**
 * The generate handler answers from its cache only while the knot, its piece, the request and the
 * hand are unchanged, and the cached answer is byte-for-byte what a fresh generation gives.
 */
import { eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, test, vi } from "vitest";
import { useTempDatabase } from "../db/temp-db";
import { memberCookie } from "./member-cookie";
import { seededKnot } from "./fixture";

const request = vi.hoisted(() => ({ headers: new Headers() }));
vi.mock("next/headers", () => ({
  headers: async () => request.headers,
  cookies: async () => ({ get: () => undefined, getAll: () => [], set: () => undefined, delete: () => undefined }),
}));

let t: Awaited<ReturnType<typeof useTempDatabase>>;
let route: typeof import("../../app/api/knots/[knotId]/drills/route");
let gen: typeof import("../../lib/knots/generate");
let cache: typeof import("../../lib/knots/cache");
let knotQueries: typeof import("../../db/queries/knot-drills");
let schema: typeof import("../../db/schema");
let GenerateRequest: typeof import("../../lib/knots/generate-request").GenerateRequest;
let studioId: string;
let knotId: string;

beforeAll(async () => {
  t = await useTempDatabase("generate-cache");
  const seed = await import("../../lib/demo/seed");
  ({ studioId } = await seed.seedDemo(t.db));
  route = await import("../../app/api/knots/[knotId]/drills/route");
  gen = await import("../../lib/knots/generate");
  cache = await import("../../lib/knots/cache");
  knotQueries = await import("../../db/queries/knot-drills");
  schema = await import("../../db/schema");
  ({ GenerateRequest } = await import("../../lib/knots/generate-request"));
  knotId = (await seededKnot(t.db)).id;
  request.headers = new Headers({ cookie: await memberCookie(seed.DEMO_TEACHER.email, seed.DEMO_PASSWORD) });
});
afterAll(() => t.cleanup());

async function post(body: unknown): Promise<Response> {
  const req = new Request(`http://localhost/api/knots/${knotId}/drills`, { method: "POST", body: JSON.stringify(body) });
  return route.POST(req, { params: Promise.resolve({ knotId }) });
}

/** The answer generated from scratch: the piece parsed again, no cache on any level. */
async function fresh(body: unknown): Promise<string> {
  const src = await knotQueries.getKnotSource(t.db, studioId, knotId);
  const plain = { musicxml: src!.musicxml, part: src!.part, hand: src!.hand, fromBar: src!.fromBar, toBar: src!.toBar };
  return JSON.stringify(gen.knotDrillsJson(gen.generateForKnot(plain, GenerateRequest.parse(body))));
}

describe("generate handler cache", () => {
  const body = { families: ["blocking", "stops"], options: {} };

  test("repeated requests give the same bytes as a fresh generation, with the same content type", async () => {
    const first = await post(body);
    expect(first.status).toBe(200);
    expect(first.headers.get("content-type")).toMatch(/^application\/json/);
    const a = await first.text();
    expect(Number(first.headers.get("content-length"))).toBe(Buffer.byteLength(a));
    const b = await (await post(body)).text();
    expect(a).toBe(await fresh(body));
    expect(b).toBe(a);
    expect(JSON.parse(a).drills.length).toBeGreaterThan(0);
  });

  test("the key ignores option key order but not the seed, the families or the hand", () => {
    const stamp = { id: "k", scoreId: "s", part: "P1", hand: "right" as const, fromBar: 1, toBar: 2, knotUpdatedAt: new Date(1), scoreUpdatedAt: new Date(2) };
    const key = (b: unknown, profile?: { spanMm: number; octaveMm: number }) => cache.drillsCacheKey(stamp, GenerateRequest.parse(b), profile);
    const base = key({ families: ["blocking"], options: { blocking: {} }, seed: 3 });
    expect(key({ seed: 3, options: { blocking: {} }, families: ["blocking"] })).toBe(base);
    expect(key({ families: ["blocking"], options: { blocking: {} }, seed: 4 })).not.toBe(base);
    expect(key({ families: ["stops"], options: {}, seed: 3 })).not.toBe(base);
    expect(key({ families: ["blocking"], options: { blocking: {} }, seed: 3 }, { spanMm: 178, octaveMm: 165.1 })).not.toBe(base);
    expect(cache.drillsCacheKey({ ...stamp, knotUpdatedAt: new Date(5) }, GenerateRequest.parse({ families: ["blocking"], options: { blocking: {} }, seed: 3 }))).not.toBe(base);
  });

  test("the piece is read from the database only once for the same piece version", async () => {
    const knot = (await knotQueries.getKnotStamp(t.db, studioId, knotId))!;
    const xml = (await knotQueries.getScoreMusicXml(t.db, studioId, knot.scoreId))!;
    let reads = 0;
    const load = async () => {
      reads += 1;
      return xml;
    };
    // A seed no other test uses: the body itself is not cached yet.
    const a = await cache.knotDrillsBody(knot, GenerateRequest.parse({ families: ["blocking"], seed: 77 }), undefined, load);
    const b = await cache.knotDrillsBody(knot, GenerateRequest.parse({ families: ["stops"], seed: 77 }), undefined, load);
    expect(Buffer.from(a!).equals(Buffer.from(b!))).toBe(false);
    // The parsed piece may already be cached from the handler test above; either way at most one read.
    expect(reads).toBeLessThanOrEqual(1);
    const newer = { ...knot, scoreUpdatedAt: new Date(knot.scoreUpdatedAt.getTime() + 1) };
    await cache.knotDrillsBody(newer, GenerateRequest.parse({ families: ["blocking"], seed: 77 }), undefined, load);
    expect(reads).toBeLessThanOrEqual(2);
    expect(reads).toBeGreaterThanOrEqual(1);
  });

  test("moving the knot's bars changes the answer at once (no stale drills)", async () => {
    const before = await (await post(body)).text();
    await t.db.update(schema.passage).set({ toBar: 1 }).where(eq(schema.passage.id, knotId));
    const after = await (await post(body)).text();
    expect(after).toBe(await fresh(body));
    expect(after).not.toBe(before);
    await t.db.update(schema.passage).set({ toBar: 2 }).where(eq(schema.passage.id, knotId));
    expect(await (await post(body)).text()).toBe(before);
  });

  test("an unknown profile or knot is 404, a bad request 400, as before", async () => {
    expect((await post({ families: ["blocking"], profile: "nobody" })).status).toBe(404);
    expect((await post({ families: [] })).status).toBe(400);
    const other = new Request("http://localhost/api/knots/nope/drills", { method: "POST", body: JSON.stringify(body) });
    expect((await route.POST(other, { params: Promise.resolve({ knotId: "nope" }) })).status).toBe(404);
  });
});

describe("cached pieces are never changed by generation", () => {
  test("every family runs on a deep-frozen piece and gives the same drills as on a fresh one", async () => {
    const { readScore } = await import("../../lib/score");
    const { families } = await import("../../lib/drills/index");
    const src = (await knotQueries.getKnotSource(t.db, studioId, knotId))!;
    const frozen = readScore(src.musicxml).score;
    const freeze = (v: unknown): void => {
      if (v && typeof v === "object" && !Object.isFrozen(v)) {
        Object.freeze(v);
        for (const x of Object.values(v)) freeze(x);
      }
    };
    freeze(frozen);
    const all = GenerateRequest.parse({ families: Object.keys(families) });
    const onFrozen = JSON.stringify(gen.knotDrillsJson(gen.generateForPassage(gen.passageOf(frozen, src), all)));
    const onFresh = JSON.stringify(gen.knotDrillsJson(gen.generateForPassage(gen.passageOf(readScore(src.musicxml).score, src), all)));
    expect(onFrozen).toBe(onFresh);
  });
});
