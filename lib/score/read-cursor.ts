/**
 * Per-part reading position: divisions, the time cursor inside the current bar, attribute state and
 * the things a direction leaves pending for the next note (octave shifts, dynamics, words).
 *
 * Inside a bar the cursor counts whole ticks (`unit` ticks per quarter note, a multiple of every
 * `<divisions>` value met in the bar), so moving it is integer arithmetic; exact `Fraction`s are made
 * once per distinct value and reused. When a bar needs ticks finer than `MAX_UNIT` or larger than a
 * safe integer (decimal durations, divisions of clashing sizes), the cursor keeps that bar in
 * `Fraction`s instead (`unit === 0`).
 */
import Fraction from "fraction.js";
import { ScoreError } from "./errors";
import { fromDivisions, maxTime, ZERO } from "./time";
import type { AttrState, RawMeasure, RawPart } from "./read-types";
import type { Pitch, Written } from "./types";

/** Finest tick the integer cursor uses (ticks per quarter note). */
export const MAX_UNIT = 2 ** 30;
/** Most entries kept in a cursor's fraction caches before they are cleared. */
const CACHE_CAP = 4096;

export interface Cursor {
  readonly part: RawPart;
  divisions: number;
  /** Ticks per quarter note in the current bar; 0 when the bar is kept in `Fraction`s. */
  unit: number;
  /** Position, onset of the last non-chord note and furthest point of the bar, in ticks. */
  posT: number;
  lastOnsetT: number;
  lengthT: number;
  /** The same three in `Fraction`s, used only while `unit === 0`. */
  pos: Fraction;
  lastOnset: Fraction;
  length: Fraction;
  lastDuration: Fraction;
  /** Ticks of the duration `toTime` returned last (NaN while `unit === 0`). */
  ticks: number;
  state: AttrState;
  measure: RawMeasure | null;
  measureIndex: number;
  /** Display shift per staff from `<octave-shift>` lines (semitones); pitch data is already true pitch. */
  shift: Map<number, number>;
  /** Sounding shift from `<transpose>`, in semitones. */
  transpose: number;
  pendingDynamic: Map<number, string>;
  pendingWords: Map<number, string>;
  /** `<duration>` value → quarter notes at the current divisions. */
  readonly durations: Map<number, Fraction>;
  /** Tick count → quarter notes at `cacheUnit`. */
  readonly offsets: Map<number, Fraction>;
  cacheUnit: number;
  /** Pitches already made in this part, shared by the events that sound them (the model is readonly). */
  readonly pitches: Map<number, Pitch>;
  /** Written forms without a tuplet already made in this part: note type → by number of dots. */
  readonly writtens: Map<string | null, Written[]>;
  /** Exact durations implied by type, dots and time-modification, by their key (see read-snap.ts). */
  readonly snaps: Map<string, Fraction | null>;
  /** Notes of the current bar whose `<duration>` was snapped to the exact value. */
  snapCount: number;
  /** Note onsets and ends of the current bar (exact), once a note was snapped; backups land on them. */
  readonly boundaries: Fraction[];
}

/**
 * A cursor at the start of a part.
 *
 * @example
 * newCursor({ id: "P1", staves: 1, measures: [], events: [] }).posT; // 0
 */
export function newCursor(part: RawPart): Cursor {
  return {
    part, divisions: 0, unit: 1, posT: 0, lastOnsetT: 0, lengthT: 0,
    pos: ZERO, lastOnset: ZERO, length: ZERO, lastDuration: ZERO, ticks: Number.NaN,
    state: { key: { fifths: 0, mode: "major" }, time: { beats: 4, beatType: 4 }, clefs: [] },
    measure: null, measureIndex: -1, shift: new Map(), transpose: 0,
    pendingDynamic: new Map(), pendingWords: new Map(), durations: new Map(), offsets: new Map(), cacheUnit: 1,
    pitches: new Map(), writtens: new Map(), snaps: new Map(), snapCount: 0, boundaries: [],
  };
}

function gcd(a: number, b: number): number {
  while (b !== 0) {
    const r = a % b;
    a = b;
    b = r;
  }
  return a;
}

