/**
 * The published rule points of a chosen fingering, slice by slice (Parncutt et al. 1997 / Jacobs 2001,
 * fingering-rules.ts): what the estimator reports per note and bar, and the slice rules its search uses.
 */
import type { Hand } from "../score/types";
import type { Slice } from "./fingering-slices";
import { chordPracticalPenalty, clearCosts, emptyCosts, noteCosts, pairCosts, trioCosts, type FingeringModel, type RuleCosts } from "./fingering-rules";

/** Line notes of a slice: the lowest (0) and the highest (1) kept pitch. */
const lineIndex = (s: Slice, line: 0 | 1): number => (line === 0 ? 0 : s.midis.length - 1);

const chordScratch = emptyCosts();

/**
 * Rules on one slice alone: note rules with neighbour colours, and spans inside a chord.
 *
 * @example
 * sliceCosts(slices, 0, [1, 3, 5], "right", "parncutt", emptyCosts()); // a C major triad's points
 */
export function sliceCosts(slices: readonly Slice[], s: number, state: readonly number[], hand: Hand, model: FingeringModel, into: RuleCosts): void {
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

/**
 * Pair rules from slice s to s+1 along the low and high lines (averaged when they differ).
 *
 * @example
 * linkCosts(slices[0], [1], slices[1], [2], "right", "parncutt", emptyCosts());
 */
export function linkCosts(a: Slice, fa: readonly number[], b: Slice, fb: readonly number[], hand: Hand, model: FingeringModel, into: RuleCosts): void {
  const single = a.midis.length === 1 && b.midis.length === 1;
  const weight = single ? 1 : 0.5;
  const lines: (0 | 1)[] = single ? [0] : [0, 1];
  for (const line of lines) {
    const i = lineIndex(a, line);
    const j = lineIndex(b, line);
    addScaled(into, pairCosts(a.midis[i]!, fa[i]!, b.midis[j]!, fb[j]!, hand, model), weight);
  }
}

/**
 * Trio rules over slices s-1, s, s+1 along the low and high lines.
 *
 * @example
 * trioLinkCosts(slices[0], [1], slices[1], [2], slices[2], [3], "right", "parncutt", emptyCosts());
 */
export function trioLinkCosts(a: Slice, fa: readonly number[], b: Slice, fb: readonly number[], c: Slice, fc: readonly number[], hand: Hand, model: FingeringModel, into: RuleCosts): void {
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

/**
 * Add `w` times each rule of `add` into `into`.
 *
 * @example
 * addScaled(total, barRules, 1);
 */
export function addScaled(into: RuleCosts, add: RuleCosts, w: number): void {
  for (const key of Object.keys(add) as (keyof RuleCosts)[]) into[key] += add[key] * w;
}
