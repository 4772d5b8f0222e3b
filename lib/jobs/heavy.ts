/**
 * Heavy jobs of this process, off the request thread: handout PDFs and generated drills run in a pool
 * of worker threads (lib/jobs/pool.ts) fed the prebuilt bundle build/worker/heavy-work.cjs, behind the
 * bounded queue (lib/jobs/gate.ts). Each job has 60 s and each worker 512 MB of heap; past either, the
 * request gets a JobLimitError.
 *
 * In-process instead (same code, lib/jobs/worker.ts; still behind the gate, but with no time or memory
 * limit) when KNOTWORK_WORKERS=0, under vitest unless KNOTWORK_WORKERS=1 (unit tests need no build and
 * see the per-process caches), or when the bundle is missing (a production server logs a warning).
 */
import fs from "node:fs";
import path from "node:path";
import { createPool, type JobPool } from "./pool";
import runHeavyTask, { type HeavyResult, type HeavyTask } from "./worker";
import { ScoreError, type ScoreErrorCode } from "../score/errors";
import { WorkLimitError } from "../limits/work";

export const HEAVY_JOB_TIMEOUT_MS = Number(process.env.KNOTWORK_JOB_TIMEOUT_MS) || 60_000;
export const HEAVY_JOB_MEMORY_MB = Number(process.env.KNOTWORK_JOB_MEMORY_MB) || 512;

/** The worker bundle, by absolute path from the app root (scripts/build-worker.mjs writes it). */
export function workerBundlePath(): string {
  return path.resolve(process.cwd(), "build/worker/heavy-work.cjs");
}

let pool: JobPool | null | undefined;

/** True when heavy jobs should run in worker threads: KNOTWORK_WORKERS=1, or unset outside vitest. */
function workersWanted(): boolean {
  const asked = process.env.KNOTWORK_WORKERS;
  return asked === undefined ? !process.env.VITEST : asked === "1";
}

/** The process's pool, or null when jobs run in-process (not wanted, or no bundle). */
export function heavyPool(): JobPool | null {
  if (pool !== undefined) return pool;
  const file = workerBundlePath();
  if (!workersWanted() || !fs.existsSync(file)) {
    if (process.env.NODE_ENV === "production") console.warn(`Heavy work runs on the request thread: no worker bundle at ${path.relative(process.cwd(), file)} (run npm run build).`);
    pool = null;
    return pool;
  }
  pool = createPool({ filename: file, threads: 2, timeoutMs: HEAVY_JOB_TIMEOUT_MS, maxOldGenerationSizeMb: HEAVY_JOB_MEMORY_MB, what: "these drills" });
  return pool;
}

/**
 * Runs one heavy task in the pool (or in-process without one) and answers its bytes. A refusal from the
 * task is thrown here as the same kind of error (ScoreError, WorkLimitError), so handlers answer as before.
 */
export async function runHeavy(task: HeavyTask): Promise<Uint8Array> {
  const p = heavyPool();
  const result = p ? await p.run<HeavyResult>(task) : await runHeavyTask(task);
  if (result.ok) return result.bytes;
  throw rebuiltError(result.error);
}

function rebuiltError(e: Extract<HeavyResult, { ok: false }>["error"]): Error {
  let err: Error;
  if (e.name === "ScoreError") {
    err = new ScoreError(e.code as ScoreErrorCode, e.message);
    Object.assign(err, { measure: e.measure, element: e.element });
  } else if (e.name === "WorkLimitError") err = new WorkLimitError(e.message);
  else err = new Error(e.message);
  err.message = e.message;
  err.name = e.name;
  return err;
}
