/**
 * `octave-doubling`: the line of one hand doubled an octave away by the other hand (the right-hand
 * line an octave lower in the left hand, the left-hand line an octave higher in the right hand),
 * with one hand marked louder — so the student hears the line twice and learns to lead with either
 * hand (common practice). One dynamic per line, written at its first note.
 */
import { z } from "zod";
import type { Hand, Passage, Sonority } from "../../score/types";
import { buildDrill, defaultTempo, noteOf, passageHands, PIANO_RANGE } from "../build";
import type { Drill, DrillContext, DrillFamily, FamilyResult } from "../types";
import { shiftOctave } from "../spell";
import { passageOrigin, timelineSlots, type TimedItem } from "./shared-2-layout";

/** Options: which hand leads (is louder): the passage's own hand, the doubling hand, or both drills. */
export const octaveDoublingOptions = z.object({
  louder: z.enum(["own", "other", "both"]).default("both"),
});
export type OctaveDoublingOptions = z.output<typeof octaveDoublingOptions>;

/**
 * The hand's line: the top note of each sonority in the right hand, the bottom note in the left.
 * @example lineOf(makePassage({ right: "[C4,E4]/4 D4/4" }).sonorities.right, "right").map((s) => s.notes.length) // [1, 1]
 */
export function lineOf(sons: readonly Sonority[], hand: Hand): Sonority[] {
  return sons.map((s) => ({ ...s, notes: [hand === "right" ? s.notes[s.notes.length - 1]! : s.notes[0]!] }));
}

function drillsForHand(passage: Passage, hand: Hand, o: OctaveDoublingOptions, ctx: DrillContext): Drill[] {
  const line = lineOf(passage.sonorities[hand], hand);
  if (line.length < 2) return [];
  const other: Hand = hand === "right" ? "left" : "right";
  const shift = hand === "right" ? -1 : 1;
  const doubled = line.map((s) => ({ s, pitch: shiftOctave(s.notes[0]!.pitch!, shift) }));
  if (doubled.some((d) => d.pitch.midi < PIANO_RANGE.low || d.pitch.midi > PIANO_RANGE.high)) return [];
  const { origin, end } = passageOrigin(passage);
  const leads = o.louder === "both" ? (["own", "other"] as const) : [o.louder];
  return leads.map((lead) => {
    const [mine, theirs] = lead === "own" ? ["f", "p"] : ["p", "f"];
    const own: TimedItem[] = line.map((s, i) => ({ onset: s.onset, duration: s.duration, notes: [noteOf(s.notes[0]!)], tuplet: s.notes[0]!.written.tuplet, ...(i === 0 ? { dynamic: mine } : {}) }));
    const twin: TimedItem[] = doubled.map(({ s, pitch }, i) => ({ onset: s.onset, duration: s.duration, notes: [{ pitch, like: s.notes[0]! }], tuplet: s.notes[0]!.written.tuplet, ...(i === 0 ? { dynamic: theirs } : {}) }));
    const leader = lead === "own" ? hand : other;
    return buildDrill(passage, {
      family: "octave-doubling",
      variant: lead === "own" ? "own-hand-louder" : "other-hand-louder",
      hands: "both",
      tempo: defaultTempo(passage),
      title: `Line in octaves, ${leader} hand louder`,
      teacherNote: `Doubling the ${hand}-hand line an octave ${shift < 0 ? "lower" : "higher"} in the ${other} hand lets the student hear the line twice and lead it with one hand.`,
      studentNote: `Play the line with both hands an octave apart; let the ${leader} hand sing out and keep the other hand soft.`,
      segments: [{ [hand]: timelineSlots(own, origin, end), [other]: timelineSlots(twin, origin, end) }],
    }, ctx);
  });
}

/**
 * Octave-doubling drills for each hand of the passage with a line of two notes or more.
 *
 * @example
 * octaveDoubling.generate(passage, octaveDoublingOptions.parse({}), makeContext()).drills.map((d) => d.variant); // ["own-hand-louder", "other-hand-louder"]
 */
export function generateOctaveDoubling(passage: Passage, options: OctaveDoublingOptions, ctx: DrillContext): FamilyResult {
  const drills = passageHands(passage).flatMap((h) => drillsForHand(passage, h, options, ctx));
  return drills.length ? { drills } : { drills: [], skipped: "There is no line of two or more notes that fits on the keyboard an octave away." };
}

/** The `octave-doubling` family for the registry. */
export const octaveDoubling: DrillFamily<typeof octaveDoublingOptions> = {
  id: "octave-doubling",
  label: "Line in octaves",
  describe: "The line of one hand doubled an octave away by the other hand, with one hand louder.",
  options: octaveDoublingOptions,
  generate: generateOctaveDoubling,
};
