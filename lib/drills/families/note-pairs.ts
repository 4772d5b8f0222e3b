/**
 * Note pairs: for two consecutive hand positions A → B (`hand-position.ts`), every ordered pair of a
 * key of A to a key of B (bottom → bottom, bottom → top, top → bottom …), then one key of A to two
 * keys of B; each cell repeated and followed by a rest, fingered as the passage is. The teacher caps
 * how many cells a drill shows and the title says "n of N cells". A hand that stays in one position
 * pairs its consecutive notes or chords instead.
 */
import Fraction from "fraction.js";
import { z } from "zod";
import type { Hand, NoteEvent, Passage } from "../../score/types";
import { handPositions } from "../hand-position";
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

/**
 * The cells a teacher drills between two positions of a and b keys: every ordered pair of one key
 * of the first to one key of the second (bottom → bottom, bottom → next …), then one key to two keys.
 *
 * @example
 * positionCells(2, 2); // [[[0],[0]], [[0],[1]], [[1],[0]], [[1],[1]], [[0],[0,1]], [[1],[0,1]]]
 */
export function positionCells(a: number, b: number): [number[], number[]][] {
  const cells: [number[], number[]][] = [];
  for (let i = 0; i < a; i++) for (let j = 0; j < b; j++) cells.push([[i], [j]]);
  for (let i = 0; i < a; i++) for (let j = 0; j < b; j++) for (let k = j + 1; k < b; k++) cells.push([[i], [j, k]]);
  return cells;
}

type Keys = readonly NoteEvent[];
const label = (keys: Keys) => keys.map((n) => pitchName(n.pitch!)).join("+");

/** Consecutive hand positions of a hand; a hand that never moves pairs its consecutive notes or chords. */
function unitsOf(passage: Passage, hand: Hand, ctx: DrillContext): Keys[] {
  const positions = handPositions(passage, hand, ctx.profile, ctx.fingeringMemo);
  if (positions.length >= 2) return positions.map((p) => p.notes);
  return passage.sonorities[hand].map((s) => [...new Map(s.notes.map((n) => [n.pitch!.midi, n])).values()]);
}

/**
 * One drill per move between consecutive hand positions (up to `maxPairs` per hand): every pair of a
 * key of the first position to a key of the second, then one key to two keys; each cell repeated,
 * then a rest. The notes keep the passage's fingers.
 *
 * @example
 * notePairs.generate(passage, notePairsOptions.parse({ maxCells: 4 }), makeContext()).drills[0].title;
 */
export function generateNotePairs(passage: Passage, options: NotePairsOptions, ctx: DrillContext): FamilyResult {
  const drills: Drill[] = [];
  const v = VALUES[options.value];
  const hands = passageHands(passage);
  for (const hand of hands) {
    const units = unitsOf(passage, hand, ctx);
    const seen = new Set<string>();
    for (let i = 0; i + 1 < units.length && seen.size < options.maxPairs; i++) {
      const [A, B] = [units[i]!, units[i + 1]!];
      const key = `${label(A)}>${label(B)}`;
      if (label(A) === label(B) || seen.has(key)) continue;
      seen.add(key);
      const all = positionCells(A.length, B.length);
      const shown = all.slice(0, options.maxCells);
      const slots: Slot[] = shown.flatMap(([x, y]) => {
        const cell: Slot[] = [];
        for (let r = 0; r < options.repeats; r++) {
          // The count stays in the title: a number on a note reads as a fingering (DRILL-RUBRIC 7).
          cell.push({ duration: v, notes: x.map((k) => noteOf(A[k]!)) });
          cell.push({ duration: v, notes: y.map((k) => noteOf(B[k]!)) });
        }
        return [...cell, restSlot(v.mul(2))];
      });
      const count = all.length > shown.length ? ` (${shown.length} of ${all.length} cells)` : "";
      drills.push(
        buildDrill(
          passage,
          {
            family: "note-pairs",
            variant: `pair-${i + 1}`,
            title: `Note pairs ${label(A)} → ${label(B)}${count}${hands.length > 1 ? `, ${hand} hand` : ""}`,
            teacherNote:
              all.length > 1
                ? `Each small cell isolates one connection of the move between the two hand positions: ${shown.length === all.length ? `all ${all.length}` : `${shown.length} of the ${all.length}`} cells, single notes first.`
                : "The one connection between these two notes, repeated until the move is secure.",
            studentNote: "Play each cell slowly and evenly with the fingers shown, rest, then the next. Keep the fingers close to the keys.",
            hands: hand,
            segments: [{ [hand]: slots }],
          },
          ctx,
        ),
      );
    }
  }
  return drills.length ? { drills } : { drills, skipped: "The hand never moves between two different notes or positions, so there is no connection to pair." };
}

export const notePairs: DrillFamily<typeof notePairsOptions> = {
  id: "note-pairs",
  label: "Note pairs",
  describe: "Every small cell of the move between two hand positions, single notes first, each repeated.",
  options: notePairsOptions,
  generate: generateNotePairs,
};
