import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { makeContext } from "../build";
import { drillText, makePassage } from "../test-passages";
import { noteCells, notePairs, notePairsOptions, subsets } from "./note-pairs";

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

  test("a drill of third → third: cells repeated twice with a rest, capped, saying n of N", () => {
    const p = makePassage({ right: "[C4,E4]/4@1,3 [D4,F4]/4@2,4" });
    const { drills } = notePairs.generate(p, notePairsOptions.parse({ maxCells: 2 }), makeContext());
    expect(drills).toHaveLength(1);
    expect(drills[0].title).toContain("(2 of 9)");
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

  test("a single repeated chord has nothing to pair", () => {
    const r = notePairs.generate(makePassage({ right: "C4/4 C4/4" }), notePairsOptions.parse({}), makeContext());
    expect(r.drills).toHaveLength(0);
    expect(r.skipped).toBeTruthy();
  });
  test("a hand with chords pairs only connections that involve a chord; single notes alone carry no count", () => {
    const mixed = makePassage({ right: "C4/4 D4/4 [E4,G4]/4 C4/4" });
    const titles = notePairs.generate(mixed, notePairsOptions.parse({}), makeContext()).drills.map((d) => d.title);
    expect(titles).toEqual(["Note pairs D4 → E4+G4 (3 of 3)", "Note pairs E4+G4 → C4 (3 of 3)"]);
    const single = makePassage({ right: "C4/4 D4/4" });
    expect(notePairs.generate(single, notePairsOptions.parse({}), makeContext()).drills.map((d) => d.title)).toEqual([
      "Note pairs C4 → D4",
    ]);
  });
});
