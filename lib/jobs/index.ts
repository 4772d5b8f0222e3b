/**
 * Heavy work, bounded: a queue in front of CPU-heavy requests (generating drills, engraving, handout
 * PDFs) that answers 503 with Retry-After when full, and whole handout PDFs kept by content so a
 * second request is a look-up. Server only. (Engraved drill SVGs are cached beside the renderer, in
 * lib/handout/engraving-cache.ts.)
 *
 * - gate.ts: `heavyWork` (2 running, 16 waiting), `QueueFullError`, `busyResponse`
 * - render-cache.ts: `handoutPdf(input)`, the content-keyed handout cache
 */
import "server-only";

export * from "./gate";
export * from "./render-cache";
