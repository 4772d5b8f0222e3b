/**
 * Whole handout PDFs kept by content: the same sheet, paper, names, date and goals give the same PDF,
 * so a second request is a hash and a look-up instead of engraving and laying out every drill again.
 * (The drills inside are engraved through lib/handout/engraving-cache.ts.)
 */
import type { HandoutInput } from "../handout/input";
import { contentCache } from "../handout/content-cache";
import { heavyWork } from "./gate";
import { runHeavy } from "./heavy";

// A cached handout is answered at once; a new one waits its turn in the bounded queue (lib/jobs/gate.ts)
// and is rendered in a worker thread (lib/jobs/heavy.ts).
const handouts = contentCache("handout", (input: HandoutInput) => heavyWork.run(() => runHeavy({ kind: "handout", input })), {
  maxEntries: 64,
  maxBytes: 64 * 1024 * 1024,
  weigh: (pdf) => pdf.byteLength,
});

/** The handout PDF for exactly this input, from the cache when it was made before. */
export function handoutPdf(input: HandoutInput): Promise<Uint8Array> {
  return handouts.get(input);
}

/** Hit and miss counts (tests and benchmarks). */
export const handoutCacheStats = () => handouts.stats();
