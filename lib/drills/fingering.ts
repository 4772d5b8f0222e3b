/**
 * Fingering estimator: a second-order Viterbi search over finger assignments that minimises the
 * ergonomic rule costs of Parncutt et al. (1997) — or Jacobs (2001) — for one hand (FACTS.md §5).
 *
 * Method. Single notes are scored exactly as in the published model (pairs and trios of consecutive
 * notes, fingering-rules.ts). Written fingerings are fixed points: their slices have one candidate.
 * Extensions for real music, each switched by the tuning (fingering-tuning.ts):
 * - Chords: a chord's fingers rise with pitch (fall for the left hand) — no crossed fingers and no
 *   finger twice in one chord; spans inside a chord are scored with rules 1–3 and a chord beyond a
 *   pair's practical span loses to any other choice; between slices the lowest and the highest lines
 *   are each scored and averaged. A chord's stacked printed fingering stored on one note is spread over
 *   the chord (fingering-slices.ts).
 * - Rests: the published model scores legato fragments. Across a rest the hand lifts, so the pair and
 *   trio rules are not charged there; a flat lift charge (plus points per semitone beyond an octave)
 *   replaces them, and the same finger may take the next key.
 * - Thumb reach: in arpeggios the thumb passes under finger 3 by a fourth (1-2-3-1); the span table's
 *   limits for the thumb under 3 (or 3 over the thumb) are widened by a few semitones.
 * - Scale runs: a run of five or more notes by step in one direction gets the scale book's finger
 *   (scale-fingerings.ts) as a prior — a cost for any other finger — from the key in force when it is
 *   known (`keyOf`), else only where every scale holding the run's notes agrees; so flat-key runs keep the
 *   thumb off the black keys as the books do.
 * - Repeated figures: a note whose neighbours (two on each side) equal those of a note with a printed
 *   finger elsewhere gets that finger as a prior (fingering-priors.ts `repeatPriors`).
 * - Held notes: tied notes keep the finger that struck them; after the search, a note struck while
 *   another note of the hand is held (within an octave — further off, the pedal holds it) is moved off
 *   the held note's finger when its slice has any other state (`releaseHeldFingers`). The estimator does
 *   not propose finger substitutions itself; a printed substitution ("3-1") is a fixed point on its
 *   first finger.
 * - Grace notes and ornaments are slices of their own just before the note they ornament.
 * - Voices that cross staves are played by their home staff's hand (difficulty-bars.ts `voiceHomes`).
 * A data-driven layer (re-weighting the rules on the corpus's printed fingerings) was tried and
 * overfitted under cross-validation by file, so the published weights stay; fingering-tuning.ts gives
 * the extension sizes, how they were chosen and the agreement figures (leave-one-out 81.1%, all marks
 * hidden 63.7%, in-sample; published model 70.6% and 57.7%). `tuning: PUBLISHED_TUNING` gives the
 * published model unchanged. Costs reported per note and bar are always the published, unweighted points.
 */
import type { Hand, KeySignature, NoteEvent } from "../score/types";
import { buildSlices, type Slice } from "./fingering-slices";
import {
  clearCosts,
  emptyCosts,
  pairCosts,
  totalCost,
  trioCosts,
  type FingeringModel,
  type RuleCosts,
} from "./fingering-rules";
import { addScaled, linkCosts, sliceCosts, trioLinkCosts } from "./fingering-costs";
import { repeatPriors, scalePriors } from "./fingering-priors";
import { FITTED_TUNING, weightedCost, type FingeringTuning } from "./fingering-tuning";

