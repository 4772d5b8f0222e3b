/**
 * Blocking: each hand position (the keys the hand covers before it moves, `hand-position.ts`) played
 * at once as one chord, in the passage's own rhythm of positions, so the hand learns the shape before
 * the motion. A position never grows past the comfortable span or five keys, and a run of steps is
 * never squeezed into a cluster. Variants: block then tap the outer notes; inner notes first, then
 * the full chord (chords of three or more keys only).
 */
import Fraction from "fraction.js";
import { z } from "zod";
import type { Hand, Passage } from "../../score/types";
import type { Drill, DrillContext, DrillFamily, FamilyResult } from "../types";
import { buildDrill, leadOf, noteOf, passageHands, passageRange, restSlot, type Slot } from "../build";
import { GROUP_BY, groupSonorities } from "../groups";
import { handPositions, type HandPosition } from "../hand-position";

export const blockingOptions = z.object({
  groupBy: z.enum(GROUP_BY).default("position"),
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

type Variant = BlockingOptions["variants"][number];

/** A position's keys as one chord, each note from the passage (its finger travels with it). */
const chordOf = (p: HandPosition, duration: Fraction): Slot => ({ duration, notes: p.notes.map(noteOf) });

/** A position that forms no chord (a run of steps, one key) played as written, in its own time. */
function asWritten(p: HandPosition): Slot[] {
  const out: Slot[] = [];
  const end = p.onset.add(p.duration);
  p.sonorities.forEach((s, i) => {
    const next = p.sonorities[i + 1]?.onset ?? end;
    const stop = s.onset.add(s.duration).compare(next) > 0 ? next : s.onset.add(s.duration);
    const tuplet = s.notes[0]?.written.tuplet ?? undefined;
    out.push({ duration: stop.sub(s.onset), notes: s.notes.map(noteOf), ...(tuplet ? { tuplet } : {}) });
    if (next.compare(stop) > 0) out.push(restSlot(next.sub(stop)));
  });
  return out;
}

/** What one position becomes in a variant. */
function cell(p: HandPosition, variant: Variant): Slot[] {
  if (!p.chordal) return asWritten(p);
  const len = p.duration;
  if (variant === "block") return [chordOf(p, len)];
  if (variant === "block-then-tap") {
    const half = len.div(2);
    return [chordOf(p, len), { duration: half, notes: [noteOf(p.notes[0]!)] }, { duration: half, notes: [noteOf(p.notes[p.notes.length - 1]!)] }];
  }
  if (p.notes.length < 3) return [chordOf(p, len)];
  return [{ duration: len, notes: p.notes.slice(1, -1).map(noteOf) }, chordOf(p, len)];
}

/** One hand's positions in time: each becomes its cell; the time before the first stays a rest. */
function positionSlots(passage: Passage, positions: readonly HandPosition[], variant: Variant): Slot[] {
  const out: Slot[] = [];
  const from = passageRange(passage).from;
  if (positions[0] && positions[0].onset.compare(from) > 0) out.push(restSlot(positions[0].onset.sub(from)));
  for (const p of positions) out.push(...cell(p, variant));
  return out;
}

/** Onsets (as numbers) where a teacher's grouping starts a new group: positions never cross them. */
function groupBreaks(passage: Passage, hand: Hand, by: BlockingOptions["groupBy"], ctx: DrillContext): Set<number> | undefined {
  if (by === "position") return undefined;
  return new Set(groupSonorities(passage, hand, by, ctx.profile).map((g) => g[0]!.onset.valueOf()));
}

/**
 * Blocked-chord drills for each hand of the passage: every hand position that forms a chord is
 * played as one chord for as long as the hand stays in it; runs of steps stay as written. A hand
 * whose melody never forms a chord position is left out, with a reason when no hand has one.
 *
 * @example
 * blocking.generate(passage, blockingOptions.parse({}), makeContext()).drills.map((d) => d.variant);
 */
export function generateBlocking(passage: Passage, options: BlockingOptions, ctx: DrillContext): FamilyResult {
  const withNotes = passageHands(passage).filter((h) => passage.sonorities[h].length > 0);
  if (withNotes.length === 0) return { drills: [], skipped: "The passage has no notes to block." };
  const positions = new Map(
    withNotes.map((h) => [h, handPositions(passage, h, ctx.profile, ctx.fingeringMemo, groupBreaks(passage, h, options.groupBy, ctx))]),
  );
  const hands = withNotes.filter((h) => positions.get(h)!.some((p) => p.chordal));
  if (hands.length === 0) {
    return { drills: [], skipped: "The notes never settle into a hand position that forms a chord (the line moves by step), so there is nothing to block." };
  }
  const drills: Drill[] = [];
  for (const variant of options.variants) {
    const text = TEXT[variant];
    if (variant === "inner-then-chord" && !hands.some((h) => positions.get(h)!.some((p) => p.chordal && p.notes.length >= 3))) continue;
    // Blocks keep the passage's timing, so both hands can play together; the longer variants go hand by hand.
    const sets: (Hand | "both")[] = variant === "block" && hands.length === 2 ? ["both"] : hands;
    for (const set of sets) {
      const own = set === "both" ? hands : [set];
      const segment = Object.fromEntries(own.map((h) => [h, positionSlots(passage, positions.get(h)!, variant)]));
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
  describe: "Each hand position played together as one chord, to learn the hand shape first.",
  options: blockingOptions,
  generate: generateBlocking,
};
