/**
 * Heavy work, bounded: a queue in front of CPU-heavy requests (generating drills, engraving, handout
 * PDFs) that answers 503 with Retry-After when full, and whole handout PDFs kept by content so a
 * second request is a look-up. Server only. (Engraved drill SVGs are cached beside the renderer, in
 * lib/handout/engraving-cache.ts.)
 *
 * - gate.ts: `heavyWork` (2 running, 16 waiting), `QueueFullError`, `busyResponse`
 * - render-cache.ts: `handoutPdf(input)`, the content-keyed handout cache
 * - pool.ts: `createPool` (piscina: per-job time limit, per-worker heap limit), `JobLimitError`, `limitResponse`
 * - heavy.ts: `runHeavy(task)`, the process's pool fed build/worker/heavy-work.cjs (in-process without it)
 * - worker.ts: the worker's entry (handouts, knot drills, reading uploads), bundled by scripts/build-worker.mjs
 */
import "server-only";

export * from "./gate";
export * from "./render-cache";
export * from "./pool";
export { runHeavy, heavyPool, workerBundlePath } from "./heavy";
