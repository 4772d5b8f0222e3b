/**
 * The search's tuning: how much each published rule weighs when the estimator chooses among
 * fingerings, and the few extensions for real music (see fingering.ts for the method).
 *
 * `PUBLISHED_TUNING` is the published model unchanged (Parncutt et al. 1997, or Jacobs 2001): every
 * rule weighs 1, no extension is on. `FITTED_TUNING` is the small data-driven layer: its numbers were
 * chosen by coordinate search on the printed fingerings of the four `fingered-*` scores of
 * fixtures/reference/scores, cross-validated by file (scripts/fit-fingering.ts prints the figures).
 * Rule points reported to callers (difficulty map, explanations) stay the published, unweighted points.
 */
import type { RuleCosts } from "./fingering-rules";

export type RuleWeights = Readonly<Record<keyof RuleCosts, number>>;

export interface FingeringTuning {
  /** Multiplier per rule in the search's objective. */
  readonly weights: RuleWeights;
  /** Semitones the thumb reaches under finger 3 (or 3 over the thumb) beyond the span table, as in arpeggios. */
  readonly thumbReach: number;
  /**
   * Points for a move across a rest (the hand lifts and lands): the pair and trio rules are not
   * charged across a rest; this flat charge and `liftPerSemitone` replace them. Negative = off.
   */
  readonly liftCost: number;
  /** Points per semitone of the jump across a rest beyond the finger pair's comfortable span. */
  readonly liftPerSemitone: number;
  /** Points when a scale-wise run's finger differs from the scale table's finger (0 = off). */
  readonly scalePrior: number;
  /** Points when a repeat of a figure leaves the fingers printed on another statement of it (0 = off). */
  readonly repeatPrior: number;
  /** A note struck under a held note avoids the held note's finger (fingering.ts `releaseHeldFingers`). */
  readonly releaseHeld: boolean;
  /** Weight of rule 6 (Weak-Finger) on finger 5, relative to finger 4 (Parncutt 1, Jacobs 0). */
  readonly weakFive: number;
}

const ONES: RuleWeights = {
  stretch: 1, smallSpan: 1, largeSpan: 1, positionChangeCount: 1, positionChangeSize: 1, weakFinger: 1,
  threeFourFive: 1, threeToFour: 1, fourOnBlack: 1, thumbOnBlack: 1, fiveOnBlack: 1, thumbPassing: 1,
  sameFinger: 1, overPractical: 1,
};

/**
 * The published model: every rule weighs 1, no extension.
 *
 * @example
 * PUBLISHED_TUNING.weights.stretch // 1
 */
export const PUBLISHED_TUNING: FingeringTuning = { weights: ONES, thumbReach: 0, liftCost: -1, liftPerSemitone: 0, scalePrior: 0, repeatPrior: 0, releaseHeld: false, weakFive: 1 };

/**
 * The tuning the estimator uses by default (fitted; see the opening comment).
 *
 * @example
 * FITTED_TUNING.thumbReach // semitones of extra thumb reach
 */
export const FITTED_TUNING: FingeringTuning = {
  weights: { ...ONES },
  thumbReach: 3,
  liftCost: 2,
  liftPerSemitone: 0,
  scalePrior: 16,
  repeatPrior: 4,
  releaseHeld: true,
  weakFive: 1,
};

/**
 * Weighted sum of rule points.
 *
 * @example
 * weightedCost({ ...emptyCosts(), stretch: 2 }, PUBLISHED_TUNING.weights) // 2
 */
export function weightedCost(c: RuleCosts, w: RuleWeights): number {
  return c.stretch * w.stretch + c.smallSpan * w.smallSpan + c.largeSpan * w.largeSpan +
    c.positionChangeCount * w.positionChangeCount + c.positionChangeSize * w.positionChangeSize +
    c.weakFinger * w.weakFinger + c.threeFourFive * w.threeFourFive + c.threeToFour * w.threeToFour +
    c.fourOnBlack * w.fourOnBlack + c.thumbOnBlack * w.thumbOnBlack + c.fiveOnBlack * w.fiveOnBlack +
    c.thumbPassing * w.thumbPassing + c.sameFinger * w.sameFinger + c.overPractical * w.overPractical;
}
