/**
 * Fingering estimator: a second-order Viterbi search over finger assignments that minimises the
 * ergonomic rule costs of Parncutt et al. (1997) — or Jacobs (2001) — for one hand (FACTS.md §5).
 *
 * Single notes are scored exactly as in the published model (pairs and trios of consecutive notes).
 * Chords are an extension: a chord's fingers rise with pitch (fall for the left hand) within the
 * span table; the spans inside a chord are scored with rules 1–3; between slices the lowest and the
 * highest lines are each scored and averaged.
 */
import type { Hand, NoteEvent } from "../score/types";
import { buildSlices, scoreFinger, type Slice } from "./fingering-slices";
import {
  chordPracticalPenalty,
  clearCosts,
  emptyCosts,
  noteCosts,
  pairCosts,
  totalCost,
  trioCosts,
  type FingeringModel,
  type RuleCosts,
} from "./fingering-rules";

export interface FingeringOptions {
  readonly model?: FingeringModel;
  /**
   * Preferred finger per input event (null = none), e.g. carried over from the passage a drill note
   * comes from. A hint is followed when it fits its chord; unlike a written fingering it is not forced.
   */
  readonly hints?: readonly (number | null)[];
  /** When false, only `fingers` is filled (costs stay empty), which is much faster. Default true. */
  readonly costs?: boolean;
}

export interface FingeringResult {
  /** Finger per input event (same order); null for rests. Written fingerings are kept. */
  readonly fingers: (number | null)[];
  /** Rule points per input event (a slice's points shared by its notes; 0 for rests and ties). */
  readonly costPerNote: number[];
  /** Rule points per 0-based measure index. */
  readonly costPerBar: Map<number, number>;
  /** Points per rule per measure, for explaining what makes a bar hard. */
  readonly rulesPerBar: Map<number, RuleCosts>;
}

/** Line notes of a slice: the lowest (0) and the highest (1) kept pitch. */
const lineIndex = (s: Slice, line: 0 | 1): number => (line === 0 ? 0 : s.midis.length - 1);

const chordScratch = emptyCosts();

/** Rules on one slice alone: note rules with neighbour colours, and spans inside a chord. */
function sliceCosts(slices: readonly Slice[], s: number, state: readonly number[], hand: Hand, model: FingeringModel, into: RuleCosts): void {
  const cur = slices[s]!;
  const prev = slices[s - 1];
  const next = slices[s + 1];
  for (let j = 0; j < cur.midis.length; j++) {
    const line: 0 | 1 = j === 0 ? 0 : 1;
    const p = prev ? prev.midis[lineIndex(prev, line)]! : null;
    const n = next ? next.midis[lineIndex(next, line)]! : null;
    noteCosts(cur.midis[j]!, state[j]!, p, n, model, into);
  }
  for (let j = 0; j + 1 < cur.midis.length; j++) {
    const chord = clearCosts(chordScratch);
    pairCosts(cur.midis[j]!, state[j]!, cur.midis[j + 1]!, state[j + 1]!, hand, model, chord);
    into.stretch += chord.stretch;
    into.smallSpan += chord.smallSpan;
    into.largeSpan += chord.largeSpan;
    into.overPractical += chordPracticalPenalty(cur.midis[j]!, state[j]!, cur.midis[j + 1]!, state[j + 1]!, hand, model);
  }
}

/** Pair rules from slice s to s+1 along the low and high lines (averaged when they differ). */
function linkCosts(a: Slice, fa: readonly number[], b: Slice, fb: readonly number[], hand: Hand, model: FingeringModel, into: RuleCosts): void {
  const single = a.midis.length === 1 && b.midis.length === 1;
  const weight = single ? 1 : 0.5;
  const lines: (0 | 1)[] = single ? [0] : [0, 1];
  for (const line of lines) {
    const i = lineIndex(a, line);
    const j = lineIndex(b, line);
    addScaled(into, pairCosts(a.midis[i]!, fa[i]!, b.midis[j]!, fb[j]!, hand, model), weight);
  }
}

