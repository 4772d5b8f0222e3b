/**
 * `ornaments`: grace notes slowed into written notes, then brought back (common practice). The
 * passage is played three times: first each grace-note group written out in time, taking half of the
 * note it ornaments; then quicker, taking a quarter; then as written, with the grace notes back as
 * grace notes. The other notes stay as written throughout, and every note keeps its fingering.
 */
import type Fraction from "fraction.js";
import { z } from "zod";
import type { Hand, NoteEvent, Passage, Sonority } from "../../score/types";
import { buildDrill, leadOf, noteOf, passageHands, passageSlots, type Segment, type Slot } from "../build";
import type { Drill, DrillContext, DrillFamily, FamilyResult } from "../types";
import { tupletFor } from "./shared-2-layout";

/** Options: the steps played, from slow to as written. */
export const ornamentsOptions = z.object({
  steps: z.array(z.enum(["half", "quarter", "as-written"])).min(1).default(["half", "quarter", "as-written"]),
});
export type OrnamentsOptions = z.output<typeof ornamentsOptions>;

const SHARE = { half: 2, quarter: 4 } as const;
const WORDS = { half: "grace notes slowed", quarter: "quicker", "as-written": "as written" } as const;

/**
 * The grace notes of one hand, grouped by the sonority they ornament (the next one struck).
 * @example graceGroups(passage, "right").size // number of ornamented notes
 */
export function graceGroups(passage: Passage, hand: Hand): Map<Sonority, NoteEvent[]> {
  const staff = passage.staffOf[hand];
  const sons = passage.sonorities[hand];
  const out = new Map<Sonority, NoteEvent[]>();
  for (const g of passage.events.filter((e) => e.staff === staff && e.grace && e.pitch)) {
    const target = sons.find((s) => s.onset.compare(g.onset) >= 0);
    if (!target) continue;
    const list = out.get(target);
    if (list) list.push(g); else out.set(target, [g]);
  }
  return out;
}

/** A main note's slot with its grace notes written out in `share` of its time. */
function writtenOut(slot: Slot, graces: readonly NoteEvent[], share: number): Slot[] {
  const part: Fraction = slot.duration.div(share).div(graces.length);
  const tuplet = tupletFor(part);
  const out: Slot[] = graces.map((g) => ({ duration: part, notes: [noteOf(g)], ...(tuplet ? { tuplet } : {}) }));
  const rest = slot.duration.sub(part.mul(graces.length));
  const restTuplet = tupletFor(rest, slot.tuplet);
  return [...out, { ...slot, duration: rest, ...(restTuplet ? { tuplet: restTuplet } : {}) }];
}

function drillForHand(passage: Passage, hand: Hand, o: OrnamentsOptions, ctx: DrillContext): Drill | null {
  const graces = graceGroups(passage, hand);
  if (graces.size === 0) return null;
  const segments: Segment[] = o.steps.map((step) => {
    const slots = passageSlots(passage, hand, (s, i, slot) => {
      const g = graces.get(s);
      const marked = i === 0 ? { ...slot, words: WORDS[step] } : slot;
      if (!g) return marked;
      if (step === "as-written") return { ...marked, grace: g.map(noteOf) };
      const parts = writtenOut(slot, g, SHARE[step]);
      return i === 0 ? [{ ...parts[0]!, words: WORDS[step] }, ...parts.slice(1)] : parts;
    });
    return { [hand]: slots, lead: leadOf(passage) };
  });
  return buildDrill(passage, {
    family: "ornaments",
    variant: "slowed-then-back",
    title: "Grace notes slowed, then back",
    teacherNote: "Writing the grace notes out in time shows exactly which notes and fingers they need; bringing them back step by step keeps them clear at speed.",
    studentNote: "Play the grace notes as written-out notes first, then quicker, then as quick grace notes just before the beat.",
    hands: hand,
    segments,
  }, ctx);
}

/**
 * Ornament drills for each hand with grace notes; skipped with a reason when there are none.
 *
 * @example
 * ornaments.generate(passage, ornamentsOptions.parse({}), makeContext()).skipped; // "The passage has no grace notes …" when none
 */
export function generateOrnaments(passage: Passage, options: OrnamentsOptions, ctx: DrillContext): FamilyResult {
  const drills = passageHands(passage).map((h) => drillForHand(passage, h, options, ctx)).filter((d): d is Drill => d !== null);
  if (drills.length) return { drills };
  const any = passage.events.some((e) => e.grace && e.pitch);
  return { drills: [], skipped: any ? "The grace notes lead to a note on the other staff, so one hand has nothing to slow down." : "The passage has no grace notes to slow down." };
}

/** The `ornaments` family for the registry. */
export const ornaments: DrillFamily<typeof ornamentsOptions> = {
  id: "ornaments",
  label: "Grace notes slowed",
  describe: "Grace notes written out in time, then quicker, then back as written.",
  options: ornamentsOptions,
  generate: generateOrnaments,
};
