/**
 * What the player schedules, in transport ticks: notes, metronome clicks and the loop range.
 * Times are quarter notes; the tempo is applied by the transport (ticks per quarter), so the
 * slider can change speed while playing.
 */

/** One note to sound, timed in quarter notes from the start of the score. */
export interface PlaybackEvent {
  midi: number;
  onsetQ: number;
  durationQ: number;
  /** 0–1, or 0–127 as in MIDI (values above 1 are read as MIDI velocities). */
  velocity: number;
}

/** A bar's printed number and start, for the position readout. */
export interface BarMark {
  number: number;
  startQ: number;
}

export interface TimelineInput {
  events: readonly PlaybackEvent[];
  beatsPerBar: number;
  /** Length of one beat in quarter notes (1 for x/4, 0.5 for x/8, 1.5 for a dotted-quarter beat). */
  beatUnitQ: number;
  /** Where playback starts and ends, in quarter notes (defaults: 0 and the end of the last bar). */
  startQ?: number;
  endQ?: number;
  /** A time where a full bar starts (default `startQ`); after a pickup, the start of bar 1. */
  barAnchorQ?: number;
  /** Play clicks from the last downbeat at or before the start, plus one whole bar before it. */
  countIn: boolean;
}

export interface Timeline {
  notes: { tick: number; durationQ: number; midi: number; velocity: number }[];
  clicks: { tick: number; downbeat: boolean }[];
  /** Length of the count-in in quarter notes (0 without). */
  countInQ: number;
  startQ: number;
  endQ: number;
  /** The music's range in ticks: the loop goes from here … */
  loopStartTick: number;
  /** … to here (exclusive). */
  loopEndTick: number;
}

const EPS = 1e-9;

export function normaliseVelocity(v: number): number {
  const x = v > 1 ? v / 127 : v;
  return Math.max(0, Math.min(1, x));
}

/** The bar length in quarter notes. */
export function barLengthQ(beatsPerBar: number, beatUnitQ: number): number {
  return beatsPerBar * beatUnitQ;
}

/** The latest bar start (on the grid through `anchor`) at or before `q`. */
export function barStartAtOrBefore(q: number, anchor: number, barQ: number): number {
  return anchor + Math.floor((q - anchor) / barQ + EPS) * barQ;
}

/** Builds the schedule for `ppq` ticks per quarter note. */
export function buildTimeline(input: TimelineInput, ppq: number): Timeline {
  const barQ = barLengthQ(input.beatsPerBar, input.beatUnitQ);
  const startQ = input.startQ ?? 0;
  const anchor = input.barAnchorQ ?? startQ;
  const lastEnd = input.events.reduce((m, e) => Math.max(m, e.onsetQ + e.durationQ), startQ);
  const barEnd = -barStartAtOrBefore(-lastEnd, -anchor, barQ);
  const endQ = input.endQ ?? (barEnd > startQ + EPS ? barEnd : startQ + barQ);
  const clickFromQ = input.countIn ? barStartAtOrBefore(startQ, anchor, barQ) - barQ : startQ;
  const countInQ = startQ - clickFromQ;
  const toTick = (q: number) => Math.round((q - startQ + countInQ) * ppq);
  const notes = input.events
    .filter((e) => e.onsetQ >= startQ - EPS && e.onsetQ < endQ - EPS && e.durationQ > 0)
    .map((e) => ({
      tick: toTick(e.onsetQ),
      durationQ: Math.min(e.durationQ, endQ - e.onsetQ),
      midi: e.midi,
      velocity: normaliseVelocity(e.velocity),
    }))
    .sort((a, b) => a.tick - b.tick || a.midi - b.midi);
  const clicks: Timeline["clicks"] = [];
  const firstBeat = anchor + Math.ceil((clickFromQ - anchor) / input.beatUnitQ - EPS) * input.beatUnitQ;
  for (let q = firstBeat; q < endQ - EPS; q += input.beatUnitQ) {
    const inBar = (((q - anchor) % barQ) + barQ) % barQ;
    clicks.push({ tick: toTick(q), downbeat: inBar < EPS || barQ - inBar < EPS });
  }
  return { notes, clicks, countInQ, startQ, endQ, loopStartTick: toTick(startQ), loopEndTick: toTick(endQ) };
}

/** The score time (quarter notes) at a transport tick; during the count-in it stays at the start. */
export function scoreTimeAtTick(
  t: Pick<Timeline, "countInQ" | "startQ">,
  tick: number,
  ppq: number,
): { q: number; countingIn: boolean } {
  const fromMusic = tick / ppq - t.countInQ;
  return fromMusic < -EPS ? { q: t.startQ, countingIn: true } : { q: t.startQ + Math.max(0, fromMusic), countingIn: false };
}

/**
 * "Bar 3, beat 2" for a score time. Beats count on the bar grid through `anchor` (so a pickup's
 * single beat reads as the last beat); with `bars` the printed bar numbers are used, otherwise bars
 * are counted from `anchor` as bar 1.
 */
export function describePosition(
  q: number,
  grid: { beatsPerBar: number; beatUnitQ: number; anchor: number },
  bars?: readonly BarMark[],
): string {
  const barQ = barLengthQ(grid.beatsPerBar, grid.beatUnitQ);
  const start = barStartAtOrBefore(q, grid.anchor, barQ);
  const mark = bars?.reduce<BarMark | null>((found, b) => (b.startQ <= q + EPS ? b : found), null);
  const number = mark ? mark.number : 1 + Math.round((start - grid.anchor) / barQ);
  const beat = Math.floor((q - start) / grid.beatUnitQ + EPS);
  return `Bar ${number}, beat ${Math.max(0, Math.min(beat, grid.beatsPerBar - 1)) + 1}`;
}
