import { describe, expect, test } from "vitest";
import { makeContext } from "../build";
import { drillText, makePassage } from "../test-passages";
import { ladderTempos, spreadRungs, tempoLadder, tempoLadderOptions } from "./tempo-ladder";

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

  test("in 6/8 the marks are counted in dotted quarters (common practice: the beat of compound time)", () => {
    // Quarter 90 is a dotted quarter 60 (90 ÷ 1.5, hand-computed).
    const p = makePassage({ time: { beats: 6, beatType: 8 }, right: "C4/8 D4/8 E4/8 F4/8 G4/8 A4/8", tempo: 90 });
    const d = tempoLadder.generate(p, tempoLadderOptions.parse({}), makeContext()).drills[0];
    expect(d.title).toMatch(/^Tempo ladder ♩\. = 36 → 60/);
    expect(d.tempo.beat).toEqual({ symbol: "♩.", start: 36, target: 60 });
  });

  test("longer passages write evenly spread rungs within the cap and say how many (DRILL-RUBRIC 'Short')", () => {
    expect(spreadRungs([60, 70, 80, 90, 100], 3)).toEqual([60, 80, 100]);
    const bar = "C4/4 E4/4 G4/4 E4/4 ";
    const p = makePassage({ right: bar.repeat(4).trim(), tempo: 100 });
    const d = tempoLadder.generate(p, tempoLadderOptions.parse({}), makeContext()).drills[0];
    // Four bars per rung, cap max(8, 2 × 4) = 8 bars: two rungs of five.
    expect(d.score.measures.map((m) => m.tempo).filter(Boolean)).toEqual([60, 100]);
    expect(d.title).toContain("(2 of 5 steps shown)");
    expect(d.studentNote).toContain("♩ = 60, 70, 80, 90, 100");
  });
});
