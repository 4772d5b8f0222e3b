import { describe, expect, test } from "vitest";
import { makeContext } from "../build";
import { drillText, makePassage } from "../test-passages";
import { barProblems } from "./shared-2-layout";
import { octaveDoubling, octaveDoublingOptions } from "./octave-doubling";

// Octave doubling with one hand louder (DRILL-RUBRIC.md techniques; common practice).
describe("octave-doubling", () => {
  const p = makePassage({ right: "[C4,E4]/4 G4/4 F4/4 E4/4" });

  test("the right-hand line (top notes) doubled an octave lower by the left hand", () => {
    const [own, other] = octaveDoubling.generate(p, octaveDoublingOptions.parse({}), makeContext()).drills;
    expect(drillText(own.score.events, 1)).toEqual(["E4:1", "G4:1", "F4:1", "E4:1"]);
    expect(drillText(own.score.events, 2)).toEqual(["E3:1", "G3:1", "F3:1", "E3:1"]);
    expect(barProblems(own.score)).toEqual([]);
    // One dynamic per line, the leading hand louder.
    const dyn = (d: typeof own) => d.score.events.filter((e) => e.dynamic).map((e) => `${e.staff}:${e.dynamic}`);
    expect(dyn(own)).toEqual(["1:f", "2:p"]);
    expect(dyn(other)).toEqual(["1:p", "2:f"]);
    expect(other.title).toBe("Line in octaves, left hand louder");
  });

  test("the left-hand line goes up an octave in the right hand; off the keyboard it is skipped", () => {
    const left = makePassage({ left: "C3/4 G2/4 C3/2" });
    const [d] = octaveDoubling.generate(left, octaveDoublingOptions.parse({ louder: "own" }), makeContext()).drills;
    expect(drillText(d.score.events, 1)).toEqual(["C4:1", "G3:1", "C4:2"]);
    const high = makePassage({ right: "C8/4 B7/4" }); // C8 is the top key (FACTS.md §1): an octave below fits
    expect(octaveDoubling.generate(high, octaveDoublingOptions.parse({}), makeContext()).drills).toHaveLength(2);
    const low = makePassage({ right: "C1/4 D1/4" }); // C0 would be below A0
    expect(octaveDoubling.generate(low, octaveDoublingOptions.parse({}), makeContext()).skipped).toMatch(/keyboard/);
  });
});
