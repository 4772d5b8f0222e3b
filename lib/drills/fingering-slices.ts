/**
 * Slices for the fingering search: the notes of one hand grouped by onset (a chord or a single note),
 * with the candidate finger tuples of each slice.
 */
import type { Hand, NoteEvent } from "../score/types";

/** Notes struck together by one hand, distinct pitches low to high. */
export interface Slice {
  /** Distinct MIDI numbers, ascending (at most five). */
  readonly midis: readonly number[];
  /** Indexes into the input events, per distinct pitch. */
  readonly members: readonly (readonly number[])[];
  /** Candidate finger tuples, one finger per distinct pitch. */
  readonly states: readonly (readonly number[])[];
  /** 0-based measure index of the slice. */
  readonly measure: number;
  /** True when no note of the hand sounds just before this slice (a rest: the hand can lift). */
  readonly lift: boolean;
  /** Onset in quarter notes. */
  readonly onset: number;
  /** A grace note (ornament) slice. */
  readonly grace: boolean;
  /** Per distinct pitch: when it stops sounding (ties included), in quarter notes. */
  readonly ends: readonly number[];
}

/** The slices plus where tie continuations take their finger from. */
export interface SliceSet {
  readonly slices: readonly Slice[];
  /** Event index → index of the struck event it continues (tied notes keep their finger). */
  readonly tiedTo: ReadonlyMap<number, number>;
  /** The finger written in the score per input event (chord stacks spread over the chord), or null. */
  readonly written: readonly (number | null)[];
}

const COMBOS: readonly (readonly number[])[][] = buildCombos();
/** One-finger states, by finger (shared, never changed). */
const SINGLE: readonly (readonly (readonly number[])[])[] = [1, 2, 3, 4, 5].map((f) => [[f]]);
/** The same tuples falling, for the left hand (built once). */
const REVERSED: readonly (readonly number[])[][] = COMBOS.map((ts) => ts.map((t) => [...t].reverse()));

function buildCombos(): (readonly number[])[][] {
  const byLength: (readonly number[])[][] = [[], [], [], [], [], []];
  for (let mask = 1; mask < 32; mask++) {
    const fingers = [1, 2, 3, 4, 5].filter((f) => mask & (1 << (f - 1)));
    byLength[fingers.length]!.push(fingers);
  }
  return byLength;
}

/**
 * Finger tuples for `count` distinct pitches, low to high: rising for the right hand, falling for the
 * left (the left hand mirrors the right), filtered by fixed fingers (null = free).
 *
 * @example
 * candidateStates(2, "right", [null, null]).length // 10
 * candidateStates(1, "left", [3]) // [[3]]
 */
export function candidateStates(count: number, hand: Hand, fixed: readonly (number | null)[]): (readonly number[])[] {
  const oriented = (hand === "right" ? COMBOS : REVERSED)[count] ?? [];
  if (fixed.every((f) => f == null)) return oriented;
  const ok = oriented.filter((t) => t.every((f, i) => fixed[i] == null || fixed[i] === f));
  return ok.length > 0 ? ok : oriented;
}

function givenFinger(e: NoteEvent): number | null {
  const f = e.fingering?.[0]?.finger;
  return f !== undefined && f >= 1 && f <= 5 ? f : null;
}

/**
 * Written fingers of one chord (events struck together by one hand). Notation programs often store a
 * chord's stacked fingering ("1 2 3" printed in a column) on one note of the chord: when one note
 * carries as many plain marks (no substitution, no alternate) as its voice's chord has keys and no
 * other note is marked, the marks go to those keys in the hand's order — rising fingers with rising pitch in the
 * right hand, falling in the left. Otherwise each note keeps its own first mark.
 *
 * @example
 * chordWrittenFingers([d5With123, fSharp5, a5], "right") // [1, 2, 3]
 */
export function chordWrittenFingers(chord: readonly NoteEvent[], hand: Hand): (number | null)[] {
  const own = chord.map(givenFinger);
  const marked = chord.filter((e) => e.fingering?.length);
  const holder = marked[0];
  const stack = holder?.fingering;
  if (marked.length !== 1 || !stack || stack.length < 2) return own;
  // The stack belongs to the holder's own chord (its voice), not to other voices struck with it.
  const keys = [...new Set(chord.filter((e) => e.voice === holder.voice).map((e) => e.pitch?.midi ?? -1))].sort((a, b) => a - b);
  if (stack.length !== keys.length) return own;
  if (stack.some((m) => m.substitution || m.alternate || m.finger < 1 || m.finger > 5)) return own;
  const fingers = stack.map((m) => m.finger).sort((a, b) => (hand === "right" ? a - b : b - a));
  if (new Set(fingers).size !== fingers.length) return own;
  return chord.map((e, k) => (e.voice === holder.voice ? fingers[keys.indexOf(e.pitch?.midi ?? -1)] ?? null : own[k]!));
}

/** Keep at most five pitches: the outer two and the inner ones spread evenly. */
function keepFive(midis: number[]): number[] {
  if (midis.length <= 5) return midis;
  const picks = [0, 1, 2, 3, 4].map((i) => Math.round((i * (midis.length - 1)) / 4));
  return picks.map((i) => midis[i]!);
}