/**
 * Start a bar: the position goes back to zero, counted in ticks of the current divisions.
 *
 * @example
 * startBar(c); // c.posT === 0
 */
export function startBar(c: Cursor): void {
  c.unit = Number.isInteger(c.divisions) && c.divisions > 0 && c.divisions <= MAX_UNIT ? c.divisions : c.divisions > 0 ? 0 : 1;
  c.posT = 0;
  c.lastOnsetT = 0;
  c.lengthT = 0;
  c.pos = ZERO;
  c.lastOnset = ZERO;
  c.length = ZERO;
  c.snapCount = 0;
  c.boundaries.length = 0;
}

/** Leave integer ticks for the rest of the bar. */
function toFractions(c: Cursor): void {
  if (c.unit === 0) return;
  c.pos = timeAt(c, c.posT);
  c.lastOnset = timeAt(c, c.lastOnsetT);
  c.length = timeAt(c, c.lengthT);
  c.unit = 0;
}

/** Make `unit` a multiple of `d`, rescaling the bar's tick counts; false when that is not safe. */
function refine(c: Cursor, d: number): boolean {
  if (c.unit === 0) return false;
  if (c.unit % d === 0) return true;
  const unit = (c.unit / gcd(c.unit, d)) * d;
  const k = unit / c.unit;
  if (unit > MAX_UNIT || !Number.isSafeInteger(c.lengthT * k)) {
    toFractions(c);
    return false;
  }
  c.posT *= k;
  c.lastOnsetT *= k;
  c.lengthT *= k;
  c.unit = unit;
  return true;
}

/**
 * Take new `<divisions>`: later durations are counted in them.
 *
 * @example
 * setDivisions(c, 4);
 */
export function setDivisions(c: Cursor, divisions: number): void {
  c.divisions = divisions;
  c.durations.clear();
  c.snaps.clear();
  if (c.posT === 0 && c.lengthT === 0 && c.lastOnsetT === 0 && c.unit !== 0) startBar(c);
  else if (Number.isInteger(divisions)) refine(c, divisions);
  else toFractions(c);
}

/**
 * Convert a `<duration>` value of the current bar to quarter notes, refusing missing divisions and
 * non-positive values. Also leaves its length in ticks in `c.ticks` (NaN when the bar is in fractions).
 *
 * @example
 * toTime(cursorWithDivisions2, 1, "note").toFraction(); // "1/2"
 */
export function toTime(c: Cursor, duration: number, element: string): Fraction {
  if (!(c.divisions > 0)) {
    const place = { measure: c.measureIndex, number: c.measure?.number, element };
    throw new ScoreError("missing-divisions", "A duration appears before any <divisions> value", place);
  }
  if (!Number.isFinite(duration) || duration <= 0) {
    const place = { measure: c.measureIndex, number: c.measure?.number, element };
    throw new ScoreError("bad-duration", `Duration ${duration} is not a positive number`, place);
  }
  let time = c.durations.get(duration);
  if (time === undefined) {
    time = fromDivisions(duration, c.divisions);
    if (c.durations.size >= CACHE_CAP) c.durations.clear();
    c.durations.set(duration, time);
  }
  c.ticks = Number.NaN;
  if (c.unit !== 0) {
    if (Number.isInteger(duration) && c.unit % c.divisions === 0) c.ticks = duration * (c.unit / c.divisions);
    else if (refine(c, Number(time.d))) c.ticks = Number(time.n) * (c.unit / Number(time.d));
    if (!Number.isSafeInteger(c.ticks) || !Number.isSafeInteger(c.posT + c.ticks)) {
      toFractions(c);
      c.ticks = Number.NaN;
    }
  }
  return time;
}

/**
 * Quarter notes of a tick count of the current bar (cached: bars repeat the same offsets).
 *
 * @example
 * timeAt(cursorAtUnit2, 3).toFraction(); // "3/2"
 */
export function timeAt(c: Cursor, ticks: number): Fraction {
  if (ticks === 0) return ZERO;
  if (c.cacheUnit !== c.unit) {
    c.offsets.clear();
    c.cacheUnit = c.unit;
  }
  let time = c.offsets.get(ticks);
  if (time === undefined) {
    time = new Fraction(ticks, c.unit);
    if (c.offsets.size >= CACHE_CAP) c.offsets.clear();
    c.offsets.set(ticks, time);
  }
  return time;
}

