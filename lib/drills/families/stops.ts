/**
 * Stops: a fermata on the n-th note of each group, one variant per n, so the hand learns to
 * stop (and start again) anywhere in a figure instead of only at its end.
 */
import { z } from "zod";
import type { Passage, Sonority } from "../../score/types";
import type { Drill, DrillContext, DrillFamily, FamilyResult } from "../types";
import { buildDrill, leadOf, passageHands, passageSlots } from "../build";
import { GROUP_BY, groupSonorities } from "../groups";

export const stopsOptions = z.object({
  groupBy: z.enum(GROUP_BY).default("beat"),
  /** Most variants to write (n = 1 … this), however large the groups. */
  maxVariants: z.number().int().min(1).max(12).default(4),
});
export type StopsOptions = z.output<typeof stopsOptions>;

const ORDINAL = ["first", "second", "third", "fourth", "fifth", "sixth", "seventh", "eighth", "ninth", "tenth", "eleventh", "twelfth"];

/**
 * One drill per n and hand: the passage as written with a fermata on the n-th note of each group.
 *
 * @example
 * stops.generate(passage, stopsOptions.parse({}), makeContext()).drills.length; // 4 for groups of four
 */
export function generateStops(passage: Passage, options: StopsOptions, ctx: DrillContext): FamilyResult {
  const drills: Drill[] = [];
  for (const hand of passageHands(passage)) {
    const groups = groupSonorities(passage, hand, options.groupBy, ctx.profile);
    const place = new Map<Sonority, number>();
    groups.forEach((g) => g.forEach((s, i) => place.set(s, i + 1)));
    const largest = Math.max(0, ...groups.map((g) => g.length));
    if (largest < 2) continue;
    for (let n = 1; n <= Math.min(largest, options.maxVariants); n++) {
      const slots = passageSlots(passage, hand, (s, _i, slot) => (place.get(s) === n ? { ...slot, marks: ["fermata"] } : slot));
      const where = ORDINAL[n - 1];
      drills.push(
        buildDrill(
          passage,
          {
            family: "stops",
            variant: `stop-${n}`,
            title: `Stop on the ${where} note${passageHands(passage).length > 1 ? ` (${hand} hand)` : ""}`,
            teacherNote: `Stopping on the ${where} note of every group checks that the hand is ready at each point, not only at the end of the figure.`,
            studentNote: `Play up to each fermata, hold it, prepare the next notes in your mind, then play on.`,
            hands: hand,
            segments: [{ [hand]: slots, lead: leadOf(passage) }],
          },
          ctx,
        ),
      );
    }
  }
  return drills.length ? { drills } : { drills, skipped: "Every group has a single note, so there is nowhere to stop inside it." };
}

export const stops: DrillFamily<typeof stopsOptions> = {
  id: "stops",
  label: "Stops",
  describe: "A held note on the first, second, third … note of each group, one drill each.",
  options: stopsOptions,
  generate: generateStops,
};
