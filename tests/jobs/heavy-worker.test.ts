// The prebuilt worker bundle (scripts/build-worker.mjs) does in a worker thread exactly what the
// in-process code does: same drills JSON, same handout pages, fonts found from the app root.
import { execFileSync } from "node:child_process";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { heavyPool, runHeavy, workerBundlePath } from "@/lib/jobs/heavy";
import { isScoreError, type ScoreError } from "@/lib/score/errors";
import { createPool, type JobPool } from "@/lib/jobs/pool";
import runHeavyTask, { type HeavyResult, type HeavyTask } from "@/lib/jobs/worker";
import { GenerateRequest } from "@/lib/knots/generate-request";
import { demoPiece, eightDrillSheet } from "../handout/sample-sheet";
import { readPdfPages } from "../handout/pdf-tools";

const root = path.resolve(__dirname, "../..");
let pool: JobPool;

beforeAll(() => {
  execFileSync(process.execPath, [path.join(root, "scripts/build-worker.mjs")], { cwd: root, stdio: "ignore" });
  pool = createPool({ filename: workerBundlePath(), threads: 1, timeoutMs: 60_000, maxOldGenerationSizeMb: 512 });
}, 60_000);
afterAll(() => pool?.close());

async function both(task: HeavyTask): Promise<[HeavyResult, HeavyResult]> {
  return [await pool.run<HeavyResult>(task), await runHeavyTask(structuredClone(task))];
}

describe("heavy-work worker bundle", () => {
  test("generates the same drills JSON as the request thread would", async () => {
    const req = GenerateRequest.parse({ families: ["blocking", "stops", "tempo-ladder"], options: {} });
    const task: HeavyTask = {
      kind: "knot-drills",
      musicxml: demoPiece("lantern-waltz"),
      stamp: { id: "piece-1", updatedAt: new Date(1) },
      knot: { part: "P1", hand: "right", fromBar: 1, toBar: 2 },
      req,
    };
    const [inWorker, here] = await both(task);
    expect(inWorker.ok && here.ok).toBe(true);
    if (!inWorker.ok || !here.ok) return;
    const json = JSON.parse(new TextDecoder().decode(inWorker.bytes)) as { drills: unknown[] };
    expect(json.drills.length).toBeGreaterThan(0);
    expect(Buffer.from(inWorker.bytes).equals(Buffer.from(here.bytes))).toBe(true);
  }, 60_000);

  test("a refusal made in the worker is thrown on the request thread as the same ScoreError", async () => {
    process.env.KNOTWORK_WORKERS = "1"; // the process's pool, from the bundle built above
    const req = GenerateRequest.parse({ families: ["blocking"], options: {} });
    const err = await runHeavy({
      kind: "knot-drills",
      musicxml: "<html><body>not a score</body></html>",
      stamp: { id: "piece-2", updatedAt: new Date(1) },
      knot: { part: "P1", hand: "right", fromBar: 1, toBar: 2 },
      req,
    }).catch((e: unknown) => e);
    expect(heavyPool()).not.toBeNull();
    expect(isScoreError(err)).toBe(true);
    expect((err as ScoreError).code).toBe("not-musicxml");
    await heavyPool()?.close();
    delete process.env.KNOTWORK_WORKERS;
  }, 60_000);

  test("renders the same handout pages, with the handout fonts, as the request thread", async () => {
    const [inWorker, here] = await both({ kind: "handout", input: eightDrillSheet("a4") });
    expect(inWorker.ok && here.ok).toBe(true);
    if (!inWorker.ok || !here.ok) return;
    expect(Buffer.from(inWorker.bytes).subarray(0, 5).toString()).toBe("%PDF-");
    expect(Buffer.from(inWorker.bytes).includes("DejaVuSans")).toBe(true);
    expect(await readPdfPages(inWorker.bytes)).toEqual(await readPdfPages(here.bytes));
  }, 120_000);
});
