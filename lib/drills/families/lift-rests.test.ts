import { describe, expect, test } from "vitest";
import { makeContext } from "../build";
import { drillText, makePassage } from "../test-passages";
import Fraction from "fraction.js";
import { beatRests, liftRests, liftRestsOptions } from "./lift-rests";

describe("lift-rests", () => {
  test("options parse with defaults", () => {
    expect(liftRestsOptions.parse({})).toEqual({ groupBy: "beat", rest: "eighth" });
  });

  test("a rest of the chosen length after every group; the last bar is completed with rests", () => {
    const p = makePassage({ right: "C4/8 E4/8 D4/8 F4/8 E4/8 G4/8 F4/8 A4/8" });
    const { drills } = liftRests.generate(p, liftRestsOptions.parse({ rest: "quarter" }), makeContext());
    // Four beats of two eighths, each followed by a quarter rest: 4 × 2 = 8 quarters, two 4/4 bars.
    expect(drillText(drills[0].score.events)).toEqual([
      "C4:1/2", "E4:1/2", "r:1", "D4:1/2", "F4:1/2", "r:1",
      "E4:1/2", "G4:1/2", "r:1", "F4:1/2", "A4:1/2", "r:1",
    ]);
    expect(drills[0].score.measures).toHaveLength(2);
  });

  test("an eighth rest in 4/4 leaves the bar to be completed with rests", () => {
    const p = makePassage({ right: "C4/4 D4/4 E4/4 F4/4" });
    const { drills } = liftRests.generate(p, liftRestsOptions.parse({}), makeContext());
    const text = drillText(drills[0].score.events);
    expect(text.filter((t) => !t.startsWith("r"))).toEqual(["C4:1", "D4:1", "E4:1", "F4:1"]);
    // 4 quarters + 4 eighth rests = 6 quarters, completed to 8 (two bars).
    expect(drills[0].score.measures).toHaveLength(2);
  });

  test("each group keeps its place in the beat and the opening rest is kept (no value invented by the shift)", () => {
    const p = makePassage({ right: "r/8 C4/8 D4/8 E4/8 F4/4 G4/4" });
    const { drills } = liftRests.generate(p, liftRestsOptions.parse({}), makeContext());
    // Hand-computed: the eighth lift is lengthened to a quarter so that each next group starts on its beat.
    expect(drillText(drills[0].score.events)).toEqual(["r:1/2", "C4:1/2", "r:1", "D4:1/2", "E4:1/2", "r:1", "F4:1", "r:1", "G4:1", "r:1"]);
  });

  test("a lift that starts inside a triplet beat completes the beat in triplet values, then plain ones (seen in the gallery)", () => {
    // From 26/3 for 2 quarters in 2/2 (beat 2): 4/3 to the beat (a triplet half), then 2/3 (hand-computed).
    const rests = beatRests(new Fraction(26, 3), new Fraction(2), new Fraction(2));
    expect(rests.map((r) => [r.duration.toFraction(), r.tuplet?.actual ?? null])).toEqual([["4/3", 3], ["2/3", 3]]);
    expect(beatRests(new Fraction(4), new Fraction(2), new Fraction(1)).map((r) => r.duration.toFraction())).toEqual(["2"]);
  });
});
