/**
 * Work limits enforced on the server (lib/limits/work.ts, lib/score/limits.ts): a knot longer than 16
 * bars cannot be generated for, previewed or saved as a sheet; a piece stored with absurd numbers
 * (before the upload bounds existed) answers 422 with a message instead of a 500; the upload path
 * refuses every case of the bounds corpus with the bar named and nothing stored.
 */
import fs from "node:fs";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, test, vi } from "vitest";
import { boundsCorpus } from "../../scripts/make-hostile-bounds";
import { countRows, useTempDatabase } from "../db/temp-db";
import { memberCookie } from "../sheets/member-cookie";

const request = vi.hoisted(() => ({ headers: new Headers() }));
vi.mock("next/headers", () => ({
  headers: async () => request.headers,
  cookies: async () => ({ get: () => undefined, getAll: () => [], set: () => undefined, delete: () => undefined }),
}));
vi.mock("next/cache", () => ({ revalidatePath: () => undefined }));

let t: Awaited<ReturnType<typeof useTempDatabase>>;
let studioId: string;
let userId: string;
let drillsRoute: typeof import("../../app/api/knots/[knotId]/drills/route");
let sheetsRoute: typeof import("../../app/api/sheets/route");
let previewRoute: typeof import("../../app/api/drills/preview/route");
let work: typeof import("../../lib/limits/work");

const root = path.resolve(__dirname, "../..");
const GENERATE = { families: ["blocking", "tempo-ladder"], options: {} };

beforeAll(async () => {
  t = await useTempDatabase("work-limits");
  const seed = await import("../../lib/demo/seed");
  ({ studioId } = await seed.seedDemo(t.db));
  const teacher = await t.client.execute({ sql: "select id from user where email = ?", args: [seed.DEMO_TEACHER.email] });
  userId = String(teacher.rows[0]!.id);
  drillsRoute = await import("../../app/api/knots/[knotId]/drills/route");
  sheetsRoute = await import("../../app/api/sheets/route");
  previewRoute = await import("../../app/api/drills/preview/route");
  work = await import("../../lib/limits/work");
  request.headers = new Headers({ cookie: await memberCookie(seed.DEMO_TEACHER.email, seed.DEMO_PASSWORD) });
});
afterAll(() => t?.cleanup());

/** A piece row straight into the table (as if stored before today's upload checks) and a knot on it. */
async function storedKnot(musicxml: string, fromBar: number, toBar: number): Promise<string> {
  const { insertScore } = await import("../../db/queries/scores");
  const { insertPassage } = await import("../../db/queries/passages");
  const scoreId = await insertScore(t.db, {
    studioId, uploadedBy: userId, title: "Stored long ago", composer: null, bars: toBar, parts: [{ id: "P1", name: "Piano", staves: 1 }],
    musicxml, storageKey: `demo/stored-${crypto.randomUUID()}`, originalName: "old.musicxml",
  });
  const id = await insertPassage(t.db, { studioId, scoreId, createdBy: userId, part: "P1", hand: "right", fromBar, toBar, tags: ["evenness"], note: null });
  return id!;
}

const generate = (knotId: string) =>
  drillsRoute.POST(new Request(`http://localhost/api/knots/${knotId}/drills`, { method: "POST", body: JSON.stringify(GENERATE) }), { params: Promise.resolve({ knotId }) });

async function refusal(res: Response): Promise<string> {
  expect(res.status).toBe(422);
  const body = (await res.json()) as { error?: string; message?: string };
  return body.error ?? body.message ?? "";
}

describe("a knot longer than 16 bars", () => {
  // A 20-bar piece of one note a bar (invented for this test).
  const bars = Array.from({ length: 20 }, (_, i) =>
    `<measure number="${i + 1}">${i === 0 ? "<attributes><divisions>1</divisions><time><beats>4</beats><beat-type>4</beat-type></time><clef><sign>G</sign><line>2</line></clef></attributes>" : ""}` +
    `<note><pitch><step>${"CDEFGAB"[i % 7]}</step><octave>4</octave></pitch><duration>4</duration><type>whole</type></note></measure>`).join("");
  const xml = `<?xml version="1.0" encoding="UTF-8"?><score-partwise version="4.0"><part-list><score-part id="P1"><part-name>Piano</part-name></score-part></part-list><part id="P1">${bars}</part></score-partwise>`;

  test("generate, preview and save answer 422 naming the limit; nothing is stored", async () => {
    const knotId = await storedKnot(xml, 1, 20);
    const sheets = await countRows(t.client, "sheet");
    expect(await refusal(await generate(knotId))).toMatch(/at most 16 bars.*has 20/);
    const preview = `http://localhost/api/drills/preview?knot=${knotId}&key=x&format=musicxml&request=${encodeURIComponent(JSON.stringify(GENERATE))}`;
    expect(await refusal(await previewRoute.GET(new Request(preview)))).toMatch(/at most 16 bars/);
    const save = { knotId, title: "Too long", request: GENERATE, drills: [{ key: "x", studentNote: "", tempo: { start: 60, target: 80 } }] };
    expect(await refusal(await sheetsRoute.POST(new Request("http://localhost/api/sheets", { method: "POST", body: JSON.stringify(save) })))).toMatch(/at most 16 bars/);
    expect(await countRows(t.client, "sheet")).toBe(sheets);
  });

  test("16 bars of the same piece generate", async () => {
    const knotId = await storedKnot(xml, 3, 18);
    const res = await generate(knotId);
    expect(res.status).toBe(200);
    expect(((await res.json()) as { drills: unknown[] }).drills.length).toBeGreaterThan(0);
  });
});