/**
 * Group one hand's events into slices. Rests are skipped; a note continuing a tie keeps the finger of
 * the note it continues; grace notes come before the note they ornament, each on its own. `hints`
 * (per event, null = none) narrow a slice's candidates when they fit it; written fingerings win.
 *
 * @example
 * buildSlices(events, "right").slices.length // number of distinct onsets with struck notes
 */
export function buildSlices(events: readonly NoteEvent[], hand: Hand, hints?: readonly (number | null)[]): SliceSet {
  const order = events.map((_, i) => i).filter((i) => events[i]!.pitch !== null);
  const onset = new Float64Array(events.length);
  for (const i of order) onset[i] = events[i]!.onset.valueOf();
  order.sort((a, b) => {
    const ea = events[a]!;
    const eb = events[b]!;
    const d = onset[a]! - onset[b]!;
    if (d !== 0) return d;
    if (!!ea.grace !== !!eb.grace) return ea.grace ? -1 : 1;
    return a - b;
  });
  const tiedTo = new Map<number, number>();
  const lastStruck = new Map<number, number>();
  const tieEnd = new Map<number, number>();
  const groups: number[][] = [];
  let prevKey: number | null = null;
  for (const i of order) {
    const e = events[i]!;
    const midi = e.pitch!.midi;
    // A tie continues the last struck note of this key only if that note (with its ties) sounds until here.
    if ((e.tie === "stop" || e.tie === "continue") && lastStruck.has(midi) && Math.abs(tieEnd.get(midi)! - onset[i]!) < 1e-9) {
      tiedTo.set(i, lastStruck.get(midi)!);
      tieEnd.set(midi, onset[i]! + e.duration.valueOf());
      continue;
    }
    lastStruck.set(midi, i);
    tieEnd.set(midi, onset[i]! + e.duration.valueOf());
    const key = e.onset.valueOf();
    if (e.grace || prevKey === null || key !== prevKey || events[groups.at(-1)![0]!]!.grace) {
      groups.push([i]);
    } else {
      groups.at(-1)!.push(i);
    }
    prevKey = key;
  }
  const written: (number | null)[] = events.map(() => null);
  for (const g of groups) {
    const fingers = g.length === 1 ? [givenFinger(events[g[0]!]!)] : chordWrittenFingers(g.map((i) => events[i]!), hand);
    g.forEach((i, k) => { written[i] = fingers[k] ?? null; });
  }
  // Sounding end per struck event, tied continuations included; a slice lifts when nothing sounds before it.
  const end = new Float64Array(events.length);
  for (const g of groups) for (const i of g) end[i] = onset[i]! + events[i]!.duration.valueOf();
  for (const [i, from] of tiedTo) end[from] = Math.max(end[from]!, onset[i]! + events[i]!.duration.valueOf());
  let sounding = -Infinity;
  const lifts = groups.map((g) => {
    const t = onset[g[0]!]!;
    const lift = sounding > -Infinity && sounding < t - 1e-9;
    for (const i of g) sounding = Math.max(sounding, end[i]!);
    return lift;
  });
  const slices = groups.map((g, gi): Slice => {
    const lift = lifts[gi]!;
    const t = onset[g[0]!]!;
    if (g.length === 1) {
      // A single note (the common case): its written finger, else its hint, else any finger.
      const i = g[0]!;
      const f = written[i] ?? hints?.[i] ?? null;
      const states = f !== null && f >= 1 && f <= 5 ? SINGLE[f - 1]! : COMBOS[1]!;
      return { midis: [events[i]!.pitch!.midi], members: [g], states, measure: events[i]!.measure, lift, onset: t, grace: !!events[i]!.grace, ends: [end[i]!] };
    }
    const all = [...new Set(g.map((i) => events[i]!.pitch!.midi))].sort((a, b) => a - b);
    const midis = keepFive(all);
    const members = midis.map((m) => g.filter((i) => events[i]!.pitch!.midi === m));
    const given = members.map((ms) => ms.map((i) => written[i] ?? null).find((f) => f !== null) ?? null);
    let states = candidateStates(midis.length, hand, given);
    if (hints) {
      // A hint (a finger carried over from elsewhere) narrows the choice only when it fits the slice.
      const hinted = members.map((ms, j) => given[j] ?? ms.map((i) => hints[i] ?? null).find((f) => f !== null) ?? null);
      const narrowed = states.filter((t) => t.every((f, j) => hinted[j] == null || hinted[j] === f));
      if (narrowed.length > 0) states = narrowed;
    }
    const ends = members.map((ms) => Math.max(...ms.map((i) => end[i]!)));
    return { midis, members, states, measure: events[g[0]!]!.measure, lift, onset: t, grace: false, ends };
  });
  return { slices, tiedTo, written };
}

/**
 * The finger written in the score for an event (first mark), or null.
 *
 * @example
 * scoreFinger(event) // 3 when the score shows "3"
 */
export function scoreFinger(e: NoteEvent): number | null {
  return givenFinger(e);
}
