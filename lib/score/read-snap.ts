/**
 * Rounded durations made exact. Exporters often write `<divisions>` that cannot express a tuplet
 * (1024 per quarter for triplets, 5:4 or 13:8 groups) and round each `<duration>` (171, 170, 205 …).
 * A note's `<type>`, `<dot>`s and `<time-modification>` say its exact length (MusicXML 4.0, the
 * `time-modification` element: actual-notes of this type in the time of normal-notes); when the file's
 * `<duration>` differs from that by less than one division, it was rounded and the exact value is used.
 * A larger difference is kept as written, with a warning. `<backup>` and `<forward>` in a bar with
 * snapped notes land on the nearest note boundary when they miss it by rounding only.
 */
import Fraction from "fraction.js";
import { moveTo, position, useExact, type Cursor } from "./read-cursor";
import type { NoteDraft, RawScore } from "./read-types";
import { warn } from "./read-warnings";
import { typeLength } from "./write-durations";

/** The exact sounding length a note's type, dots and time-modification imply, or null. */
function impliedLength(n: NoteDraft): Fraction | null {
  if (n.type === null) return null;
  const written = typeLength(n.type, n.dots);
  if (!written) return null;
  return n.actual > 0 && n.normal > 0 ? written.mul(n.normal, n.actual) : written;
}

/**
 * The note's duration, snapped to the exact implied value when the file's `<duration>` (already read
 * into `duration`) differs from it only by rounding. Moves the cursor's pending step to the exact value.
 *
 * @example
 * snapDuration(draft, cursor, raw, q(171, 1024)); // q(1, 6) for a 16th in a 3:2 triplet
 */
export function snapDuration(n: NoteDraft, c: Cursor, raw: RawScore, duration: Fraction): Fraction {
  if (n.type === null || n.duration === null) return duration;
  const key = `${n.type}|${n.dots}|${n.actual}|${n.normal}|${n.duration}`;
  let exact = c.snaps.get(key);
  if (exact === undefined) {
    const implied = impliedLength(n);
    exact = null;
    if (implied && !implied.equals(duration)) {
      // Difference in divisions: below one division it is the file's rounding.
      const off = implied.sub(duration).abs().mul(c.divisions);
      if (off.compare(1) < 0) exact = implied;
      else if (!n.rest) {
        warn(raw, "duration-mismatch",
          `A ${n.type} note has <duration> ${n.duration} (${duration.toFraction()} quarters), not the ${implied.toFraction()} its type says; the duration was kept`,
          c.measureIndex, "duration");
      }
    }
    c.snaps.set(key, exact);
  }
  if (exact === null) return duration;
  c.snapCount += 1;
  useExact(c, exact);
  return exact;
}

/**
 * Remember a note's onset and end in a bar that has snapped notes, so rounded backups can land there.
 *
 * @example
 * noteBoundary(c, onset, duration);
 */
export function noteBoundary(c: Cursor, onset: Fraction, duration: Fraction): void {
  if (c.snapCount === 0) return;
  if (c.boundaries.length === 0) c.boundaries.push(new Fraction(0));
  c.boundaries.push(onset, onset.add(duration));
}

/**
 * After a `<backup>` or `<forward>` in a bar with snapped notes: move to the nearest note boundary
 * when the cursor missed it by less than the rounding the snapped notes allow.
 *
 * @example
 * landOnBoundary(c); // a backup of 4095/1024 after a snapped bar lands on 0
 */
export function landOnBoundary(c: Cursor): void {
  if (c.snapCount === 0 || c.boundaries.length === 0) return;
  const here = position(c);
  const tolerance = new Fraction(c.snapCount, c.divisions);
  let best: Fraction | null = null;
  let bestOff: Fraction | null = null;
  for (const b of c.boundaries) {
    const off = b.sub(here).abs();
    if (off.equals(0)) return;
    if (off.compare(tolerance) < 0 && (bestOff === null || off.compare(bestOff) < 0)) {
      best = b;
      bestOff = off;
    }
  }
  if (best) moveTo(c, best);
}
