/**
 * Hand positions: the notes one hand covers before it has to move (DESIGN.md `HandPosition`).
 * A position is read from the passage's fingering and the span model: while each key keeps its
 * finger, no finger serves two keys, the fingers run with the pitch (rising in the right hand,
 * falling in the left: no thumb passing under, no finger crossing over) and the notes stay within
 * the profile's comfortable span, the hand has not moved. The first note that breaks one of these
 * starts the next position. Blocking, note pairs, pivot walks and double notes work per position.
 */
import Fraction from "fraction.js";
import type { Hand, NoteEvent, Passage, Sonority } from "../score/types";
import type { HandProfile, SpanReport } from "./types";
import { spanOf } from "./hand";
import { newFingeringMemo, passageFingers, type FingeringMemo } from "./span";

export interface HandPosition {
  readonly hand: Hand;
  /** The consecutive sonorities the hand plays without moving. */
  readonly sonorities: readonly Sonority[];
  /** Distinct keys of the position, low to high (the first note struck on each key). */
  readonly notes: readonly NoteEvent[];
  /** The finger on each of `notes` (same order): rising with pitch in the right hand, falling in the left. */
  readonly fingers: readonly number[];
  /** First onset; the position lasts until the next position starts (the passage's rhythm of positions). */
  readonly onset: Fraction;
  readonly duration: Fraction;
  /** Stretch from the lowest to the highest key, against the profile, with the outer fingers. */
  readonly span: SpanReport;
  /** True when the keys make a chord shape: two or more keys and no two neighbours a semitone apart, not only steps. */
  readonly chordal: boolean;
}

/**
 * Fingers rising with pitch (right hand) or falling (left hand), one per key, keeping as many of
 * `wanted` as fit: the ordered finger choice nearest to what was asked. `fixed` fingers (not null)
 * must stay. Null when no ordered choice keeps the fixed fingers (or there are more than five keys).
 *
 * @example
 * orderedFingers([2, 2, 5], "right") // [1, 2, 5] (a duplicate 2 repaired)
 * orderedFingers([1, 3], "left") // [4, 3] (one finger changed: the left hand falls with pitch)
 */
export function orderedFingers(wanted: readonly (number | null)[], hand: Hand, fixed: readonly (number | null)[] = []): number[] | null {
  const k = wanted.length;
  if (k === 0) return [];
  if (k > 5) return null;
  let best: number[] | null = null;
  let bestCost = Infinity;
  for (let mask = 1; mask < 32; mask++) {
    const rising = [1, 2, 3, 4, 5].filter((f) => mask & (1 << (f - 1)));
    if (rising.length !== k) continue;
    const tuple = hand === "right" ? rising : rising.reverse();
    if (tuple.some((f, i) => fixed[i] != null && fixed[i] !== f)) continue;
    let cost = 0;
    tuple.forEach((f, i) => {
      const w = wanted[i];
      if (w != null && w !== f) cost += 10 + Math.abs(w - f);
    });
    if (cost < bestCost) [best, bestCost] = [tuple, cost];
  }
  return best;
}

/** True when two (midi → finger) entries can sit under one unmoved hand. */
function fits(a: [number, number], b: [number, number], hand: Hand): boolean {
  if (a[0] === b[0]) return a[1] === b[1];
  if (a[1] === b[1]) return false;
  const up = (b[0] - a[0]) * (b[1] - a[1]) > 0;
  return hand === "right" ? up : !up;
}

/**
 * True when the keys (MIDI, any order) make a chord shape: at least two, no semitone between
 * neighbours, and not a run of steps (three or more keys all a step apart).
 *
 * @example
 * isChordShape([60, 64, 67]) // true
 * isChordShape([60, 62, 64]) // false (a scale run)
 * isChordShape([64, 65]) // false (a semitone cluster)
 */
export function isChordShape(midis: readonly number[]): boolean {
  const m = [...new Set(midis)].sort((a, b) => a - b);
  if (m.length < 2) return false;
  const gaps = m.slice(1).map((x, i) => x - m[i]!);
  if (gaps.some((g) => g < 2)) return false;
  return !(m.length >= 3 && gaps.every((g) => g <= 2));
}

