/**
 * The ergonomic cost rules of Parncutt, Sloboda, Clarke, Raekallio & Desain (1997), "An ergonomic
 * model of keyboard fingering for melodic fragments", Music Perception 14(4), with the refinements of
 * Jacobs (2001), Music Perception 18(4), as an option. Rule wording and the finger-pair span table as
 * quoted in FACTS.md §5.
 *
 * Everything here works in the right hand's orientation: the left hand mirrors the right, so left-hand
 * intervals are measured downwards (see `handInterval`).
 */
import type { Hand } from "../score/types";
import { isBlackKey, keyPosition } from "./hand";

export type FingeringModel = "parncutt" | "jacobs";

/** Limits of one finger pair (lower finger number first), in semitones, right hand ascending. */
export interface PairSpan {
  readonly minPrac: number;
  readonly minComf: number;
  readonly minRel: number;
  readonly maxRel: number;
  readonly maxComf: number;
  readonly maxPrac: number;
}

const row = (v: readonly number[]): PairSpan => ({
  minPrac: v[0]!, minComf: v[1]!, minRel: v[2]!, maxRel: v[3]!, maxComf: v[4]!, maxPrac: v[5]!,
});

/**
 * Finger-pair span table of Parncutt et al. (1997), right hand, ascending pairs (FACTS.md §5).
 * The same finger twice has all limits 0: it can only repeat its key.
 *
 * @example
 * FINGER_SPANS["1-5"].maxComf // 13
 */
export const FINGER_SPANS: Readonly<Record<string, PairSpan>> = {
  "1-2": row([-5, -3, 1, 5, 8, 10]),
  "1-3": row([-4, -2, 3, 7, 10, 12]),
  "1-4": row([-3, -1, 5, 9, 12, 14]),
  "1-5": row([-1, 1, 7, 10, 13, 15]),
  "2-3": row([1, 1, 1, 2, 3, 5]),
  "2-4": row([1, 1, 3, 4, 5, 7]),
  "2-5": row([2, 2, 5, 6, 8, 10]),
  "3-4": row([1, 1, 1, 2, 2, 4]),
  "3-5": row([1, 1, 3, 4, 5, 7]),
  "4-5": row([1, 1, 1, 2, 3, 5]),
};

const SAME_FINGER: PairSpan = row([0, 0, 0, 0, 0, 0]);

/**
 * Limits for two fingers in either order (the table row of the lower finger number first).
 *
 * @example
 * pairSpan(5, 1).maxPrac // 15
 */
export function pairSpan(a: number, b: number): PairSpan {
  return SPAN_GRID[a * 6 + b] ?? SAME_FINGER;
}

/** Rows by finger pair, indexed a × 6 + b, for the search's inner loop. */
const SPAN_GRID: readonly (PairSpan | undefined)[] = Array.from({ length: 36 }, (_, k) => {
  const a = Math.floor(k / 6), b = k % 6;
  return a === b ? SAME_FINGER : FINGER_SPANS[`${Math.min(a, b)}-${Math.max(a, b)}`];
});

/**
 * Interval from note `a` to note `b` in the hand's orientation: semitones upwards for the right hand,
 * downwards for the left (mirror). The Jacobs model measures physical distance instead: key
 * positions (hand.ts) converted to semitone units, 12 per octave.
 *
 * @example
 * handInterval(60, 64, "right", "parncutt") // 4
 * handInterval(60, 64, "left", "parncutt")  // -4
 */
export function handInterval(a: number, b: number, hand: Hand, model: FingeringModel): number {
  const up = model === "jacobs" ? ((keyPosition(b) - keyPosition(a)) * 12) / 7 : b - a;
  return hand === "right" ? up : -up;
}

/**
 * Points per rule; the first twelve follow the twelve rules in order. The last two are constraints of
 * the model, not rules: `sameFinger` charges one finger playing two different keys in a row (Parncutt
 * et al. generate only fingerings that use a repeated finger for a repeated key; a large charge keeps
 * written fingerings that do it possible), and `overPractical` charges a chord beyond a pair's MaxPrac.
 */
export interface RuleCosts {
  stretch: number;
  smallSpan: number;
  largeSpan: number;
  positionChangeCount: number;
  positionChangeSize: number;
  weakFinger: number;
  threeFourFive: number;
  threeToFour: number;
  fourOnBlack: number;
  thumbOnBlack: number;
  fiveOnBlack: number;
  thumbPassing: number;
  sameFinger: number;
  overPractical: number;
}

