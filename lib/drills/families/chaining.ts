/**
 * `chaining`: a run learned in short links — three or four notes, then the next group starting on
 * the last note of the one before (overlapping by one), so every join is practised inside a group
 * (common practice). Each link is played evenly, repeated, and followed by a rest in which the
 * hand prepares the next one. The notes keep the passage's fingering.
 */
import Fraction from "fraction.js";
import { z } from "zod";
import type { Hand, Passage, Sonority } from "../../score/types";
import { barLength, buildDrill, noteOf, passageHands, restSlot, type Slot } from "../build";
import type { Drill, DrillContext, DrillFamily, FamilyResult } from "../types";

const VALUES = { "16th": new Fraction(1, 4), eighth: new Fraction(1, 2), quarter: new Fraction(1) } as const;

/** Options: notes per link, times each link is played, its note value, and most links per drill. */
export const chainingOptions = z.object({
  /** Notes per link; "auto" takes 3 in compound meters (they move in threes) and 4 otherwise. */
  size: z.enum(["auto", "3", "4"]).default("auto"),
  repeats: z.number().int().min(1).max(4).default(2),
  value: z.enum(["16th", "eighth", "quarter"]).default("eighth"),
  maxLinks: z.number().int().min(1).max(16).default(6),
});
export type ChainingOptions = z.output<typeof chainingOptions>;

/**
 * Start indexes of the links: groups of `size` items, each starting on the last item of the one
 * before, covering the whole run (the last link may be shorter, never under two items).
 *
 * @example
 * chainLinks(7, 4); // [[0, 4], [3, 7]] — 0-1-2-3, then 3-4-5-6
 * chainLinks(8, 3); // [[0, 3], [2, 5], [4, 7], [6, 8]]
 */
export function chainLinks(count: number, size: number): [number, number][] {
  const links: [number, number][] = [];
  if (count < 2) return links;
  for (let start = 0; start < count - 1; start += size - 1) links.push([start, Math.min(count, start + size)]);
  return links;
}

/** Notes per link for a passage: the option, or 3 in compound meters and 4 otherwise. */
function linkSize(passage: Passage, o: ChainingOptions): 3 | 4 {
  if (o.size !== "auto") return o.size === "3" ? 3 : 4;
  const { beats, beatType } = passage.time;
  return beatType >= 8 && beats % 3 === 0 && beats > 3 ? 3 : 4;
}

function drillForHand(passage: Passage, hand: Hand, opts: ChainingOptions, ctx: DrillContext): Drill | null {
  const o = { ...opts, size: linkSize(passage, opts) };
  const sons: Sonority[] = passage.sonorities[hand].filter((s, i, all) => i === 0 || s.notes.map((n) => n.pitch!.midi).join() !== all[i - 1]!.notes.map((n) => n.pitch!.midi).join());
  if (sons.length < o.size + 1) return null;
  const links = chainLinks(sons.length, o.size).slice(0, o.maxLinks);
  const v = VALUES[o.value];
  // Each link starts on a bar line and never crosses one: after its repeats a rest fills the bar;
  // when the link fills the bar exactly, its last note carries a pause (fermata) instead.
  const bar = barLength(passage.time);
  const slots: Slot[] = [];
  let t = new Fraction(0);
  for (const [a, b] of links) {
    const link = sons.slice(a, b);
    for (let r = 0; r < o.repeats; r++) for (const s of link) slots.push({ duration: v, notes: s.notes.map(noteOf) });
    t = t.add(v.mul(link.length * o.repeats));
    const left = bar.sub(t.mod(bar)).mod(bar);
    if (left.compare(0) > 0) slots.push(restSlot(left));
    else slots[slots.length - 1] = { ...slots[slots.length - 1]!, marks: ["fermata"] };
    t = t.add(left);
  }
  const shown = links.length < chainLinks(sons.length, o.size).length ? " (the first links)" : "";
  return buildDrill(passage, {
    family: "chaining",
    variant: `links-of-${o.size}`,
    title: `Chaining in links of ${o.size} notes${shown}`,
    teacherNote: `Each link of ${o.size} notes starts on the last note of the one before, so every join of the run is practised inside a group.`,
    studentNote: `Play each link evenly ${o.repeats === 1 ? "once" : o.repeats === 2 ? "twice" : `${o.repeats} times`}, then rest (or pause) and prepare the next link over its first note, which is the note you just played.`,
    hands: hand,
    segments: [{ [hand]: slots }],
  }, ctx);
}

/**
 * Chaining drills for each hand with a run longer than one link.
 *
 * @example
 * chaining.generate(passage, chainingOptions.parse({ size: 3 }), makeContext()).drills[0].variant; // "links-of-3"
 */
export function generateChaining(passage: Passage, options: ChainingOptions, ctx: DrillContext): FamilyResult {
  const drills = passageHands(passage).map((h) => drillForHand(passage, h, options, ctx)).filter((d): d is Drill => d !== null);
  return drills.length ? { drills } : { drills: [], skipped: `The passage has no run longer than ${linkSize(passage, options)} notes to chain.` };
}

/** The `chaining` family for the registry. */
export const chaining: DrillFamily<typeof chainingOptions> = {
  id: "chaining",
  label: "Chaining",
  describe: "A run in links of three or four notes, each link starting on the last note of the one before.",
  options: chainingOptions,
  generate: generateChaining,
};
