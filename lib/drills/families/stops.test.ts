import { describe, expect, test } from "vitest";
import { makeContext } from "../build";
import { drillText, makePassage } from "../test-passages";
import { stops, stopsOptions } from "./stops";

// Hand-written expectations: eighths grouped by beat (two per beat in 4/4), then a half note.
const passage = makePassage({ right: "C4/8 D4/8 E4/8 F4/8 G4/2" });

describe("stops", () => {
  test("options parse with defaults", () => {
    expect(stopsOptions.parse({})).toEqual({ groupBy: "beat", maxVariants: 4 });
  });

  test("one variant per place in the group; the fermata sits on the n-th note of each beat", () => {
    const { drills } = stops.generate(passage, stopsOptions.parse({}), makeContext());
    expect(drills.map((d) => d.variant)).toEqual(["stop-1", "stop-2"]);
    expect(drillText(drills[0].score.events)).toEqual(["C4:1/2!fermata", "D4:1/2", "E4:1/2!fermata", "F4:1/2", "G4:2!fermata"]);
    expect(drillText(drills[1].score.events)).toEqual(["C4:1/2", "D4:1/2!fermata", "E4:1/2", "F4:1/2!fermata", "G4:2"]);
  });

  test("single-note groups are skipped with a reason", () => {
    const r = stops.generate(makePassage({ right: "C4/4 D4/4 E4/4 F4/4" }), stopsOptions.parse({}), makeContext());
    expect(r.drills).toHaveLength(0);
    expect(r.skipped).toMatch(/single note/);
  });

  test("a chord takes one fermata, not one per note (seen in the gallery; common practice)", () => {
    const p = makePassage({ right: "[C4,E4,G4]/8 D4/8 E4/8 F4/8 G4/2" });
    const [d] = stops.generate(p, stopsOptions.parse({}), makeContext()).drills;
    const chord = d.score.events.filter((e) => e.onset.equals(0));
    expect(chord).toHaveLength(3);
    expect(chord.filter((e) => e.marks?.includes("fermata"))).toHaveLength(1);
  });
});
