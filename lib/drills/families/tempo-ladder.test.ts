import { describe, expect, test } from "vitest";
import { makeContext } from "../build";
import { drillText, makePassage } from "../test-passages";
import { ladderTempos, tempoLadder, tempoLadderOptions } from "./tempo-ladder";

describe("tempo-ladder", () => {
  test("options parse with defaults and refuse a start above the end", () => {
    expect(tempoLadderOptions.parse({})).toEqual({ startPercent: 60, endPercent: 100, stepPercent: 10 });
    expect(() => tempoLadderOptions.parse({ startPercent: 90, endPercent: 80 })).toThrow();
  });

  test("rungs from 60 % to 100 % of the target (hand-computed: 0.6 × 120 = 72 …)", () => {
    expect(ladderTempos(120, 60, 100, 10)).toEqual([72, 84, 96, 108, 120]);
    expect(ladderTempos(90, 50, 100, 20)).toEqual([45, 63, 81, 90]);
  });

  test("the passage is repeated once per rung, each from a new bar with its metronome mark", () => {
    const p = makePassage({ right: "C4/4 E4/4 G4/2", left: "C3/1", tempo: 100 });
    const { drills } = tempoLadder.generate(p, tempoLadderOptions.parse({ startPercent: 80, stepPercent: 10 }), makeContext());
    const d = drills[0];
    expect(d.score.measures.map((m) => m.tempo)).toEqual([80, 90, 100]);
    expect(d.tempo).toEqual({ start: 80, target: 100 });
    expect(drillText(d.score.events, 1)).toEqual(["C4:1", "E4:1", "G4:2", "C4:1", "E4:1", "G4:2", "C4:1", "E4:1", "G4:2"]);
    expect(drillText(d.score.events, 2)).toEqual(["C3:4", "C3:4", "C3:4"]);
  });
});
