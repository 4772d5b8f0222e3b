/**
 * Per-part reading position: divisions, the time cursor inside the current bar, attribute state and
 * the things a direction leaves pending for the next note (octave shifts, dynamics, words).
 */
import type Fraction from "fraction.js";
import { ScoreError } from "./errors";
import { fromDivisions, maxTime, ZERO } from "./time";
import type { AttrState, RawMeasure, RawPart } from "./read-types";

export interface Cursor {
  readonly part: RawPart;
  divisions: number;
  pos: Fraction;
  /** Onset of the last non-chord note, for `<chord/>` members. */
  lastOnset: Fraction;
  lastDuration: Fraction;
  state: AttrState;
  measure: RawMeasure | null;
  measureIndex: number;
  /** Display shift per staff from `<octave-shift>` lines (semitones); pitch data is already true pitch. */
  shift: Map<number, number>;
  /** Sounding shift from `<transpose>`, in semitones. */
  transpose: number;
  pendingDynamic: Map<number, string>;
  pendingWords: Map<number, string>;
}

/**
 * A cursor at the start of a part.
 *
 * @example
 * newCursor({ id: "P1", staves: 1, measures: [], events: [] }).pos.valueOf(); // 0
 */
export function newCursor(part: RawPart): Cursor {
  return {
    part, divisions: 0, pos: ZERO, lastOnset: ZERO, lastDuration: ZERO,
    state: { key: { fifths: 0, mode: "major" }, time: { beats: 4, beatType: 4 }, clefs: [] },
    measure: null, measureIndex: -1, shift: new Map(), transpose: 0,
    pendingDynamic: new Map(), pendingWords: new Map(),
  };
}

/**
 * Convert a `<duration>` value of the current bar to quarter notes, refusing missing divisions and
 * non-positive values.
 *
 * @example
 * toTime(cursorWithDivisions2, 1, "note").toFraction(); // "1/2"
 */
export function toTime(c: Cursor, duration: number, element: string): Fraction {
  const place = { measure: c.measureIndex, number: c.measure?.number, element };
  if (!(c.divisions > 0)) {
    throw new ScoreError("missing-divisions", "A duration appears before any <divisions> value", place);
  }
  if (!Number.isFinite(duration) || duration <= 0) {
    throw new ScoreError("bad-duration", `Duration ${duration} is not a positive number`, place);
  }
  return fromDivisions(duration, c.divisions);
}

/**
 * Move the cursor forward, remembering the furthest point reached in the bar.
 *
 * @example
 * advance(c, q(1));
 */
export function advance(c: Cursor, by: Fraction): void {
  c.pos = c.pos.add(by);
  if (c.measure) c.measure.length = maxTime(c.measure.length, c.pos);
}