/** Trio rules over slices s-1, s, s+1 along the low and high lines. */
function trioLinkCosts(a: Slice, fa: readonly number[], b: Slice, fb: readonly number[], c: Slice, fc: readonly number[], hand: Hand, model: FingeringModel, into: RuleCosts): void {
  const single = a.midis.length === 1 && b.midis.length === 1 && c.midis.length === 1;
  const weight = single ? 1 : 0.5;
  const lines: (0 | 1)[] = single ? [0] : [0, 1];
  for (const line of lines) {
    const i = lineIndex(a, line);
    const j = lineIndex(b, line);
    const k = lineIndex(c, line);
    addScaled(into, trioCosts(a.midis[i]!, fa[i]!, b.midis[j]!, fb[j]!, c.midis[k]!, fc[k]!, hand, model), weight);
  }
}

function addScaled(into: RuleCosts, add: RuleCosts, w: number): void {
  for (const key of Object.keys(add) as (keyof RuleCosts)[]) into[key] += add[key] * w;
}

/**
 * Search cost: the rule points plus a tie-break far below one point — among equally costly
 * fingerings, prefer the one with fewer hand-position changes (rule 4).
 */
const rank = (c: RuleCosts): number => totalCost(c) + 1e-3 * c.positionChangeCount;

/**
 * Second tie-break, for chords only (common practice): the chord's outer notes go to the hand's outer
 * fingers when nothing else decides — a C major triad is 1-3-5, not 1-2-4.
 */
function chordTieBreak(state: readonly number[]): number {
  if (state.length < 2) return 0;
  const lo = Math.min(...state);
  const hi = Math.max(...state);
  return 1e-4 * (lo - 1 + (5 - hi));
}

/** `rank` of the pair rules between two slices, summed into `into` without allocating. */
function linkRank(a: Slice, fa: readonly number[], b: Slice, fb: readonly number[], hand: Hand, model: FingeringModel, into: RuleCosts): number {
  pairCosts(a.midis[0]!, fa[0]!, b.midis[0]!, fb[0]!, hand, model, into);
  if (a.midis.length === 1 && b.midis.length === 1) return rank(into);
  const i = a.midis.length - 1, j = b.midis.length - 1;
  pairCosts(a.midis[i]!, fa[i]!, b.midis[j]!, fb[j]!, hand, model, into);
  return 0.5 * rank(into);
}

const trioScratch = emptyCosts();

/** `rank` of the trio rules without allocating: only rules 4, 5 and 7 touch the scratch tally. */
function trioRank(a: Slice, fa: readonly number[], b: Slice, fb: readonly number[], c: Slice, fc: readonly number[], hand: Hand, model: FingeringModel): number {
  const single = a.midis.length === 1 && b.midis.length === 1 && c.midis.length === 1;
  const t = trioScratch;
  t.positionChangeCount = 0; t.positionChangeSize = 0; t.threeFourFive = 0;
  const i0 = 0, j0 = 0, k0 = 0;
  trioCosts(a.midis[i0]!, fa[i0]!, b.midis[j0]!, fb[j0]!, c.midis[k0]!, fc[k0]!, hand, model, t);
  if (!single) {
    const i = a.midis.length - 1, j = b.midis.length - 1, k = c.midis.length - 1;
    trioCosts(a.midis[i]!, fa[i]!, b.midis[j]!, fb[j]!, c.midis[k]!, fc[k]!, hand, model, t);
  }
  const w = single ? 1 : 0.5;
  return w * (t.positionChangeCount * (1 + 1e-3) + t.positionChangeSize + t.threeFourFive);
}