/**
 * An all-zero rule tally.
 *
 * @example
 * emptyCosts().stretch // 0
 */
export function emptyCosts(): RuleCosts {
  return {
    stretch: 0, smallSpan: 0, largeSpan: 0, positionChangeCount: 0, positionChangeSize: 0,
    weakFinger: 0, threeFourFive: 0, threeToFour: 0, fourOnBlack: 0, thumbOnBlack: 0,
    fiveOnBlack: 0, thumbPassing: 0, sameFinger: 0, overPractical: 0,
  };
}

/**
 * Reset a tally to zero in place (the search reuses one tally instead of allocating).
 *
 * @example
 * clearCosts(tally).stretch // 0
 */
export function clearCosts(c: RuleCosts): RuleCosts {
  c.stretch = 0; c.smallSpan = 0; c.largeSpan = 0; c.positionChangeCount = 0; c.positionChangeSize = 0;
  c.weakFinger = 0; c.threeFourFive = 0; c.threeToFour = 0; c.fourOnBlack = 0; c.thumbOnBlack = 0;
  c.fiveOnBlack = 0; c.thumbPassing = 0; c.sameFinger = 0; c.overPractical = 0;
  return c;
}

/**
 * Sum of all rule points.
 *
 * @example
 * totalCost({ ...emptyCosts(), stretch: 2, weakFinger: 1 }) // 3
 */
export function totalCost(c: RuleCosts): number {
  return c.stretch + c.smallSpan + c.largeSpan + c.positionChangeCount + c.positionChangeSize +
    c.weakFinger + c.threeFourFive + c.threeToFour + c.fourOnBlack + c.thumbOnBlack +
    c.fiveOnBlack + c.thumbPassing + c.sameFinger + c.overPractical;
}

/** Signed distance from the lower-numbered finger's note to the higher-numbered finger's note. */
function orderedInterval(ma: number, fa: number, mb: number, fb: number, hand: Hand, model: FingeringModel): number {
  return fa <= fb ? handInterval(ma, mb, hand, model) : handInterval(mb, ma, hand, model);
}

/**
 * The interval as the rules see it when the thumb reaches `thumbReach` semitones further under finger 3
 * (or 3 over the thumb) than the span table allows (an extension, see fingering.ts; 0 = the published model).
 */
function reach(d: number, fa: number, fb: number, thumbReach: number): number {
  if (thumbReach === 0 || d >= 0 || (fa !== 1 && fb !== 1)) return d;
  // The thumb passes furthest under the middle finger, as in arpeggios (1-2-3-1); other pairs keep the table.
  const other = fa === 1 ? fb : fa;
  return other === 3 ? Math.min(0, d + thumbReach) : d;
}

/** Points for one finger on two different keys in a row (see `RuleCosts.sameFinger`). */
export const SAME_FINGER_POINTS = 30;

/**
 * Rules on two consecutive notes: 1 Stretch, 2 Small-Span, 3 Large-Span, 8 Three-to-Four,
 * 9 Four-on-Black and 12 Thumb-Passing; one finger on two different keys is charged `sameFinger`.
 *
 * @example
 * pairCosts(60, 1, 76, 5, "right", "parncutt").stretch // 2 × (16 − 13) = 6
 */
export function pairCosts(ma: number, fa: number, mb: number, fb: number, hand: Hand, model: FingeringModel, into: RuleCosts = emptyCosts(), thumbReach = 0): RuleCosts {
  if (fa === fb) {
    if (ma !== mb) into.sameFinger += SAME_FINGER_POINTS;
    return into;
  }
  const span = pairSpan(fa, fb);
  const d = reach(orderedInterval(ma, fa, mb, fb, hand, model), fa, fb, thumbReach);
  // Rule 1, Stretch: 2 points per semitone outside MinComf..MaxComf.
  if (d > span.maxComf) into.stretch += 2 * (d - span.maxComf);
  else if (d < span.minComf) into.stretch += 2 * (span.minComf - d);
  const thumb = fa === 1 || fb === 1;
  // Rule 2, Small-Span: per semitone below MinRel, 1 point with the thumb, otherwise 2.
  if (d < span.minRel) into.smallSpan += (thumb ? 1 : 2) * (span.minRel - d);
  // Rule 3, Large-Span: per semitone above MaxRel, 1 point with the thumb, otherwise 2 (Jacobs: 1).
  if (d > span.maxRel) into.largeSpan += (thumb || model === "jacobs" ? 1 : 2) * (d - span.maxRel);
  // Rule 8, Three-to-Four: finger 3 immediately followed by finger 4.
  if (fa === 3 && fb === 4) into.threeToFour += 1;
  // Rule 9, Four-on-Black: 3 and 4 consecutive, 3 on a white key and 4 on a black key.
  if ((fa === 3 && fb === 4 && !isBlackKey(ma) && isBlackKey(mb)) || (fa === 4 && fb === 3 && isBlackKey(ma) && !isBlackKey(mb))) {
    into.fourOnBlack += 1;
  }
  // Rule 12, Thumb-Passing: the thumb plays the note further up the hand's orientation than the finger.
  if ((fa === 1) !== (fb === 1)) {
    const thumbNote = fa === 1 ? ma : mb;
    const fingerNote = fa === 1 ? mb : ma;
    if (handInterval(fingerNote, thumbNote, hand, "parncutt") > 0) {
      const tb = isBlackKey(thumbNote);
      const fbk = isBlackKey(fingerNote);
      if (tb === fbk) into.thumbPassing += 1;
      else if (tb && !fbk) into.thumbPassing += 3;
    }
  }
  return into;
}

