/**
 * A bar as one part sees it: the shared `Measure` carries the first part's clefs and attribute changes,
 * and each part's own under `partAttributes` (a song's piano part has clefs of its own). Key and time
 * stay the shared ones; only the clefs (at the start and inside the bar) are the part's.
 */
import type { AttributeChange, Measure } from "./types";

/**
 * The bar with the given part's clefs (the bar itself when it has none recorded).
 *
 * @example
 * partMeasure(score.measures[0], "P2").clefs; // the piano's treble and bass clefs, not the voice's
 */
export function partMeasure(m: Measure, part: string): Measure {
  const own = m.partAttributes?.[part];
  if (!own) return m;
  const shared: AttributeChange[] = [];
  for (const c of m.changes) {
    if (!c.key && !c.time) continue;
    shared.push({ offset: c.offset, ...(c.key ? { key: c.key } : {}), ...(c.time ? { time: c.time } : {}) });
  }
  const clefs = own.changes.filter((c) => c.clef).map((c) => ({ offset: c.offset, clef: c.clef }));
  const changes = [...shared, ...clefs].sort((a, b) => a.offset.compare(b.offset));
  return { ...m, clefs: own.clefs, changes };
}
