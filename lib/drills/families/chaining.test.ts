import { describe, expect, test } from "vitest";
import { makeContext } from "../build";
import { drillText, makePassage } from "../test-passages";
import { barProblems } from "./shared-2-layout";
import { chaining, chainingOptions, chainLinks } from "./chaining";

// Chaining (DRILL-RUBRIC.md techniques; common practice): 3 or 4 notes, then the next group overlapping by one.
describe("chaining", () => {
  test("links overlap by one note and cover the run (hand-written)", () => {
    expect(chainLinks(7, 4)).toEqual([[0, 4], [3, 7]]);
    expect(chainLinks(8, 3)).toEqual([[0, 3], [2, 5], [4, 7], [6, 8]]);
    expect(chainLinks(1, 3)).toEqual([]);
  });

  test("each link played twice, then a rest; the next link starts on the last note", () => {
    const run = makePassage({ right: "C4/8@1 D4/8@2 E4/8@3 F4/8@1 G4/8@2 A4/8@3 B4/8@4 C5/8@5" });
    const [d] = chaining.generate(run, chainingOptions.parse({ size: "4", maxLinks: 2 }), makeContext()).drills;
    // 4/4: a link of 4 eighths played twice fills the bar, so its last note carries a pause.
    expect(drillText(d.score.events).slice(0, 8)).toEqual([
      "C4:1/2", "D4:1/2", "E4:1/2", "F4:1/2", "C4:1/2", "D4:1/2", "E4:1/2", "F4:1/2!fermata",
    ]);
    expect(drillText(d.score.events)[8]).toBe("F4:1/2"); // the second link starts on F4, on the next bar
    expect(barProblems(d.score)).toEqual([]);
    const f4 = d.score.events.find((e) => e.pitch?.midi === 65)!;
    expect(f4.fingering?.[0].finger).toBe(1); // the score's finger stays
    expect(d.studentNote).toContain("twice");
  });

  test("a run no longer than one link is skipped with a reason", () => {
    const r = chaining.generate(makePassage({ right: "C4/4 D4/4 E4/4" }), chainingOptions.parse({ size: "3" }), makeContext());
    expect(r.drills).toHaveLength(0);
    expect(r.skipped).toMatch(/no run longer than 3 notes/);
  });

  test("in 6/8 the links are three notes and a rest fills the bar (compound meters move in threes)", () => {
    const run = makePassage({ right: "C4/8 D4/8 E4/8 F4/8 G4/8 A4/8", time: { beats: 6, beatType: 8 } });
    const [d] = chaining.generate(run, chainingOptions.parse({ repeats: 1 }), makeContext()).drills;
    expect(d.variant).toBe("links-of-3");
    expect(drillText(d.score.events).slice(0, 4)).toEqual(["C4:1/2", "D4:1/2", "E4:1/2", "r:3/2"]);
    expect(barProblems(d.score)).toEqual([]);
  });
});