/**
 * Rules on three consecutive notes: 4 Position-Change-Count, 5 Position-Change-Size and
 * 7 Three-Four-Five (Parncutt only; Jacobs drops it).
 *
 * @example
 * trioCosts(60, 1, 64, 3, 72, 1, "right", "parncutt").positionChangeCount // 1 (half change)
 */
export function trioCosts(m1: number, f1: number, m2: number, f2: number, m3: number, f3: number, hand: Hand, model: FingeringModel, into: RuleCosts = emptyCosts(), thumbReach = 0): RuleCosts {
  const span = pairSpan(f1, f3);
  const d = reach(orderedInterval(m1, f1, m3, f3, hand, model), f1, f3, thumbReach);
  const outside = d > span.maxComf ? d - span.maxComf : d < span.minComf ? span.minComf - d : 0;
  if (outside > 0) {
    const between = (m2 - m1) * (m2 - m3) < 0;
    const beyondPrac = d > span.maxPrac || d < span.minPrac;
    // Rule 4: 2 points for a full change (thumb on note 2, note 2 between, beyond practical), else 1.
    into.positionChangeCount += f2 === 1 && between && beyondPrac ? 2 : 1;
    // Rule 5: the semitones by which notes 1–3 fall outside MinComf..MaxComf.
    into.positionChangeSize += outside;
  }
  // Rule 7, Three-Four-Five: fingers 3, 4 and 5 consecutively in any order.
  if (model === "parncutt" && f1 !== f2 && f2 !== f3 && f1 !== f3 && f1 >= 3 && f2 >= 3 && f3 >= 3) {
    into.threeFourFive += 1;
  }
  return into;
}

/**
 * Rules on one note and the colour of its neighbours: 6 Weak-Finger (Jacobs: finger 4 only),
 * 10 Thumb-on-Black and 11 Five-on-Black. `prev`/`next` are neighbouring MIDI notes or null.
 *
 * @example
 * noteCosts(61, 1, 60, 62, "parncutt").thumbOnBlack // 1 + 2 + 2 = 5
 */
export function noteCosts(m: number, f: number, prev: number | null, next: number | null, model: FingeringModel, into: RuleCosts = emptyCosts()): RuleCosts {
  if (f === 4 || (f === 5 && model === "parncutt")) into.weakFinger += 1;
  if (!isBlackKey(m)) return into;
  const prevWhite = prev !== null && !isBlackKey(prev);
  const nextWhite = next !== null && !isBlackKey(next);
  if (f === 1) into.thumbOnBlack += 1 + (prevWhite ? 2 : 0) + (nextWhite ? 2 : 0);
  if (f === 5) into.fiveOnBlack += (prevWhite ? 2 : 0) + (nextWhite ? 2 : 0);
  return into;
}

/**
 * Points for playing two simultaneous notes beyond a finger pair's practical span: 10 per semitone.
 * Not one of the twelve rules — a chord the hand cannot hold must lose to any other choice.
 *
 * @example
 * chordPracticalPenalty(60, 1, 77, 5, "right", "parncutt") // 10 × (17 − 15) = 20
 */
export function chordPracticalPenalty(ma: number, fa: number, mb: number, fb: number, hand: Hand, model: FingeringModel): number {
  const span = pairSpan(fa, fb);
  const d = orderedInterval(ma, fa, mb, fb, hand, model);
  if (d > span.maxPrac) return 10 * (d - span.maxPrac);
  if (d < span.minPrac) return 10 * (span.minPrac - d);
  return 0;
}