/** Best state per slice by second-order Viterbi. */
function search(slices: readonly Slice[], hand: Hand, model: FingeringModel): number[] {
  const n = slices.length;
  if (n === 0) return [];
  if (slices.every((s) => s.states.length === 1)) return new Array<number>(n).fill(0); // nothing to choose
  const scratch = emptyCosts();
  const stat = slices.map((s, i) => s.states.map((st) => { clearCosts(scratch); sliceCosts(slices, i, st, hand, model, scratch); return rank(scratch) + chordTieBreak(st); }));
  if (n === 1) return [argmin(stat[0]!)];
  const link = slices.slice(0, -1).map((a, i) => a.states.map((fa) => slices[i + 1]!.states.map((fb) => {
    clearCosts(scratch); return linkRank(a, fa, slices[i + 1]!, fb, hand, model, scratch);
  })));
  // v[a][b]: best cost of a path whose last two slices take states a (s-1) and b (s).
  let v = slices[0]!.states.map((_, a) => slices[1]!.states.map((_, b) => stat[0]![a]! + stat[1]![b]! + link[0]![a]![b]!));
  const back: number[][][] = [];
  for (let s = 1; s + 1 < n; s++) {
    const A = slices[s - 1]!, B = slices[s]!, C = slices[s + 1]!;
    const nv: number[][] = B.states.map(() => new Array<number>(C.states.length).fill(Infinity));
    const bp: number[][] = B.states.map(() => new Array<number>(C.states.length).fill(0));
    for (let b = 0; b < B.states.length; b++) {
      for (let c = 0; c < C.states.length; c++) {
        const step = link[s]![b]![c]! + stat[s + 1]![c]!;
        let best = Infinity, arg = 0;
        for (let a = 0; a < A.states.length; a++) {
          const base = v[a]![b]!;
          if (base >= best) continue;
          const total = base + trioRank(A, A.states[a]!, B, B.states[b]!, C, C.states[c]!, hand, model);
          if (total < best) { best = total; arg = a; }
        }
        nv[b]![c] = best + step;
        bp[b]![c] = arg;
      }
    }
    back.push(bp);
    v = nv;
  }
  let bestB = 0, bestC = 0;
  for (let b = 0; b < v.length; b++) for (let c = 0; c < v[b]!.length; c++) if (v[b]![c]! < v[bestB]![bestC]!) { bestB = b; bestC = c; }
  const path = new Array<number>(n);
  path[n - 1] = bestC; path[n - 2] = bestB;
  for (let s = n - 1; s >= 2; s--) path[s - 2] = back[s - 2]![path[s - 1]!]![path[s]!]!;
  return path;
}

function argmin(xs: readonly number[]): number {
  let k = 0;
  xs.forEach((x, i) => { if (x < xs[k]!) k = i; });
  return k;
}

/**
 * Estimate fingering for the events of one hand, in order (chord members share an onset).
 * Fingerings written in the score (`fingering[0].finger`) are fixed points and are returned as written.
 *
 * @example
 * estimateFingering(cMajorScaleRightHand, "right").fingers // [1, 2, 3, 1, 2, 3, 4, 5]
 */
export function estimateFingering(events: readonly NoteEvent[], hand: Hand, options: FingeringOptions = {}): FingeringResult {
  const model = options.model ?? "parncutt";
  const { slices, tiedTo } = buildSlices(events, hand, options.hints);
  const path = search(slices, hand, model);
  const fingers: (number | null)[] = events.map(() => null);
  const costPerNote = events.map(() => 0);
  const costPerBar = new Map<number, number>();
  const rulesPerBar = new Map<number, RuleCosts>();
  if (options.costs === false) {
    slices.forEach((slice, s) => {
      const state = slice.states[path[s]!]!;
      slice.members.forEach((ms, j) => ms.forEach((i) => { fingers[i] = scoreFinger(events[i]!) ?? state[j]!; }));
    });
    for (const [i, from] of tiedTo) fingers[i] = fingers[from] ?? null;
    return { fingers, costPerNote, costPerBar, rulesPerBar };
  }
  slices.forEach((slice, s) => {
    const state = slice.states[path[s]!]!;
    const rules = emptyCosts();
    sliceCosts(slices, s, state, hand, model, rules);
    if (s >= 1) linkCosts(slices[s - 1]!, slices[s - 1]!.states[path[s - 1]!]!, slice, state, hand, model, rules);
    if (s >= 2) trioLinkCosts(slices[s - 2]!, slices[s - 2]!.states[path[s - 2]!]!, slices[s - 1]!, slices[s - 1]!.states[path[s - 1]!]!, slice, state, hand, model, rules);
    const cost = totalCost(rules);
    const struck = slice.members.flat();
    slice.members.forEach((ms, j) => ms.forEach((i) => {
      fingers[i] = scoreFinger(events[i]!) ?? state[j]!;
      costPerNote[i] = cost / struck.length;
    }));
    costPerBar.set(slice.measure, (costPerBar.get(slice.measure) ?? 0) + cost);
    const bar = rulesPerBar.get(slice.measure) ?? emptyCosts();
    addScaled(bar, rules, 1);
    rulesPerBar.set(slice.measure, bar);
  });
  for (const [i, from] of tiedTo) fingers[i] = fingers[from] ?? null;
  return { fingers, costPerNote, costPerBar, rulesPerBar };
}
