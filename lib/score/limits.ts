/**
 * Sane bounds on the numbers a score holds: divisions, note and bar lengths, onsets, tuplet ratios,
 * the common denominator a writer needs, the whole length and the metronome clicks it would make.
 * A file can be well-formed and still say that one note lasts 10^15 quarters; everything built from
 * the model (playback events, clicks, drills, engraved pages) would then grow with that number
 * instead of with the size of the file. `checkScoreBounds` refuses such a score with a ScoreError
 * that names the bar, so the upload is refused before anything is stored.
 */
import type Fraction from "fraction.js";
import { ScoreError } from "./errors";
import type { Measure, NoteEvent, Score } from "./types";

/** The bounds `checkScoreBounds` applies; every value is inclusive. */
export interface ScoreBounds {
  /** Most divisions per quarter note a bar may declare. */
  readonly maxDivisions: number;
  /** Longest single note or rest, in quarter notes. */
  readonly maxNoteQuarters: number;
  /** Longest bar, in quarter notes. */
  readonly maxBarQuarters: number;
  /** Largest `actual` or `normal` count of a note's combined tuplet ratio. */
  readonly maxTuplet: number;
  /** Largest common denominator of all times (the divisions a writer would need). */
  readonly maxCommonDivisions: number;
  /** Longest score, in quarter notes. */
  readonly maxScoreQuarters: number;
  /** Most metronome clicks the bars' time signatures make in all. */
  readonly maxClicks: number;
}

/**
 * Default bounds. The reference corpus (fixtures/reference: 93 files incl. the MusicXML test suite
 * and 12 real scores) peaks at divisions 960, a 28-quarter bar and note, tuplets 17:8 and 556 quarters
 * in all, so each bound leaves a wide margin. Common practice: exporters write divisions up to a few
 * thousand (960, 10080); many readers keep durations in 32-bit integers, so the common divisions ×
 * the longest note must stay below 2^31 (1,000,000 × 256 = 2.56 × 10^8).
 */
export const SCORE_BOUNDS: ScoreBounds = {
  maxDivisions: 100_000,
  maxNoteQuarters: 256,
  maxBarQuarters: 256,
  maxTuplet: 128,
  maxCommonDivisions: 1_000_000,
  maxScoreQuarters: 200_000,
  maxClicks: 200_000,
};

const where = (m: Measure | undefined, index: number) => ({ measure: index, number: m?.number ?? String(index + 1) });
const fail = (message: string, m: Measure | undefined, index: number, element?: string): never => {
  throw new ScoreError("bad-duration", message, { ...where(m, index), element });
};

function gcd(a: bigint, b: bigint): bigint {
  while (b) [a, b] = [b, a % b];
  return a;
}

/** Number of clicks a bar makes (as lib/score/performance counts beats), without making them. */
export function clickCount(m: Pick<Measure, "time" | "length">): number {
  const compound = m.time.beatType >= 8 && m.time.beats % 3 === 0 && m.time.beats > 3;
  const beat = (compound ? 12 : 4) / m.time.beatType;
  return beat > 0 ? Math.ceil(m.length.valueOf() / beat - 1e-9) : Infinity;
}

/**
 * Throws a ScoreError (code "bad-duration", message naming the bar) when a number in the score is
 * outside `bounds`; returns the score's length in quarter notes otherwise. Runs in one pass over the
 * bars and notes, so it costs about as much as counting them.
 *
 * @example
 * const { score } = readScore(upload);
 * checkScoreBounds(score); // throws for <duration>10^15</duration>: "A note lasts … (bar 3)"
 */
export function checkScoreBounds(score: Score, bounds: ScoreBounds = SCORE_BOUNDS): number {
  let common = 1n;
  const limit = BigInt(bounds.maxCommonDivisions);
  const useDenominator = (f: Fraction, m: Measure | undefined, index: number, what: string) => {
    const d = BigInt(f.d);
    common = (common / gcd(common, d)) * d;
    if (common > limit) fail(`The ${what} here needs more than ${bounds.maxCommonDivisions.toLocaleString("en")} divisions per quarter note together with the rest of the piece`, m, index);
  };
  let clicks = 0;
  for (const m of score.measures) {
    const length = m.length.valueOf();
    if (!(m.divisions >= 1 && m.divisions <= bounds.maxDivisions)) {
      fail(`<divisions> is ${m.divisions}; Knotwork reads 1 to ${bounds.maxDivisions.toLocaleString("en")} divisions per quarter note`, m, m.index, "divisions");
    }
    if (!(length >= 0 && length <= bounds.maxBarQuarters)) fail(`The bar lasts ${fmt(length)} quarter notes; the most a bar may last is ${bounds.maxBarQuarters}`, m, m.index);
    if (!(m.time.beats >= 1 && m.time.beats <= 1024 && m.time.beatType >= 1 && m.time.beatType <= 1024)) {
      fail(`The time signature ${m.time.beats}/${m.time.beatType} is outside 1–1024 over 1–1024`, m, m.index, "time");
    }
    if (!(m.start.valueOf() + length <= bounds.maxScoreQuarters)) {
      fail(`The piece runs past ${bounds.maxScoreQuarters.toLocaleString("en")} quarter notes`, m, m.index);
    }
    useDenominator(m.start, m, m.index, "bar start");
    useDenominator(m.length, m, m.index, "bar length");
    clicks += clickCount(m);
    if (clicks > bounds.maxClicks) fail(`The time signatures make more than ${bounds.maxClicks.toLocaleString("en")} metronome beats`, m, m.index, "time");
  }
  for (const e of score.events) checkEvent(e, score.measures[e.measure], bounds, useDenominator);
  const last = score.measures[score.measures.length - 1];
  return last ? last.start.add(last.length).valueOf() : 0;
}

function checkEvent(
  e: NoteEvent,
  m: Measure | undefined,
  bounds: ScoreBounds,
  useDenominator: (f: Fraction, m: Measure | undefined, index: number, what: string) => void,
): void {
  const duration = e.duration.valueOf();
  if (!(duration >= 0 && duration <= bounds.maxNoteQuarters)) {
    fail(`A ${e.pitch ? "note" : "rest"} lasts ${fmt(duration)} quarter notes; the most one may last is ${bounds.maxNoteQuarters}`, m, e.measure, "duration");
  }
  const onset = e.onset.valueOf();
  if (m) {
    const start = m.start.valueOf();
    const end = start + m.length.valueOf();
    if (!(onset >= start && onset <= end)) fail(`A note starts outside its bar (${fmt(onset - start)} quarter notes from the bar's start)`, m, e.measure);
  } else {
    fail("A note belongs to no bar", m, e.measure);
  }
  const t = e.written.tuplet;
  if (t && !(t.actual >= 1 && t.normal >= 1 && t.actual <= bounds.maxTuplet && t.normal <= bounds.maxTuplet)) {
    fail(`The tuplet ratio ${t.actual}:${t.normal} is outside 1–${bounds.maxTuplet}`, m, e.measure, "time-modification");
  }
  useDenominator(e.onset, m, e.measure, "note's start");
  useDenominator(e.duration, m, e.measure, "note's length");
}

function fmt(n: number): string {
  return Math.abs(n) >= 1e6 || (n !== 0 && Math.abs(n) < 1e-3) ? n.toExponential(2) : String(Math.round(n * 1000) / 1000);
}
