/**
 * Lift rests: a rest after each group, so the hand lifts, relaxes and lands on the next group.
 * Every group keeps its place in the beat (the rest is the chosen length or a little more), so
 * the rhythm reads as in the score and no value is invented by the shift; the passage's opening
 * rest is kept.
 */
import Fraction from "fraction.js";
import { z } from "zod";
import type { Passage, TimeSignature } from "../../score/types";
import { isCompound } from "../meter";
import type { Drill, DrillContext, DrillFamily, FamilyResult } from "../types";
import { barLength, buildDrill, passageHands, passageSlots, type Slot } from "../build";
import { restOf } from "./shared-2-layout";
import { beatLength, GROUP_BY, groupLength, groupSonorities, placeInBar } from "../groups";

/** Rest lengths in quarter notes. */
export const LIFT_LENGTHS = { "16th": new Fraction(1, 4), eighth: new Fraction(1, 2), quarter: new Fraction(1), half: new Fraction(2) } as const;

export const liftRestsOptions = z.object({
  groupBy: z.enum(GROUP_BY).default("beat"),
  rest: z.enum(["16th", "eighth", "quarter", "half"]).default("eighth"),
});
export type LiftRestsOptions = z.output<typeof liftRestsOptions>;

/**
 * The metric unit a group keeps its place in: the beat for a group within a beat, the half bar
 * (in four-beat simple time) or the bar for a longer one.
 *
 * @example
 * alignUnit(new Fraction(4), { beats: 4, beatType: 4 }).toFraction(); // "4"
 */
export function alignUnit(length: Fraction, time: TimeSignature): Fraction {
  const beat = beatLength(time);
  const bar = barLength(time);
  if (length.compare(beat) <= 0) return beat;
  if (!isCompound(time) && time.beats % 4 === 0 && length.compare(bar.div(2)) <= 0) return bar.div(2);
  return bar;
}

/**
 * A rest from `from` lasting `length`, split at the first beat boundary so that each piece is
 * written in the values of its place (a triplet rest completes a triplet beat; whole beats are plain).
 *
 * @example
 * beatRests(new Fraction(26, 3), new Fraction(2), new Fraction(2)).map((r) => r.duration.toFraction()); // ["4/3", "2/3"]
 */
export function beatRests(from: Fraction, length: Fraction, beat: Fraction): Slot[] {
  const into = from.mod(beat);
  const first = into.equals(0) ? length : beat.sub(into);
  if (first.compare(length) >= 0) return [restOf(length)];
  return [restOf(first), restOf(length.sub(first))];
}

/**
 * One drill per hand: each group as written, followed by a rest of the chosen length.
 *
 * @example
 * liftRests.generate(passage, liftRestsOptions.parse({ rest: "quarter" }), makeContext());
 */
export function generateLiftRests(passage: Passage, options: LiftRestsOptions, ctx: DrillContext): FamilyResult {
  const drills: Drill[] = [];
  const lift = LIFT_LENGTHS[options.rest];
  const hands = passageHands(passage);
  for (const hand of hands) {
    const groups = groupSonorities(passage, hand, options.groupBy, ctx.profile);
    if (groups.length < 2) continue;
    const bar = barLength(passage.time);
    const lead = placeInBar(passage, groups[0][0].onset).offset.mod(bar);
    let t = lead;
    const slots: Slot[] = groups.flatMap((g, i) => {
      const from = g[0].onset;
      const length = groupLength(g);
      const out = passageSlots(passage, hand, undefined, g, { from, to: from.add(length) });
      t = t.add(length);
      const next = groups[i + 1];
      if (!next) return out;
      // The lift, lengthened so that the next group starts at its own place in the beat (in the
      // half bar or bar for a longer group), so its notes are written as in the score.
      // A group with a note tied over a barline keeps its place in the bar, so the tie stays where it was.
      const overBar = next.some((x) => placeInBar(passage, x.onset).offset.mod(bar).add(x.duration).compare(bar) > 0);
      const unit = overBar ? bar : alignUnit(groupLength(next), passage.time);
      const place = placeInBar(passage, next[0].onset).offset.mod(unit);
      const gap = place.sub(t.add(lift)).mod(unit).add(unit).mod(unit);
      const rest = lift.add(gap);
      const rests = beatRests(t, rest, beatLength(passage.time));
      t = t.add(rest);
      return [...out, ...rests];
    });
    drills.push(
      buildDrill(
        passage,
        {
          family: "lift-rests",
          variant: `rest-${options.rest}`,
          title: `Lift between groups${hands.length > 1 ? ` (${hand} hand)` : ""}`,
          teacherNote: "A rest after each group lets the hand release and then land on the next position without tension.",
          studentNote: "In each rest lift the hand off the keys, let the wrist go soft, and land on the next group together.",
          hands: hand,
          segments: [{ [hand]: slots, lead }],
        },
        ctx,
      ),
    );
  }
  return drills.length ? { drills } : { drills, skipped: "The passage is a single group, so there is no move to practise." };
}

export const liftRests: DrillFamily<typeof liftRestsOptions> = {
  id: "lift-rests",
  label: "Lift rests",
  describe: "A rest after each group, so the hand lifts and lands on the next position.",
  options: liftRestsOptions,
  generate: generateLiftRests,
};
