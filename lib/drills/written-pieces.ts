/**
 * Written note values: a sounding duration split into notes a score can show (type, dots, tuplet),
 * longest first.
 */
import Fraction from "fraction.js";
import type { Written } from "../score/types";
import { NOTE_TYPES } from "../score/write-durations";

/** Note values a drill writes: whole down to 128th (from the writer's table of MusicXML types). */
const BASES = NOTE_TYPES.slice(
  NOTE_TYPES.findIndex(([type]) => type === "whole"),
  NOTE_TYPES.findIndex(([type]) => type === "128th") + 1,
);

/** Every written value (type with 0–2 dots), longest first. */
const VALUES: readonly { type: string; dots: number; value: Fraction }[] = BASES.flatMap(
  ([type, v]) => [
    { type, dots: 2, value: v.mul(7, 4) },
    { type, dots: 1, value: v.mul(3, 2) },
    { type, dots: 0, value: v },
  ],
).sort((a, b) => b.value.compare(a.value));

/**
 * Split a sounding duration into written pieces (longest first), keeping a tuplet ratio.
 * Throws when a piece would be shorter than a 128th.
 *
 * @example
 * writtenPieces(new Fraction(5, 4)).map((p) => p.written.type); // ["quarter", "16th"]
 * writtenPieces(new Fraction(1, 3), { actual: 3, normal: 2 })[0].written.type; // "eighth"
 */
export function writtenPieces(
  duration: Fraction,
  tuplet?: { actual: number; normal: number },
): { duration: Fraction; written: Written }[] {
  const key = `${duration.s < 0 ? "-" : ""}${duration.n}/${duration.d}:${tuplet ? `${tuplet.actual}/${tuplet.normal}` : ""}`;
  let found = PIECES.get(key);
  if (!found) {
    found = computePieces(duration, tuplet);
    if (PIECES.size > 4096) PIECES.clear();
    PIECES.set(key, found);
  }
  return found.map((p) => ({ duration: p.duration, written: { ...p.written, tuplet: p.written.tuplet ? { ...p.written.tuplet } : null } }));
}

/** Written pieces by duration and tuplet: a pure function of a few hundred inputs, so kept. */
const PIECES = new Map<string, readonly { duration: Fraction; written: Written }[]>();

function computePieces(
  duration: Fraction,
  tuplet?: { actual: number; normal: number },
): { duration: Fraction; written: Written }[] {
  if (!tuplet || impliedTuplet(duration.mul(tuplet.actual, tuplet.normal))) tuplet = impliedTuplet(duration);
  const factor = tuplet ? new Fraction(tuplet.actual, tuplet.normal) : new Fraction(1);
  let rest = duration.mul(factor);
  const out: { duration: Fraction; written: Written }[] = [];
  while (rest.compare(0) > 0) {
    const v = VALUES.find((c) => c.value.compare(rest) <= 0);
    if (!v) throw new RangeError(`duration ${duration.toFraction()} cannot be written`);
    out.push({
      duration: v.value.div(factor),
      written: { type: v.type, dots: v.dots, tuplet: tuplet ? { ...tuplet } : null },
    });
    rest = rest.sub(v.value);
  }
  return out;
}

/**
 * The tuplet a duration needs when it is not a plain note value (its denominator is not a power
 * of two): the odd part of the denominator in the time of the next lower power of two (3:2, 5:4 …).
 *
 * @example
 * impliedTuplet(new Fraction(1, 3)); // { actual: 3, normal: 2 }
 * impliedTuplet(new Fraction(3, 4)); // undefined
 */
export function impliedTuplet(duration: Fraction): { actual: number; normal: number } | undefined {
  let odd = Number(duration.d);
  while (odd % 2 === 0) odd /= 2;
  if (odd === 1) return undefined;
  let normal = 1;
  while (normal * 2 < odd) normal *= 2;
  return { actual: odd, normal };
}
