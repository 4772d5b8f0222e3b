/**
 * Blocking: each group of notes played at once as one chord of its distinct pitches, so the hand
 * learns the shape before the motion. Variants: block then tap the outer notes; inner notes first,
 * then the full chord.
 */
import Fraction from "fraction.js";
import { z } from "zod";
import type { Hand, Passage, Sonority } from "../../score/types";
import type { Drill, DrillContext, DrillFamily, FamilyResult } from "../types";
import { buildDrill, leadOf, noteOf, passageHands, passageRange, restSlot, type Slot } from "../build";
import { distinctNotes, GROUP_BY, groupLength, groupSonorities } from "../groups";

export const blockingOptions = z.object({
  groupBy: z.enum(GROUP_BY).default("beat"),
  variants: z.array(z.enum(["block", "block-then-tap", "inner-then-chord"])).min(1).default(["block", "block-then-tap", "inner-then-chord"]),
});
export type BlockingOptions = z.output<typeof blockingOptions>;

const TEXT = {
  block: {
    title: "Blocked chords",
    teacherNote: "Playing each group as one chord shows the hand position before the motion between notes.",
    studentNote: "Play each chord together, feel the shape, then relax the hand before the next.",
  },
  "block-then-tap": {
    title: "Block, then tap the outer notes",
    teacherNote: "The chord sets the position; tapping the outer notes checks the reach of the frame.",
    studentNote: "Play the chord, then the lowest and the highest note alone, keeping the hand in place.",
  },
  "inner-then-chord": {
    title: "Inner notes, then the full chord",
    teacherNote: "Placing the inner fingers first builds the shape from the middle, without strain at the edges.",
    studentNote: "Play the inner notes together, then add the outer notes for the full chord.",
  },
} as const;

/** Slots for one hand's groups in time: each group becomes what `cell` writes, gaps stay rests. */
function groupSlots(passage: Passage, groups: Sonority[][], cell: (g: Sonority[], len: Fraction) => Slot[]): Slot[] {
  const out: Slot[] = [];
  let t = passageRange(passage).from;
  for (const g of groups) {
    if (g[0].onset.compare(t) > 0) out.push(restSlot(g[0].onset.sub(t)));
    const len = groupLength(g);
    out.push(...cell(g, len));
    t = g[0].onset.add(len);
  }
  return out;
}

const chordOf = (g: Sonority[], duration: Fraction): Slot => ({ duration, notes: distinctNotes(g).map(noteOf) });

function cellFor(variant: BlockingOptions["variants"][number]) {
  return (g: Sonority[], len: Fraction): Slot[] => {
    const notes = distinctNotes(g);
    if (variant === "block" || notes.length < 2) return [chordOf(g, len)];
    if (variant === "block-then-tap") {
      const half = len.div(2);
      return [chordOf(g, len), { duration: half, notes: [noteOf(notes[0])] }, { duration: half, notes: [noteOf(notes[notes.length - 1])] }];
    }
    if (notes.length < 3) return [chordOf(g, len), chordOf(g, len)];
    return [{ duration: len, notes: notes.slice(1, -1).map(noteOf) }, chordOf(g, len)];
  };
}

/**
 * Blocked-chord drills for each hand of the passage.
 *
 * @example
 * blocking.generate(passage, blockingOptions.parse({}), makeContext()).drills.map((d) => d.variant);
 */
export function generateBlocking(passage: Passage, options: BlockingOptions, ctx: DrillContext): FamilyResult {
  const hands = passageHands(passage).filter((h) => passage.sonorities[h].length > 0);
  if (hands.length === 0) return { drills: [], skipped: "The passage has no notes to block." };
  const drills: Drill[] = [];
  for (const variant of options.variants) {
    const text = TEXT[variant];
    const groupsOf = (h: Hand) => groupSonorities(passage, h, options.groupBy, ctx.profile);
    if (variant === "inner-then-chord" && !hands.some((h) => groupsOf(h).some((g) => distinctNotes(g).length >= 3))) continue;
    // Blocks keep the passage's timing, so both hands can play together; the longer variants go hand by hand.
    const sets: (Hand | "both")[] = variant === "block" && hands.length === 2 ? ["both"] : hands;
    for (const set of sets) {
      const own = set === "both" ? hands : [set];
      const segment = Object.fromEntries(own.map((h) => [h, groupSlots(passage, groupsOf(h), cellFor(variant))]));
      drills.push(
        buildDrill(
          passage,
          { family: "blocking", variant, ...text, title: own.length === 1 && hands.length === 2 ? `${text.title} (${set} hand)` : text.title, hands: set, segments: [{ ...segment, lead: leadOf(passage) }] },
          ctx,
        ),
      );
    }
  }
  return { drills };
}

export const blocking: DrillFamily<typeof blockingOptions> = {
  id: "blocking",
  label: "Blocking",
  describe: "Each group of notes played together as one chord, to learn the hand shape first.",
  options: blockingOptions,
  generate: generateBlocking,
};
