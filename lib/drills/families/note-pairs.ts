/**
 * Note pairs: for two consecutive sonorities A → B, every cell from a non-empty subset of A to a
 * non-empty subset of B, smallest first, bottom to top; each cell repeated. The full count is
 * (2^a − 1)(2^b − 1); the teacher caps how many cells a drill shows and the drill says "n of N".
 */
import Fraction from "fraction.js";
import { z } from "zod";
import type { Passage, Sonority } from "../../score/types";
import type { Drill, DrillContext, DrillFamily, FamilyResult } from "../types";
import { buildDrill, noteOf, passageHands, restSlot, type Slot } from "../build";
import { pitchName } from "../spell";

const VALUES = { "16th": new Fraction(1, 4), eighth: new Fraction(1, 2), quarter: new Fraction(1) } as const;

export const notePairsOptions = z.object({
  /** Most cells per drill ("n of N"). */
  maxCells: z.number().int().min(1).max(200).default(9),
  /** Times each cell is played. */
  repeats: z.number().int().min(1).max(8).default(2),
  value: z.enum(["16th", "eighth", "quarter"]).default("eighth"),
  /** Most consecutive pairs (drills) per hand. */
  maxPairs: z.number().int().min(1).max(16).default(4),
});
export type NotePairsOptions = z.output<typeof notePairsOptions>;

/**
 * The non-empty subsets of 0 … n−1, smallest first, then bottom to top (lexicographic).
 *
 * @example
 * subsets(3); // [[0], [1], [2], [0, 1], [0, 2], [1, 2], [0, 1, 2]]
 */
export function subsets(n: number): number[][] {
  const all: number[][] = [];
  for (let mask = 1; mask < 1 << n; mask++) all.push([...Array(n).keys()].filter((i) => mask & (1 << i)));
  return all.sort((x, y) => x.length - y.length || x.join(",").localeCompare(y.join(","), "en", { numeric: true }));
}

/**
 * Every cell from a subset of A (a notes) to a subset of B (b notes): fewest notes first
 * (one → one, then one → two, two → one …), bottom to top within each size.
 *
 * @example
 * noteCells(2, 2).slice(0, 4); // [[[0],[0]], [[0],[1]], [[1],[0]], [[1],[1]]]
 * noteCells(2, 3).length; // (2² − 1)(2³ − 1) = 21
 */
export function noteCells(a: number, b: number): [number[], number[]][] {
  const sa = subsets(a);
  const sb = subsets(b);
  const cells: [number[], number[]][] = [];
  for (let total = 2; total <= a + b; total++) {
    for (let k = 1; k < total; k++) {
      for (const x of sa.filter((s) => s.length === k)) {
        for (const y of sb.filter((s) => s.length === total - k)) cells.push([x, y]);
      }
    }
  }
  return cells;
}

const label = (s: Sonority) => s.notes.map((n) => pitchName(n.pitch!)).join("+");

/**
 * One drill per consecutive pair of different sonorities (up to `maxPairs` per hand).
 *
 * @example
 * notePairs.generate(passage, notePairsOptions.parse({ maxCells: 4 }), makeContext()).drills[0].title;
 */
export function generateNotePairs(passage: Passage, options: NotePairsOptions, ctx: DrillContext): FamilyResult {
  const drills: Drill[] = [];
  const v = VALUES[options.value];
  const hands = passageHands(passage);
  for (const hand of hands) {
    const sons = passage.sonorities[hand];
    // Pairs that involve a chord teach the most; single-note pairs only when the hand has no chords.
    const hasChordPair = sons.some((s, i) => i + 1 < sons.length && s.notes.length + sons[i + 1].notes.length > 2);
    const seen = new Set<string>();
    for (let i = 0; i + 1 < sons.length && seen.size < options.maxPairs; i++) {
      const [A, B] = [sons[i], sons[i + 1]];
      const key = `${label(A)}>${label(B)}`;
      if (label(A) === label(B) || seen.has(key)) continue;
      if (hasChordPair && A.notes.length + B.notes.length === 2) continue;
      seen.add(key);
      const all = noteCells(A.notes.length, B.notes.length);
      const shown = all.slice(0, options.maxCells);
      const slots: Slot[] = shown.flatMap(([x, y]) => {
        const cell: Slot[] = [];
        for (let r = 0; r < options.repeats; r++) {
          // The count stays in the title: a number on a note reads as a fingering (DRILL-RUBRIC 7).
          cell.push({ duration: v, notes: x.map((k) => noteOf(A.notes[k])) });
          cell.push({ duration: v, notes: y.map((k) => noteOf(B.notes[k])) });
        }
        return [...cell, restSlot(v.mul(2))];
      });
      drills.push(
        buildDrill(
          passage,
          {
            family: "note-pairs",
            variant: `pair-${i + 1}`,
            title: `Note pairs ${label(A)} → ${label(B)}${all.length > 1 ? ` (${shown.length} of ${all.length})` : ""}${hands.length > 1 ? `, ${hand} hand` : ""}`,
            teacherNote:
              all.length > 1
                ? `Each small cell isolates one connection between the two positions: ${shown.length} of the ${all.length} possible cells, the simplest first.`
                : "The one connection between these two notes, repeated until the move is secure.",
            studentNote: "Play each cell slowly and evenly as written, rest, then the next. Keep the fingers close to the keys.",
            hands: hand,
            segments: [{ [hand]: slots }],
          },
          ctx,
        ),
      );
    }
  }
  return drills.length ? { drills } : { drills, skipped: "There are no two different consecutive notes or chords to pair." };
}

export const notePairs: DrillFamily<typeof notePairsOptions> = {
  id: "note-pairs",
  label: "Note pairs",
  describe: "Every small cell between two neighbouring notes or chords, simplest first, each repeated.",
  options: notePairsOptions,
  generate: generateNotePairs,
};