/** A sonority's keys with their fingers, repaired to an ordered set when the estimate crossed them. */
function keysOf(s: Sonority, fingerOf: ReadonlyMap<string, number>, hand: Hand): [number, number][] {
  const byMidi = new Map<number, number | null>();
  for (const n of s.notes) if (!byMidi.has(n.pitch!.midi)) byMidi.set(n.pitch!.midi, fingerOf.get(n.id) ?? null);
  const midis = [...byMidi.keys()].sort((a, b) => a - b);
  const wanted = midis.map((m) => byMidi.get(m)!);
  const fixed = midis.map((m) => {
    const n = s.notes.find((x) => x.pitch!.midi === m)!;
    return n.fingeringSource === "score" || (n.fingering?.length && n.fingeringSource !== "estimated") ? n.fingering?.[0]?.finger ?? null : null;
  });
  const fingers = orderedFingers(wanted, hand, fixed) ?? orderedFingers(wanted, hand) ?? wanted.map((w, i) => w ?? i + 1);
  return midis.map((m, i) => [m, fingers[i]!]);
}

/**
 * The hand positions of one hand of a passage, in order. `breaks` (onsets as numbers) force a new
 * position to start there, e.g. at each beat when a teacher blocks by beat.
 *
 * @example
 * handPositions(makePassage({ right: "C4/8@1 E4/8@3 G4/8@5 C5/8@5" }), "right").map((p) => p.notes.length); // [3, 1]
 */
export function handPositions(
  passage: Passage,
  hand: Hand,
  profile: HandProfile,
  memo: FingeringMemo = newFingeringMemo(),
  breaks?: ReadonlySet<number>,
): HandPosition[] {
  const sons = passage.sonorities[hand];
  if (sons.length === 0) return [];
  // Several families ask for the same positions: remember them per passage (and fingering memo).
  const key = breaks ? null : `${hand}|${profile.spanMm}|${profile.octaveMm}`;
  const known = key ? CACHE.get(passage)?.get(memo)?.get(key) : undefined;
  if (known) return known;
  const found = findPositions(passage, hand, profile, memo, breaks);
  if (key) {
    let byPassage = CACHE.get(passage);
    if (!byPassage) CACHE.set(passage, (byPassage = new WeakMap()));
    let byMemo = byPassage.get(memo);
    if (!byMemo) byPassage.set(memo, (byMemo = new Map()));
    byMemo.set(key, found);
  }
  return found;
}

const CACHE = new WeakMap<Passage, WeakMap<FingeringMemo, Map<string, HandPosition[]>>>();

function findPositions(passage: Passage, hand: Hand, profile: HandProfile, memo: FingeringMemo, breaks?: ReadonlySet<number>): HandPosition[] {
  const sons = passage.sonorities[hand];
  const fingerOf = passageFingers(passage, hand, memo);
  const runs: { sons: Sonority[]; keys: Map<number, [number, number, NoteEvent]> }[] = [];
  for (const s of sons) {
    const keys = keysOf(s, fingerOf, hand);
    const cur = runs[runs.length - 1];
    let moves = !cur || (breaks?.has(s.onset.valueOf()) ?? false);
    if (!moves && cur) {
      const all = [...cur.keys.values()].map(([m, f]) => [m, f] as [number, number]);
      moves = keys.some((k) => all.some((a) => !fits(a, k, hand)));
      if (!moves) {
        const merged = [...all, ...keys.filter((k) => !cur.keys.has(k[0]))].sort((a, b) => a[0] - b[0]);
        const span = spanOf(merged.map(([midi]) => ({ midi })), merged.map(([, f]) => f), profile);
        moves = span.overComfortable && merged.length > keys.length;
      }
    }
    const target = moves ? { sons: [] as Sonority[], keys: new Map<number, [number, number, NoteEvent]>() } : cur!;
    if (moves) runs.push(target);
    target.sons.push(s);
    for (const [m, f] of keys) if (!target.keys.has(m)) target.keys.set(m, [m, f, s.notes.find((n) => n.pitch!.midi === m)!]);
  }
  const lastBar = passage.measures[passage.measures.length - 1];
  const end = lastBar ? lastBar.start.add(lastBar.length) : sons[sons.length - 1]!.onset.add(sons[sons.length - 1]!.duration);
  return runs.map((r, i) => {
    const keys = [...r.keys.values()].sort((a, b) => a[0] - b[0]);
    const onset = r.sons[0]!.onset;
    const last = r.sons[r.sons.length - 1]!;
    const next = runs[i + 1]?.sons[0]!.onset;
    const stop = next ?? (last.onset.add(last.duration).compare(end) > 0 ? end : last.onset.add(last.duration));
    const fingers = keys.map((k) => k[1]);
    return {
      hand,
      sonorities: r.sons,
      notes: keys.map((k) => k[2]),
      fingers,
      onset,
      duration: stop.sub(onset),
      span: spanOf(keys.map(([midi]) => ({ midi })), fingers, profile),
      chordal: isChordShape(keys.map((k) => k[0])),
    };
  });
}
