/**
 * `doubles`: for double notes (two-voice thirds and sixths), one voice repeats each step while the
 * other holds, then the reverse, then both together. The repeating voice is marked louder than
 * the holding one, so the student hears and controls each finger of the pair.
 */
import Fraction from "fraction.js";
import { z } from "zod";
import type { Hand, Passage, Sonority } from "../../score/types";
import { buildDrill, defaultTempo, noteOf, passageHands, type Slot } from "../build";
import type { Drill, DrillContext, DrillFamily, FamilyResult } from "../types";
import { buildVoicedDrill } from "./shared-2-layout";

const VALUES = { "16th": new Fraction(1, 4), eighth: new Fraction(1, 2), quarter: new Fraction(1) } as const;

/** Options: repeats per step and their note value, dynamics on or off, most steps used. */
export const doublesOptions = z.object({
  repeats: z.number().int().min(2).max(8).default(4),
  value: z.enum(["16th", "eighth", "quarter"]).default("eighth"),
  dynamics: z.boolean().default(true),
  maxSteps: z.number().int().min(1).max(32).default(8),
});
export type DoublesOptions = z.output<typeof doublesOptions>;

/**
 * The hand's two-note sonorities of two different keys in order (the double-note steps), at most `max`.
 * @example doubleSteps(makePassage({ right: "[C4,E4]/4 [D4,F4]/4" }).sonorities.right, 8).length // 2
 */
export function doubleSteps(sons: readonly Sonority[], max: number): Sonority[] {
  // Two different keys: a unison written in two voices is one key, not a double note.
  return sons.filter((s) => s.notes.length === 2 && s.notes[0]!.pitch!.midi !== s.notes[1]!.pitch!.midi).slice(0, max);
}

type Who = "upper" | "lower";

function voiceSlots(steps: readonly Sonority[], who: Who, repeating: boolean, o: DoublesOptions): Slot[] {
  const value = VALUES[o.value];
  // Only the repeating (louder) voice carries a dynamic: both voices start together, and two
  // dynamics at one moment would stack under the note (the holding voice is marked soft in words).
  const loud = o.dynamics && repeating ? "f" : undefined;
  return steps.flatMap((s, i) => {
    const n = noteOf(s.notes[who === "upper" ? 1 : 0]);
    const dyn = i === 0 && loud ? { dynamic: loud } : {};
    if (!repeating) return [{ duration: value.mul(o.repeats), notes: [n], ...dyn }];
    return Array.from({ length: o.repeats }, (_, k) => ({ duration: value, notes: [n], ...(k === 0 ? dyn : {}) }));
  });
}

function drillsForHand(passage: Passage, hand: Hand, o: DoublesOptions, ctx: DrillContext): Drill[] {
  const steps = doubleSteps(passage.sonorities[hand], o.maxSteps);
  if (steps.length === 0) return [];
  const base = { family: "doubles", tempo: defaultTempo(passage) };
  const top = buildVoicedDrill(passage, {
    ...base, variant: "top-repeats", title: "Double notes: top repeats, lower holds",
    teacherNote: "Separating the two fingers of each double note shows whether the top one is weak or late.",
    studentNote: "Hold the lower note quietly; repeat the upper note clearly and a little louder, then move to the next pair.",
  }, hand, voiceSlots(steps, "upper", true, o), voiceSlots(steps, "lower", false, o), ctx);
  const low = buildVoicedDrill(passage, {
    ...base, variant: "lower-repeats", title: "Double notes: lower repeats, top holds",
    teacherNote: "The reverse check: the lower finger has to speak on its own while the upper one stays down.",
    studentNote: "Hold the upper note quietly; repeat the lower note clearly and a little louder.",
  }, hand, voiceSlots(steps, "upper", false, o), voiceSlots(steps, "lower", true, o), ctx);
  const value = VALUES[o.value];
  const both: Slot[] = steps.flatMap((s) =>
    Array.from({ length: o.repeats }, () => ({ duration: value, notes: s.notes.map(noteOf) })),
  );
  const together = buildDrill(passage, {
    ...base, variant: "both-repeat", hands: hand, title: "Double notes: both repeat",
    teacherNote: "After each finger alone, the pair must land exactly together.",
    studentNote: "Repeat each pair with both notes sounding at the same moment and the same loudness.",
    segments: [{ [hand]: both }],
  }, ctx);
  return [top, low, together];
}

/**
 * Generate the double-note drills; skips when the passage has no two-note steps.
 * @example generateDoubles(makePassage({ right: "[C4,E4]/4 [D4,F4]/4" }), doublesOptions.parse({}), makeContext()).drills.length // 3
 */
export function generateDoubles(passage: Passage, options: DoublesOptions, ctx: DrillContext): FamilyResult {
  const written = passageHands(passage).flatMap((h) => drillsForHand(passage, h, options, ctx));
  // A step whose printed fingering cannot hold one note while the other repeats is left out.
  const drills = written.filter((d) => !d.warnings.some((w) => w.code === "fingering"));
  if (drills.length) return { drills };
  return { drills: [], skipped: written.length ? "The double notes cannot be split into held and repeated voices with the passage's fingering." : "There are no double notes (two notes together in one hand)." };
}

/** The `doubles` family for the registry. */
export const doubles: DrillFamily<typeof doublesOptions> = {
  id: "doubles",
  label: "Double notes, one voice at a time",
  describe: "Each double note with one voice repeating louder while the other holds, then the reverse, then both.",
  options: doublesOptions,
  generate: generateDoubles,
};
