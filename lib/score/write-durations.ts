/**
 * Durations for the MusicXML writer: note types and dots from exact durations, splitting of
 * durations no single note value can show, and the divisions value (LCM of denominators).
 */
import Fraction from "fraction.js";
import type { Written } from "./types";

type Tuplet = Written["tuplet"];

/** MusicXML note types with their length in quarter notes, longest first. */
export const NOTE_TYPES: readonly (readonly [string, Fraction])[] = [
  ["maxima", new Fraction(32)],
  ["long", new Fraction(16)],
  ["breve", new Fraction(8)],
  ["whole", new Fraction(4)],
  ["half", new Fraction(2)],
  ["quarter", new Fraction(1)],
  ["eighth", new Fraction(1, 2)],
  ["16th", new Fraction(1, 4)],
  ["32nd", new Fraction(1, 8)],
  ["64th", new Fraction(1, 16)],
  ["128th", new Fraction(1, 32)],
  ["256th", new Fraction(1, 64)],
  ["512th", new Fraction(1, 128)],
  ["1024th", new Fraction(1, 256)],
];

const MAX_DOTS = 3;

/**
 * Length in quarter notes of a written type with dots (no tuplet), or null for an unknown type.
 * @example
 *   typeLength("quarter", 1).toFraction(); // "3/2"
 */
export function typeLength(type: string, dots: number): Fraction | null {
  const base = NOTE_TYPES.find(([name]) => name === type)?.[1];
  if (!base) return null;
  // base × (2 − 2^−dots)
  return base.mul(new Fraction(2).sub(new Fraction(1, 2 ** dots)));
}

/** Written length (what type and dots show) of a sounding duration under a tuplet ratio. */
function writtenOf(duration: Fraction, tuplet: Tuplet): Fraction {
  return tuplet ? duration.mul(tuplet.actual, tuplet.normal) : duration;
}

/**
 * The note type and dots that show a written length exactly, or null when no single value does.
 * @example
 *   typeFor(new Fraction(3, 4)); // { type: "eighth", dots: 1 }
 */
export function typeFor(written: Fraction): { type: string; dots: number } | null {
  for (const [type] of NOTE_TYPES) {
    for (let dots = 0; dots <= MAX_DOTS; dots++) {
      const len = typeLength(type, dots);
      if (len && len.equals(written)) return { type, dots };
    }
  }
  return null;
}

/** One notated value: sounding duration plus the type, dots and tuplet that show it. */
export interface NoteValue {
  readonly duration: Fraction;
  readonly type: string | null;
  readonly dots: number;
  readonly tuplet: Tuplet;
}

/**
 * Splits a sounding duration into notated values (tied by the caller). Keeps the given written
 * type when it matches the duration; otherwise derives type and dots; drops the tuplet when the
 * duration only fits without it; splits greedily (longest value first) when no single value fits.
 * A duration with an odd denominator and no tuplet (a rest filling a tuplet's gap) is written under
 * the plain tuplet it implies (1/3 → 3:2). Falls back to one value without a type only when even
 * that fails (`<type>` is optional in MusicXML).
 * @example
 *   noteValues(new Fraction(5, 4), { type: null, dots: 0, tuplet: null }).map((v) => v.type);
 *   // ["quarter", "16th"]
 */
export function noteValues(duration: Fraction, written: Written): NoteValue[] {
  const tuplet = written.tuplet;
  if (written.type) {
    const len = typeLength(written.type, written.dots);
    if (len && len.equals(writtenOf(duration, tuplet))) {
      return [{ duration, type: written.type, dots: written.dots, tuplet }];
    }
  }
  for (const t of tuplet ? [tuplet, null] : [null]) {
    const single = typeFor(writtenOf(duration, t));
    if (single) return [{ duration, ...single, tuplet: t }];
  }
  for (const t of tuplet ? [tuplet, null] : [null]) {
    const parts = greedy(writtenOf(duration, t));
    if (parts) {
      return parts.map((p) => ({
        duration: t ? p.len.mul(t.normal, t.actual) : p.len,
        type: p.type,
        dots: p.dots,
        tuplet: t,
      }));
    }
  }
  const implied = impliedTuplet(duration);
  if (implied) {
    const single = typeFor(writtenOf(duration, implied));
    if (single) return [{ duration, ...single, tuplet: implied }];
    const parts = greedy(writtenOf(duration, implied));
    if (parts) return parts.map((p) => ({ duration: p.len.mul(implied.normal, implied.actual), type: p.type, dots: p.dots, tuplet: implied }));
  }
  return [{ duration, type: null, dots: 0, tuplet }];
}

/**
 * The plain tuplet a duration needs when no note value shows it: its odd denominator n as n notes in
 * the time of the largest power of two below n (1/3 quarter → 3:2, 1/5 → 5:4, 1/7 → 7:4), so that a
 * gap left by a tuplet still gets a `<type>`.
 */
function impliedTuplet(duration: Fraction): { actual: number; normal: number } | null {
  let odd = Number(duration.d);
  while (odd % 2 === 0) odd /= 2;
  if (odd < 3 || odd > 64) return null;
  return { actual: odd, normal: 2 ** Math.floor(Math.log2(odd)) };
}

function greedy(written: Fraction): { len: Fraction; type: string; dots: number }[] | null {
  const out: { len: Fraction; type: string; dots: number }[] = [];
  let rest = written;
  while (rest.gt(0) && out.length < 16) {
    let best: { len: Fraction; type: string; dots: number } | null = null;
    for (const [type] of NOTE_TYPES) {
      for (let dots = 0; dots <= 1; dots++) {
        const len = typeLength(type, dots)!;
        if (len.lte(rest) && (!best || len.gt(best.len))) best = { len, type, dots };
      }
    }
    if (!best) return null;
    out.push(best);
    rest = rest.sub(best.len);
  }
  return rest.equals(0) ? out : null;
}

/**
 * Divisions per quarter note: the least common multiple of the denominators of all values given
 * (MusicXML `<divisions>`: "they must be chosen to take tuplets into account").
 * @example
 *   divisionsFor([new Fraction(1, 3), new Fraction(1, 4)]); // 12
 */
export function divisionsFor(values: Iterable<Fraction>): number {
  let lcm = 1n;
  for (const v of values) {
    const d = v.d;
    lcm = (lcm / gcd(lcm, d)) * d;
  }
  return Number(lcm);
}

function gcd(a: bigint, b: bigint): bigint {
  while (b !== 0n) [a, b] = [b, a % b];
  return a;
}

/**
 * A duration in divisions, as the integer MusicXML writes.
 * @example
 *   toDivisions(new Fraction(1, 2), 4); // 2
 */
export function toDivisions(duration: Fraction, divisions: number): number {
  return duration.mul(divisions).valueOf();
}