/**
 * Where the cursor stands in the bar, in quarter notes.
 *
 * @example
 * position(c).toFraction(); // "0" at the start of a bar
 */
export function position(c: Cursor): Fraction {
  return c.unit === 0 ? c.pos : timeAt(c, c.posT);
}

/**
 * True while the cursor stands at the very start of the bar.
 *
 * @example
 * atBarStart(c); // true right after <measure>
 */
export function atBarStart(c: Cursor): boolean {
  return c.unit === 0 ? c.pos.valueOf() === 0 : c.posT === 0;
}

/**
 * Move the cursor forward by the duration `toTime` returned last, remembering the furthest point
 * reached in the bar.
 *
 * @example
 * advance(c, toTime(c, 2, "note"));
 */
export function advance(c: Cursor, by: Fraction): void {
  if (c.unit !== 0) {
    c.posT += c.ticks;
    if (c.posT > c.lengthT) c.lengthT = c.posT;
    return;
  }
  c.pos = c.pos.add(by);
  c.length = maxTime(c.length, c.pos);
}

/**
 * Move the cursor back by the duration `toTime` returned last; false (and the cursor at the bar
 * start) when that would go before the start of the bar.
 *
 * @example
 * back(c, toTime(c, 8, "backup")); // true
 */
export function back(c: Cursor, by: Fraction): boolean {
  if (c.unit !== 0) {
    c.posT -= c.ticks;
    if (c.posT >= 0) return true;
    c.posT = 0;
    return false;
  }
  c.pos = c.pos.sub(by);
  if (c.pos.compare(0) >= 0) return true;
  c.pos = ZERO;
  return false;
}

/**
 * Mark the current position as the onset of a non-chord note, for later `<chord/>` members.
 *
 * @example
 * markOnset(c); lastOnset(c); // the position before the note
 */
export function markOnset(c: Cursor): void {
  if (c.unit !== 0) c.lastOnsetT = c.posT;
  else c.lastOnset = c.pos;
}

/**
 * Onset of the last non-chord note, in quarter notes from the bar start.
 *
 * @example
 * lastOnset(c).toFraction(); // "0"
 */
export function lastOnset(c: Cursor): Fraction {
  return c.unit === 0 ? c.lastOnset : timeAt(c, c.lastOnsetT);
}

/**
 * Length of the bar so far: the furthest position reached.
 *
 * @example
 * barSoFar(c).toFraction(); // "4" after a full 4/4 bar
 */
export function barSoFar(c: Cursor): Fraction {
  return c.unit === 0 ? c.length : timeAt(c, c.lengthT);
}

/**
 * Use an exact time instead of the one `toTime` returned last: `c.ticks` is recomputed for it, so the
 * next `advance` or `back` moves by the exact value.
 *
 * @example
 * toTime(c, 171, "note"); useExact(c, q(1, 6)); advance(c, q(1, 6));
 */
export function useExact(c: Cursor, time: Fraction): void {
  c.ticks = Number.NaN;
  if (c.unit === 0) return;
  if (refine(c, Number(time.d))) c.ticks = Number(time.n) * (c.unit / Number(time.d));
  if (!Number.isSafeInteger(c.ticks) || !Number.isSafeInteger(c.posT + c.ticks)) {
    toFractions(c);
    c.ticks = Number.NaN;
  }
}

/**
 * Put the cursor at an exact position of the current bar (used to land a rounded `<backup>` or
 * `<forward>` on a note boundary).
 *
 * @example
 * moveTo(c, ZERO); // back at the bar start
 */
export function moveTo(c: Cursor, time: Fraction): void {
  if (c.unit !== 0 && refine(c, Number(time.d))) {
    const t = Number(time.n) * (c.unit / Number(time.d));
    if (Number.isSafeInteger(t)) {
      c.posT = t;
      if (c.posT > c.lengthT) c.lengthT = c.posT;
      return;
    }
    toFractions(c);
  }
  c.pos = time;
  c.length = maxTime(c.length, c.pos);
}
