import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { makeContext } from "../build";
import { drillText, makePassage } from "../test-passages";
import { noteCells, notePairs, notePairsOptions, positionCells, subsets } from "./note-pairs";

describe("note-pairs", () => {
  test("options parse with defaults", () => {
    expect(notePairsOptions.parse({})).toEqual({ maxCells: 9, repeats: 2, value: "eighth", maxPairs: 4 });
  });

  test("subsets smallest first, bottom to top", () => {
    expect(subsets(3)).toEqual([[0], [1], [2], [0, 1], [0, 2], [1, 2], [0, 1, 2]]);
  });

  test("cell order: one → one bottom to top, then one → two, then two → one (hand-written)", () => {
    expect(noteCells(2, 2)).toEqual([
      [[0], [0]], [[0], [1]], [[1], [0]], [[1], [1]],
      [[0], [0, 1]], [[1], [0, 1]], [[0, 1], [0]], [[0, 1], [1]],
      [[0, 1], [0, 1]],
    ]);
  });

  test("property (combinatorics): (2^a − 1)(2^b − 1) cells, all distinct, a·b of them at level one", () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 5 }), fc.integer({ min: 1, max: 5 }), (a, b) => {
        const cells = noteCells(a, b);
        expect(cells).toHaveLength((2 ** a - 1) * (2 ** b - 1));
        expect(new Set(cells.map((c) => JSON.stringify(c))).size).toBe(cells.length);
        expect(cells.filter(([x, y]) => x.length === 1 && y.length === 1)).toHaveLength(a * b);
        const sizes = cells.map(([x, y]) => x.length + y.length);
        expect(sizes).toEqual([...sizes].sort((p, q) => p - q));
      }),
    );
  });

  test("a drill of third → third: cells repeated twice with a rest, capped, saying n of N cells", () => {
    const p = makePassage({ right: "[C4,E4]/4@1,3 [D4,F4]/4@2,4" });
    const { drills } = notePairs.generate(p, notePairsOptions.parse({ maxCells: 2 }), makeContext());
    expect(drills).toHaveLength(1);
    expect(drills[0].title).toContain("(2 of 6 cells)"); // 2·2 pairs, then 2 one → two cells
    expect(drillText(drills[0].score.events)).toEqual([
      "C4:1/2", "D4:1/2", "C4:1/2", "D4:1/2", "r:1",
      "C4:1/2", "F4:1/2", "C4:1/2", "F4:1/2", "r:1",
      "r:2",
    ]);
    // The count is in the title, never on a note where it reads as a fingering (DRILL-RUBRIC 7, common practice).
    expect(drills[0].score.events.some((e) => e.words && /\d+ of \d+/.test(e.words))).toBe(false);
    const f4 = drills[0].score.events.find((e) => e.pitch?.midi === 65)!;
    expect(f4.fingering?.[0].finger).toBe(4); // the score's finger travels with the note
  });

  test("position cells: every ordered pair, then one key to two keys (hand-written)", () => {
    expect(positionCells(2, 2)).toEqual([[[0], [0]], [[0], [1]], [[1], [0]], [[1], [1]], [[0], [0, 1]], [[1], [0, 1]]]);
    expect(positionCells(3, 3)).toHaveLength(9 + 3 * 3);
  });

  test("a single repeated chord has nothing to pair", () => {
    const r = notePairs.generate(makePassage({ right: "C4/4 C4/4" }), notePairsOptions.parse({}), makeContext());
    expect(r.drills).toHaveLength(0);
    expect(r.skipped).toBeTruthy();
  });

  // Rubric (note-pairs; common practice): between two consecutive positions, cells reach the real leap.
  test("between two hand positions: pairs of their keys, reaching the move", () => {
    // C position (1-3-5), then the hand moves up to the G position (thumb on G4).
    const moving = makePassage({ right: "C4/8@1 E4/8@3 G4/8@5 E4/8@3 G4/8@1 B4/8@3 D5/8@5 B4/8@3" });
    const [d] = notePairs.generate(moving, notePairsOptions.parse({ maxCells: 20 }), makeContext()).drills;
    expect(d.title).toBe("Note pairs C4+E4+G4 → G4+B4+D5"); // all 18 cells shown, so no count
    const firsts = d.score.events.filter((e) => e.pitch).map((e) => e.pitch!.midi);
    expect(firsts.slice(0, 4)).toEqual([60, 67, 60, 67]); // bottom → bottom: the thumb's move C4 → G4
    expect(firsts).toContain(74); // the top of the new position is reached
    const fingers = d.score.events.filter((e) => e.pitch && e.pitch.midi === 74).map((e) => e.fingering?.[0].finger);
    expect(new Set(fingers)).toEqual(new Set([5])); // the passage's finger on D5
  });
});
