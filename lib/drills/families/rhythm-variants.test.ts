import { describe, expect, test } from "vitest";
import { makeContext } from "../build";
import { drillText, makePassage } from "../test-passages";
import { equalRuns, rhythmVariants, rhythmVariantsOptions } from "./rhythm-variants";

// Hand-written expectations. Durations in quarter notes: dotted eighth = 3/4, sixteenth = 1/4.
const passage = makePassage({ right: "C4/8 D4/8 E4/8 F4/8 G4/8 A4/8 B4/8 C5/8 D5/1" });
const run = (v: string) => rhythmVariants.generate(passage, rhythmVariantsOptions.parse({ variants: [v] }), makeContext()).drills;

describe("rhythm-variants", () => {
  test("options parse with defaults", () => {
    expect(rhythmVariantsOptions.parse({})).toEqual({ variants: ["long-short", "short-long", "triplets", "accent-3", "accent-4"], minRun: 4 });
  });

  test("runs of equal values are found; the whole note is not part of them", () => {
    expect(equalRuns(passage.sonorities.right, 4).map((r) => r.length)).toEqual([8]);
  });

  test("long-short and short-long dotted pairs", () => {
    expect(drillText(run("long-short")[0].score.events).slice(0, 4)).toEqual(["C4:3/4", "D4:1/4", "E4:3/4", "F4:1/4"]);
    expect(drillText(run("short-long")[0].score.events).slice(0, 4)).toEqual(["C4:1/4", "D4:3/4", "E4:1/4", "F4:3/4"]);
    expect(drillText(run("short-long")[0].score.events).slice(8)).toEqual(["D5:4"]);
  });

  test("triplets: 3 eighths in the time of 2 (MusicXML time-modification 3:2), padded with triplet rests", () => {
    const d = run("triplets")[0];
    // Eight notes → three triplet groups (nine places): the last place is a triplet rest, then the bar is completed.
    expect(drillText(d.score.events)).toEqual([
      "C4:1/3", "D4:1/3", "E4:1/3", "F4:1/3", "G4:1/3", "A4:1/3", "B4:1/3", "C5:1/3", "r:1/3", "r:1",
    ]);
    const notes = d.score.events.filter((e) => e.written.tuplet);
    expect(notes).toHaveLength(9);
    for (const n of notes) expect(n.written).toEqual({ type: "eighth", dots: 0, tuplet: { actual: 3, normal: 2 } });
  });

  test("accents every 3 and every 4 notes of the run", () => {
    const three = drillText(run("accent-3")[0].score.events);
    expect(three.filter((t) => t.endsWith("!accent"))).toEqual(["C4:1/2!accent", "F4:1/2!accent", "B4:1/2!accent"]);
    const four = drillText(run("accent-4")[0].score.events);
    expect(four.filter((t) => t.endsWith("!accent"))).toEqual(["C4:1/2!accent", "G4:1/2!accent"]);
  });

  test("no run of equal values: skipped with a reason", () => {
    const r = rhythmVariants.generate(makePassage({ right: "C4/4 D4/8 E4/8 F4/2" }), rhythmVariantsOptions.parse({}), makeContext());
    expect(r.drills).toHaveLength(0);
    expect(r.skipped).toMatch(/No run/);
  });
});
