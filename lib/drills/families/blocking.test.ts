import { describe, expect, test } from "vitest";
import { makeContext } from "../build";
import { drillText, makePassage } from "../test-passages";
import { blocking, blockingOptions } from "./blocking";

// Hand-written expectations: pitches and durations (quarter notes) worked out by hand from the passage.
const passage = makePassage({ right: "C4/8@1 E4/8 G4/8 E4/8 D4/8 F4/8 A4/8 F4/8" });

describe("blocking", () => {
  test("options parse with defaults", () => {
    expect(blockingOptions.parse({})).toEqual({ groupBy: "beat", variants: ["block", "block-then-tap", "inner-then-chord"] });
  });

  test("half-bar groups become one chord of their distinct pitches, as long as the group", () => {
    const { drills } = blocking.generate(passage, blockingOptions.parse({ groupBy: "half-bar", variants: ["block"] }), makeContext());
    expect(drills).toHaveLength(1);
    expect(drillText(drills[0].score.events)).toEqual(["C4+E4+G4:2", "D4+F4+A4:2"]);
    const c4 = drills[0].score.events.find((e) => e.pitch?.midi === 60)!;
    expect(c4.fingering?.[0].finger).toBe(1); // the score's fingering stays on its note
    expect(drills[0].fingeringSource[c4.id]).toBe("score");
  });

  test("block then tap the outer notes; inner notes first, then the chord", () => {
    const opts = blockingOptions.parse({ groupBy: "half-bar", variants: ["block-then-tap", "inner-then-chord"] });
    const [tap, inner] = blocking.generate(passage, opts, makeContext()).drills;
    expect(drillText(tap.score.events)).toEqual(["C4+E4+G4:2", "C4:1", "G4:1", "D4+F4+A4:2", "D4:1", "A4:1"]);
    expect(drillText(inner.score.events)).toEqual(["E4:2", "C4+E4+G4:2", "F4:2", "D4+F4+A4:2"]);
  });

  test("two hands block together in time; the chord span is reported per hand", () => {
    const both = makePassage({ right: "C5/4 G5/4 E5/2", left: "C3/2 G3/2" });
    const { drills } = blocking.generate(both, blockingOptions.parse({ groupBy: "bar", variants: ["block"] }), makeContext());
    expect(drills[0].hands).toBe("both");
    expect(drillText(drills[0].score.events, 1)).toEqual(["C5+E5+G5:4"]);
    expect(drillText(drills[0].score.events, 2)).toEqual(["C3+G3:4"]);
    expect(drills[0].maxSpan.right?.semitones).toBe(7);
    expect(drills[0].maxSpan.left?.semitones).toBe(7);
  });

  test("inner-then-chord is left out when no group has three notes", () => {
    const two = makePassage({ right: "C4/8 D4/8 E4/8 F4/8" });
    const { drills } = blocking.generate(two, blockingOptions.parse({ variants: ["inner-then-chord"] }), makeContext());
    expect(drills).toHaveLength(0);
  });
});
