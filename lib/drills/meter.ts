/**
 * Meter for the rhythm families: whether a time signature is compound, its beat as a note value
 * (a dotted quarter in 6/8), metronome marks counted in that beat, and the regroupings that cross
 * a meter's own grouping (threes in simple time, twos or fours in compound time; common practice).
 */
import Fraction from "fraction.js";
import type { TimeSignature } from "../score/types";
import { beatLength } from "./groups";

/**
 * True for compound meters (6/8, 9/8, 12/8, 6/4, 6/16 …): beats in threes of the written unit
 * (common practice).
 *
 * @example
 * isCompound({ beats: 6, beatType: 8 }); // true
 * isCompound({ beats: 3, beatType: 4 }); // false
 */
export function isCompound(time: TimeSignature): boolean {
  return time.beats % 3 === 0 && time.beats > 3;
}

/** The beat of a meter as a note value: its MusicXML type name, dots and length in quarter notes. */
export interface BeatUnit {
  /** MusicXML `beat-unit` value: "quarter", "eighth", "half" … */
  readonly type: string;
  readonly dots: number;
  /** Length in quarter notes. */
  readonly quarters: Fraction;
  /** How a teacher writes it in text: "♩", "♩.", "♪" … */
  readonly symbol: string;
}

const TYPES: Readonly<Record<number, { type: string; symbol: string }>> = {
  1: { type: "whole", symbol: "𝅝" },
  2: { type: "half", symbol: "𝅗𝅥" },
  4: { type: "quarter", symbol: "♩" },
  8: { type: "eighth", symbol: "♪" },
  16: { type: "16th", symbol: "𝅘𝅥𝅯" },
};

/**
 * The beat of a meter: the dotted value above the written unit in compound time (a dotted quarter
 * in 6/8), else the written unit (common practice; MusicXML `beat-unit` names).
 *
 * @example
 * beatUnit({ beats: 6, beatType: 8 }); // { type: "quarter", dots: 1, quarters: 3/2, symbol: "♩." }
 * beatUnit({ beats: 3, beatType: 4 }).type; // "quarter"
 */
export function beatUnit(time: TimeSignature): BeatUnit {
  const quarters = beatLength(time);
  const compound = isCompound(time) && time.beatType >= 2;
  const base = compound ? time.beatType / 2 : time.beatType;
  const t = TYPES[base] ?? TYPES[4]!;
  const dots = compound ? 1 : 0;
  return { type: t.type, dots, quarters, symbol: `${t.symbol}${dots ? "." : ""}` };
}

/**
 * A quarter-note metronome mark counted in the meter's beat (rounded to a whole mark).
 *
 * @example
 * inBeats(90, { beats: 6, beatType: 8 }); // 60 (♩. = 60)
 * inBeats(72, { beats: 4, beatType: 4 }); // 72
 */
export function inBeats(quarterBpm: number, time: TimeSignature): number {
  return Math.round(quarterBpm / beatUnit(time).quarters.valueOf());
}

/**
 * A beat-unit metronome mark as quarter notes per minute (the model's unit).
 *
 * @example
 * toQuarters(60, { beats: 6, beatType: 8 }); // 90
 */
export function toQuarters(beatBpm: number, time: TimeSignature): number {
  return Math.round(beatBpm * beatUnit(time).quarters.valueOf());
}

/**
 * A metronome mark as a teacher writes it, in the meter's beat ("♩. = 60").
 *
 * @example
 * markText(90, { beats: 6, beatType: 8 }); // "♩. = 60"
 */
export function markText(quarterBpm: number, time: TimeSignature): string {
  return `${beatUnit(time).symbol} = ${inBeats(quarterBpm, time)}`;
}

/**
 * How a run of equal values sits in the meter: notes per beat (null when the value does not
 * divide the beat), and whether it moves in threes (three notes per beat: eighths in 6/8,
 * triplet eighths in 2/4).
 *
 * @example
 * runFeel(new Fraction(1, 2), { beats: 6, beatType: 8 }); // { perBeat: 3, threes: true }
 * runFeel(new Fraction(1, 4), { beats: 4, beatType: 4 }); // { perBeat: 4, threes: false }
 */
export function runFeel(value: Fraction, time: TimeSignature): { perBeat: number | null; threes: boolean } {
  const n = beatLength(time).div(value);
  if (n.d !== 1n) return { perBeat: null, threes: false };
  const perBeat = Number(n.n);
  // Six or twelve to the beat move in twos inside each third of the beat, not in threes.
  return { perBeat, threes: perBeat === 3 };
}

/**
 * Dotted rhythm that stays inside the beat, as factors of the run's value for each note of a
 * beat group: pairs (long-short 3/2 + 1/2, or the reverse) when the beat holds an even number of
 * notes, and for three notes to the beat the dotted figure of compound time (♪. 𝅘𝅥𝅯 ♪ long-short,
 * 𝅘𝅥𝅯 ♪. ♪ short-long; common practice). Null when the group cannot take the pattern.
 *
 * @example
 * dottedFactors(3, "long-short")!.map(String); // ["1.5", "0.5", "1"]
 * dottedFactors(2, "short-long")!.map(String); // ["0.5", "1.5"]
 */
export function dottedFactors(notesInGroup: number, order: "long-short" | "short-long"): Fraction[] | null {
  const long = new Fraction(3, 2);
  const short = new Fraction(1, 2);
  const pair = order === "long-short" ? [long, short] : [short, long];
  if (notesInGroup === 3) return [...pair, new Fraction(1)];
  if (notesInGroup >= 2 && notesInGroup % 2 === 0) return Array.from({ length: notesInGroup }, (_, i) => pair[i % 2]);
  return null;
}