export interface FingeringOptions {
  readonly model?: FingeringModel;
  /**
   * Preferred finger per input event (null = none), e.g. carried over from the passage a drill note
   * comes from. A hint is followed when it fits its chord; unlike a written fingering it is not forced.
   */
  readonly hints?: readonly (number | null)[];
  /** When false, only `fingers` is filled (costs stay empty), which is much faster. Default true. */
  readonly costs?: boolean;
  /** Rule weights and extensions of the search (default `FITTED_TUNING`; `PUBLISHED_TUNING` = the paper). */
  readonly tuning?: FingeringTuning;
  /** Key in force per 0-based measure, for the scale-run prior (no prior when absent). */
  readonly keyOf?: (measure: number) => KeySignature | undefined;
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

/** What the search weighs: the tuning plus the model, hand and per-slice priors. */
interface Scorer {
  readonly hand: Hand;
  readonly model: FingeringModel;
  readonly t: FingeringTuning;
  readonly prior: readonly (number | null)[];
  readonly repeat: readonly (readonly number[] | null)[];
}

/**
 * Search cost of a tally: weighted rule points plus a tie-break far below one point — among equally
 * costly fingerings, prefer the one with fewer hand-position changes (rule 4).
 */
const rank = (c: RuleCosts, sc: Scorer): number => weightedCost(c, sc.t.weights) + 1e-3 * c.positionChangeCount;

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

/** Charge for a move across a rest between line notes a → b (see the opening comment). */
function liftCharge(ma: number, mb: number, sc: Scorer): number {
  return sc.t.liftCost + sc.t.liftPerSemitone * Math.max(0, Math.abs(mb - ma) - 12);
}

const lifting = (b: Slice, sc: Scorer): boolean => b.lift && sc.t.liftCost >= 0;

/** Search cost of the pair rules between two slices, summed into `into` without allocating. */
function linkRank(a: Slice, fa: readonly number[], b: Slice, fb: readonly number[], sc: Scorer, into: RuleCosts): number {
  const single = a.midis.length === 1 && b.midis.length === 1;
  const i = a.midis.length - 1, j = b.midis.length - 1;
  if (lifting(b, sc)) {
    const low = liftCharge(a.midis[0]!, b.midis[0]!, sc);
    return single ? low : 0.5 * (low + liftCharge(a.midis[i]!, b.midis[j]!, sc));
  }
  pairCosts(a.midis[0]!, fa[0]!, b.midis[0]!, fb[0]!, sc.hand, sc.model, into, sc.t.thumbReach);
  if (single) return rank(into, sc);
  pairCosts(a.midis[i]!, fa[i]!, b.midis[j]!, fb[j]!, sc.hand, sc.model, into, sc.t.thumbReach);
  return 0.5 * rank(into, sc);
}

const trioScratch = emptyCosts();

/** Search cost of the trio rules without allocating: only rules 4, 5 and 7 touch the scratch tally. */
function trioRank(a: Slice, fa: readonly number[], b: Slice, fb: readonly number[], c: Slice, fc: readonly number[], sc: Scorer): number {
  if (lifting(b, sc) || lifting(c, sc)) return 0;
  const single = a.midis.length === 1 && b.midis.length === 1 && c.midis.length === 1;
  const t = trioScratch;
  t.positionChangeCount = 0; t.positionChangeSize = 0; t.threeFourFive = 0;
  trioCosts(a.midis[0]!, fa[0]!, b.midis[0]!, fb[0]!, c.midis[0]!, fc[0]!, sc.hand, sc.model, t, sc.t.thumbReach);
  if (!single) {
    const i = a.midis.length - 1, j = b.midis.length - 1, k = c.midis.length - 1;
    trioCosts(a.midis[i]!, fa[i]!, b.midis[j]!, fb[j]!, c.midis[k]!, fc[k]!, sc.hand, sc.model, t, sc.t.thumbReach);
  }
  const w = sc.t.weights;
  return (single ? 1 : 0.5) * (t.positionChangeCount * (w.positionChangeCount + 1e-3) + t.positionChangeSize * w.positionChangeSize + t.threeFourFive * w.threeFourFive);
}

/** Search cost of one slice alone: its note and chord rules, the chord tie-break and the prior. */
function statRank(slices: readonly Slice[], s: number, st: readonly number[], sc: Scorer, scratch: RuleCosts): number {
  clearCosts(scratch);
  sliceCosts(slices, s, st, sc.hand, sc.model, scratch);
  const prior = sc.prior[s];
  let miss = prior != null && st.length === 1 && st[0] !== prior ? sc.t.scalePrior : 0;
  const again = sc.repeat[s];
  if (again && again.length === st.length && again.some((f, k) => f !== st[k])) miss += sc.t.repeatPrior;
  let five = 0;
  if (sc.t.weakFive !== 1 && sc.model === "parncutt") for (const f of st) if (f === 5) five += (sc.t.weakFive - 1) * sc.t.weights.weakFinger;
  return rank(scratch, sc) + chordTieBreak(st) + miss + five;
}

/** Best state per slice by second-order Viterbi. */
function search(slices: readonly Slice[], sc: Scorer): number[] {
  const n = slices.length;
  if (n === 0) return [];
  if (slices.every((s) => s.states.length === 1)) return new Array<number>(n).fill(0); // nothing to choose
  const scratch = emptyCosts();
  const stat = slices.map((s, i) => s.states.map((st) => statRank(slices, i, st, sc, scratch)));
  if (n === 1) return [argmin(stat[0]!)];
  const link = slices.slice(0, -1).map((a, i) => a.states.map((fa) => slices[i + 1]!.states.map((fb) => {
    clearCosts(scratch); return linkRank(a, fa, slices[i + 1]!, fb, sc, scratch);
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
          const total = base + trioRank(A, A.states[a]!, B, B.states[b]!, C, C.states[c]!, sc);
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

/**
 * Held notes: a note struck while an earlier note of the hand still sounds must not take that note's
 * finger (the Viterbi search sees only neighbouring slices). Walks the slices in order and, where a
 * state reuses a held finger on another key, swaps in the cheapest state of that slice that does not
 * (its own cost plus the links to both neighbours); a slice with no such state keeps its choice.
 */
function releaseHeldFingers(slices: readonly Slice[], path: number[], sc: Scorer): void {
  const scratch = emptyCosts();
  let sounding: { end: number; midi: number; finger: number; slice: number }[] = [];
  const local = (s: number, k: number): number => {
    const st = slices[s]!.states[k]!;
    let c = statRank(slices, s, st, sc, scratch);
    if (s > 0) c += linkRank(slices[s - 1]!, slices[s - 1]!.states[path[s - 1]!]!, slices[s]!, st, sc, clearCosts(scratch));
    if (s + 1 < slices.length) c += linkRank(slices[s]!, st, slices[s + 1]!, slices[s + 1]!.states[path[s + 1]!]!, sc, clearCosts(scratch));
    return c;
  };
  slices.forEach((slice, s) => {
    const t = slice.onset;
    sounding = sounding.filter((h) => h.end > t + 1e-9 && holdable(slices, h.slice, h.midi, h.end));
    const clashes = (st: readonly number[]) => st.some((f, j) => sounding.some((h) => h.finger === f && h.midi !== slice.midis[j]));
    if (sounding.length > 0 && clashes(slice.states[path[s]!]!)) {
      let best = -1, bestCost = Infinity;
      slice.states.forEach((st, k) => {
        if (clashes(st)) return;
        const c = local(s, k);
        if (c < bestCost) { best = k; bestCost = c; }
      });
      if (best >= 0) path[s] = best;
    }
    const st = slice.states[path[s]!]!;
    slice.midis.forEach((m, j) => sounding.push({ end: slice.ends[j]!, midi: m, finger: st[j]!, slice: s }));
  });
}

/**
 * Whether the hand itself can hold a note: every note struck while it sounds lies within an octave of
 * it (common practice: a note held under a melody that moves further away is held by the pedal).
 */
function holdable(slices: readonly Slice[], from: number, midi: number, end: number): boolean {
  for (let s = from + 1; s < slices.length && slices[s]!.onset < end - 1e-9; s++) {
    if (slices[s]!.grace) continue;
    for (const m of slices[s]!.midis) if (Math.abs(m - midi) > HOLD_REACH) return false;
  }
  return true;
}

/** Farthest interval (semitones) from a held note to notes struck under it for the hand to hold it. */
const HOLD_REACH = 12;

/** The written finger tuple of a slice when every key of it is fingered in the score, else null. */
function writtenState(slice: Slice, written: readonly (number | null)[]): number[] | null {
  const out: number[] = [];
  for (const ms of slice.members) {
    const f = ms.map((i) => written[i]).find((x) => x != null);
    if (f == null) return null;
    out.push(f);
  }
  return out;
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
  const { slices, tiedTo, written } = buildSlices(events, hand, options.hints);
  const t = options.tuning ?? FITTED_TUNING;
  const prior = t.scalePrior > 0 ? scalePriors(slices, hand, options.keyOf) : [];
  const repeat = t.repeatPrior > 0 ? repeatPriors(slices, slices.map((sl) => writtenState(sl, written))) : [];
  const scorer: Scorer = { hand, model, t, prior, repeat };
  const path = search(slices, scorer);
  if (t.releaseHeld) releaseHeldFingers(slices, path, scorer);
  const fingers: (number | null)[] = events.map(() => null);
  const costPerNote = events.map(() => 0);
  const costPerBar = new Map<number, number>();
  const rulesPerBar = new Map<number, RuleCosts>();
  if (options.costs === false) {
    slices.forEach((slice, s) => {
      const state = slice.states[path[s]!]!;
      slice.members.forEach((ms, j) => ms.forEach((i) => { fingers[i] = written[i] ?? state[j]!; }));
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
      fingers[i] = written[i] ?? state[j]!;
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
