import { describe, expect, test } from "vitest";
import { makeContext } from "../build";
import { drillText, makePassage } from "../test-passages";
import { blocking, blockingOptions } from "./blocking";

// Hand-written expectations: pitches and durations (quarter notes) worked out by hand from the passage.
const passage = makePassage({ right: "C4/8@1 E4/8 G4/8 E4/8 D4/8 F4/8 A4/8 F4/8" });

describe("blocking", () => {
  test("options parse with defaults", () => {
    expect(blockingOptions.parse({})).toEqual({ groupBy: "position", variants: ["block", "block-then-tap", "inner-then-chord"] });
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

  // Rubric (DRILL-RUBRIC.md, blocking; common practice): each hand position as one chord, in the
  // passage's rhythm of positions; never several positions merged; never a scale run as clusters.
  test("by position: each position one chord for as long as the hand stays in it", () => {
    // Broken C major then a move to G major (the thumb takes G4): two positions.
    const moving = makePassage({ right: "C4/8@1 E4/8@2 G4/8@3 C5/8@5 G4/8@1 B4/8@2 D5/8@3 G5/8@5" });
    const [block] = blocking.generate(moving, blockingOptions.parse({ variants: ["block"] }), makeContext()).drills;
    expect(drillText(block.score.events)).toEqual(["C4+E4+G4+C5:2", "G4+B4+D5+G5:2"]);
    const fingers = block.score.events.filter((e) => e.pitch).map((e) => e.fingering?.[0]?.finger);
    expect(fingers).toEqual([1, 2, 3, 5, 1, 2, 3, 5]); // the passage's own fingers, rising with pitch
  });

  test("a melody that moves by step never forms a chord to block, and says so", () => {
    const scale = makePassage({ right: "C4/8 D4/8 E4/8 F4/8 G4/8 A4/8 B4/8 C5/8" });
    const r = blocking.generate(scale, blockingOptions.parse({}), makeContext());
    expect(r.drills).toHaveLength(0);
    expect(r.skipped).toMatch(/never settle into a hand position that forms a chord/);
  });

  test("positions wider than the hand are never merged into one chord", () => {
    // C2–G2 then C4–G4: two octaves apart, far over any comfortable span (FACTS.md §4: about a tenth at most).
    const wide = makePassage({ left: "C2/4@5 G2/4@1 C4/4@5 G4/4@1" });
    const [block] = blocking.generate(wide, blockingOptions.parse({ variants: ["block"] }), makeContext()).drills;
    expect(drillText(block.score.events)).toEqual(["C2+G2:2", "C4+G4:2"]);
  });

  test("inner notes, then the full chord, only for chords of three or more keys", () => {
    const thirds = makePassage({ right: "C4/4@1 E4/4@3 C4/4@1 E4/4@3" });
    expect(blocking.generate(thirds, blockingOptions.parse({ variants: ["inner-then-chord"] }), makeContext()).drills).toHaveLength(0);
  });
});
