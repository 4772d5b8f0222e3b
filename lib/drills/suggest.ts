/**
 * Which drill families help with which problem (the knot's tags), ranked. The table is the
 * product's teaching advice in one place (DESIGN.md: each tag suggests drill families).
 */
import type { ProblemTag } from "./types";

/** Per tag, families from most to least useful. */
export const SUGGESTIONS: Readonly<Record<ProblemTag, readonly string[]>> = {
  rhythm: ["rhythm-variants", "scale-rhythm", "tempo-ladder", "stops", "lift-rests", "ornaments"],
  evenness: ["rhythm-variants", "stops", "chaining", "note-pairs", "thumb-pairs", "tempo-ladder", "ornaments"],
  rotation: ["pivot-walk", "held-tone", "blocking", "note-pairs", "rhythm-variants"],
  "lateral move": ["blocking", "chaining", "lift-rests", "thumb-pairs", "octave-shift", "sequence"],
  release: ["lift-rests", "stops", "blocking", "tempo-ladder"],
  leap: ["lift-rests", "octave-shift", "stops", "blocking", "tempo-ladder"],
  voicing: ["voice-isolation", "doubles", "octave-doubling", "held-tone", "note-pairs"],
  stretch: ["blocking", "pivot-walk", "note-pairs", "octave-shift"],
  coordination: ["voice-isolation", "octave-doubling", "tempo-ladder", "sequence", "rhythm-variants", "blocking"],
};

/**
 * Family ids for a set of problem tags, best first: a family scores more the earlier it comes in
 * each tag's list, and scores add up across tags. Ties keep the order of first mention.
 *
 * @example
 * suggestFamilies(["rotation"]); // ["pivot-walk", "held-tone", "blocking", "note-pairs", "rhythm-variants"]
 */
export function suggestFamilies(tags: readonly ProblemTag[]): string[] {
  const score = new Map<string, number>();
  for (const tag of new Set(tags)) {
    const list = SUGGESTIONS[tag] ?? [];
    list.forEach((id, i) => score.set(id, (score.get(id) ?? 0) + (list.length - i) / list.length));
  }
  const order = [...score.keys()];
  return order.sort((a, b) => score.get(b)! - score.get(a)! || order.indexOf(a) - order.indexOf(b));
}
