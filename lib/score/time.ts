/**
 * Exact musical time: fractions of a quarter note (fraction.js), never floats.
 */
import Fraction from "fraction.js";

/** Zero quarter notes. */
export const ZERO: Fraction = new Fraction(0);

/**
 * A duration of `n / d` quarter notes.
 *
 * @example
 * q(1, 3).toFraction(); // "1/3" (a triplet eighth)
 */
export function q(n: number, d = 1): Fraction {
  return new Fraction(n, d);
}

/**
 * Quarter notes of a MusicXML `<duration>` at the given `<divisions>`.
 *
 * @example
 * fromDivisions(1, 2).toFraction(); // "1/2": with divisions = 2, duration 1 is an eighth
 */
export function fromDivisions(duration: number, divisions: number): Fraction {
  // MusicXML allows decimal durations and divisions; fraction.js turns 1.5 into 3/2 exactly.
  if (Number.isInteger(duration) && Number.isInteger(divisions)) return new Fraction(duration, divisions);
  return new Fraction(duration).div(divisions);
}

/**
 * Length of one bar of `beats / beatType` in quarter notes.
 *
 * @example
 * barLength({ beats: 6, beatType: 8 }).toFraction(); // "3"
 */
export function barLength(time: { beats: number; beatType: number }): Fraction {
  return new Fraction(4 * time.beats, time.beatType);
}

/**
 * The larger of two times.
 *
 * @example
 * maxTime(q(1), q(3, 2)).toFraction(); // "3/2"
 */
export function maxTime(a: Fraction, b: Fraction): Fraction {
  return a.compare(b) >= 0 ? a : b;
}

/**
 * Compare two times for sorting.
 *
 * @example
 * [q(2), q(1)].sort(compareTime); // [1, 2]
 */
export function compareTime(a: Fraction, b: Fraction): number {
  return a.compare(b);
}

/**
 * Quarter notes as a float, only for display, playback and comparisons with float-based tools.
 *
 * @example
 * toQuarters(q(1, 3)); // 0.333…
 */
export function toQuarters(t: Fraction): number {
  return t.valueOf();
}