describe("generation output limits", () => {
  test("more drills or notes than one request may make is a WorkLimitError with a sentence", () => {
    const drill = (notes: number) => ({ score: { events: new Array(notes).fill(0) } });
    expect(() => work.checkGeneratedOutput(Array.from({ length: work.MAX_DRILLS_PER_REQUEST }, () => drill(10)))).not.toThrow();
    expect(() => work.checkGeneratedOutput(Array.from({ length: work.MAX_DRILLS_PER_REQUEST + 1 }, () => drill(1)))).toThrow(/drills; the most at once is 80/);
    expect(() => work.checkGeneratedOutput([drill(work.MAX_NOTES_PER_REQUEST + 1)])).toThrow(/12,000/);
  });
});

describe("pieces stored before the bounds existed", () => {
  // fixtures/hostile/huge-divisions.xml: <divisions>1e12</divisions>; generation used to answer 500 (a RangeError).
  test.each(boundsCorpus().filter((c) => c.file.endsWith(".xml")).map((c) => [c.file, c] as const))("%s: generate answers 422 naming the bar", async (_f, c) => {
    const knotId = await storedKnot(new TextDecoder().decode(c.bytes), 1, 2);
    const message = await refusal(await generate(knotId));
    expect(message).toContain(`bar ${c.bar}`);
  });
});

describe("upload of the bounds corpus", () => {
  test.each(boundsCorpus().map((c) => [c.file, c] as const))("%s is refused with the bar named, nothing stored", async (_f, c) => {
    const { acceptUpload } = await import("../../app/api/pieces/piece-upload");
    const { localStore } = await import("../../lib/storage");
    const dir = path.join(t.dir, "uploads");
    const before = await countRows(t.client, "score");
    const form = new FormData();
    form.append("file", new File([new Uint8Array(fs.readFileSync(path.join(root, "fixtures/hostile", c.file)))], c.file, { type: "application/xml" }));
    form.append("confirm", "yes");
    const out = await acceptUpload(form, { studioId, userId, db: t.db, store: localStore(dir) });
    expect(out.status).toBe(422);
    expect((out.body as { error: string }).error).toMatch(c.says);
    expect((out.body as { error: string }).error).toContain(`bar ${c.bar}`);
    expect(await countRows(t.client, "score")).toBe(before);
    expect(fs.existsSync(dir) ? fs.readdirSync(dir, { recursive: true }).filter((f) => !fs.statSync(path.join(dir, String(f))).isDirectory()) : []).toEqual([]);
  });
});

describe("the bounded queue of heavy work", () => {
  test("when it is full, generate answers 503 with Retry-After at once; when it drains, 200", async () => {
    const { heavyWork } = await import("../../lib/jobs/gate");
    const { seededKnot } = await import("../sheets/fixture");
    const knotId = (await seededKnot(t.db)).id;
    let release!: () => void;
    const held = new Promise<void>((r) => (release = r));
    // Two running and sixteen waiting: the gate's capacity (lib/jobs/gate.ts heavyWork).
    const blockers = Array.from({ length: 18 }, () => heavyWork.run(() => held));
    const body = JSON.stringify({ families: ["blocking"], options: {}, seed: 4242 });
    const t0 = performance.now();
    const busy = await drillsRoute.POST(new Request(`http://localhost/api/knots/${knotId}/drills`, { method: "POST", body }), { params: Promise.resolve({ knotId }) });
    expect(performance.now() - t0).toBeLessThan(2000);
    expect(busy.status).toBe(503);
    expect(Number(busy.headers.get("retry-after"))).toBeGreaterThan(0);
    expect(((await busy.json()) as { message: string }).message).toMatch(/busy/);
    release();
    await Promise.all(blockers);
    const ok = await drillsRoute.POST(new Request(`http://localhost/api/knots/${knotId}/drills`, { method: "POST", body }), { params: Promise.resolve({ knotId }) });
    expect(ok.status).toBe(200);
  });
});
