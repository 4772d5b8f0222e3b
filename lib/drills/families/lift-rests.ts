/**
 * Lift rests: a rest after each group, so the hand lifts, relaxes and lands on the next group.
 */
import Fraction from "fraction.js";
import { z } from "zod";
import type { Passage } from "../../score/types";
import type { Drill, DrillContext, DrillFamily, FamilyResult } from "../types";
import { buildDrill, leadOf, passageHands, passageSlots, restSlot, type Slot } from "../build";
import { GROUP_BY, groupLength, groupSonorities } from "../groups";

/** Rest lengths in quarter notes. */
export const LIFT_LENGTHS = { "16th": new Fraction(1, 4), eighth: new Fraction(1, 2), quarter: new Fraction(1), half: new Fraction(2) } as const;

export const liftRestsOptions = z.object({
  groupBy: z.enum(GROUP_BY).default("beat"),
  rest: z.enum(["16th", "eighth", "quarter", "half"]).default("eighth"),
});
export type LiftRestsOptions = z.output<typeof liftRestsOptions>;

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
    const slots: Slot[] = groups.flatMap((g) => {
      const from = g[0].onset;
      return [...passageSlots(passage, hand, undefined, g, { from, to: from.add(groupLength(g)) }), restSlot(lift)];
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
          segments: [{ [hand]: slots, lead: leadOf(passage) }],
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
