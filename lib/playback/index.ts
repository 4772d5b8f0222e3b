/**
 * What a player needs to sound a score, a range of its bars or one hand: the one place that turns
 * the score model into playback events. Built on lib/score's `toPerformance`, so tied notes sound
 * once for their full merged length (`mergeTies`), grace notes take their short slot before the
 * beat and dynamics set the velocity. Pure and client-safe: imports only lib/score.
 */
import { pianoPart } from "../score/parts";
import { toPerformance } from "../score/performance";
import type { Score } from "../score/types";

/** One note to sound, timed in quarter notes from the start of the score. */
export interface PlaybackNote {
  midi: number;
  onsetQ: number;
  durationQ: number;
  /** MIDI velocity 1–127. */
  velocity: number;
  staff: number;
}

/** A bar's printed number and start, for the position readout. */
export interface PlaybackBar {
  number: number;
  startQ: number;
}

/** The player's props for a score (events, metre, tempo, range and bars). */
export interface ScorePlayback {
  events: PlaybackNote[];
  beatsPerBar: number;
  /** Beat length in quarter notes: 1 for x/4, 0.5 for x/8. */
  beatUnitQ: number;
  /** Quarter notes per minute: the first metronome mark, or 120. */
  initialBpm: number;
  /** The range played, in quarter notes from the start of the score. */
  startQ: number;
  endQ: number;
  /** Where a full bar starts: after a pickup, the start of bar 1. */
  barAnchorQ: number;
  bars: PlaybackBar[];
}

export interface PlaybackOptions {
  /** First and last measure to play, as 0-based measure indices (default: the whole score). */
  fromMeasure?: number;
  toMeasure?: number;
  /**
   * Only this hand: the piano part's staff 1 (right) or 2 (left), the piano found by staves and name
   * (lib/score/parts), so a song's voice part is left out; a one-staff piano part plays whole.
   */
  hand?: "right" | "left";
}

/** Printed bar number as an integer; index + 1 when the number is not numeric. */
function printedNumber(number: string, index: number): number {
  const n = Number.parseInt(number, 10);
  return Number.isFinite(n) ? n : index + 1;
}

/**
 * Playback of a score, or of bars `fromMeasure`–`toMeasure`, or of one hand. A note is played when
 * it starts inside the range; a note tied across a barline is one note with the tied length.
 *
 * @example
 * const p = playbackEvents(score, { fromMeasure: 4, toMeasure: 5, hand: "right" });
 * <Player {...p} />;
 */
export function playbackEvents(score: Score, options: PlaybackOptions = {}): ScorePlayback {
  const measures = score.measures;
  const last = measures.length - 1;
  const from = Math.max(0, Math.min(options.fromMeasure ?? 0, last));
  const to = Math.max(from, Math.min(options.toMeasure ?? last, last));
  const first = measures[from];
  const startQ = first ? first.start.valueOf() : 0;
  const endQ = measures[to] ? measures[to].start.add(measures[to].length).valueOf() : 0;
  const piano = options.hand === undefined ? undefined : (pianoPart(score) ?? score.parts[0]);
  const staves = piano?.staves ?? 1;
  const staff = options.hand === undefined || staves < 2 ? null : options.hand === "right" ? 1 : 2;
  const played = (n: { part: string; staff: number }) => !piano || (n.part === piano.id && (staff === null || n.staff === staff));
  // Notes only: the events are bounded by the number of notes in the file, never by a length in it.
  const perf = toPerformance(score, { clicks: false });
  const events = perf.notes
    .filter((n) => n.startQuarters >= startQ && n.startQuarters < endQ && played(n))
    .map((n) => ({ midi: n.midi, onsetQ: n.startQuarters, durationQ: n.quarters, velocity: n.velocity, staff: n.staff }));
  const ranged = measures.slice(from, to + 1);
  const anchor = ranged.find((m) => !m.implicit) ?? first;
  return {
    events,
    beatsPerBar: first?.time.beats ?? 4,
    beatUnitQ: first ? 4 / first.time.beatType : 1,
    initialBpm: Math.round(perf.bpm),
    startQ,
    endQ,
    barAnchorQ: anchor ? anchor.start.valueOf() : startQ,
    bars: ranged.map((m) => ({ number: printedNumber(m.number, m.index), startQ: m.start.valueOf() })),
  };
}
