import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { makeContext } from "../build";
import { keyDistanceMm } from "../hand";
import { makePassage } from "../test-passages";
import type { Drill } from "../types";
import { doublesOptions, generateDoubles } from "./doubles";
import { barProblems } from "./shared-2-layout";

const ctx = makeContext();
const line = (d: Drill, voice: string) =>
  d.score.events
    .filter((e) => e.voice === voice && !e.chord)
    .map((e) => `${e.pitch ? `${e.pitch.step}${e.pitch.octave}` : "r"}:${e.duration.toFraction()}${e.dynamic ? `:${e.dynamic}` : ""}`);

// Two thirds in C major: C4–E4, D4–F4 (interval sizes: common practice).
const thirds = makePassage({ right: "[C4,E4]/4@1,3 [D4,F4]/4@2,4" });

describe("doubles", () => {
  // Rubric (doubles; common practice): the repeating voice louder, one dynamic per line, never two stacked at one note.
  test("top repeats (forte) while the lower note holds, two eighths per step", () => {
    const o = doublesOptions.parse({ repeats: 2 });
    const d = generateDoubles(thirds, o, ctx).drills.find((x) => x.variant === "top-repeats")!;
    expect(line(d, "1")).toEqual(["E4:1/2:f", "E4:1/2", "F4:1/2", "F4:1/2", "r:2"]);
    expect(line(d, "2")).toEqual(["C4:1", "D4:1", "r:2"]); // no second dynamic under the same note
    expect(d.score.parts[0].staves).toBe(1);
    // The score's fingering stays on its note: E4 keeps 3.
    expect(d.score.events.find((e) => e.pitch?.midi === 64)!.fingering?.[0].finger).toBe(3);
    expect(barProblems(d.score)).toEqual([]);
  });

  test("lower repeats: the forte moves to the lower voice", () => {
    const d = generateDoubles(thirds, doublesOptions.parse({ repeats: 2 }), ctx).drills.find((x) => x.variant === "lower-repeats")!;
    expect(line(d, "1")).toEqual(["E4:1", "F4:1", "r:2"]);
    expect(line(d, "2")).toEqual(["C4:1/2:f", "C4:1/2", "D4:1/2", "D4:1/2", "r:2"]);
  });

  test("both repeat as chords; dynamics can be switched off", () => {
    const o = doublesOptions.parse({ repeats: 3, value: "quarter", dynamics: false });
    const r = generateDoubles(thirds, o, ctx);
    const both = r.drills.find((x) => x.variant === "both-repeat")!;
    const heads = both.score.events.filter((e) => e.pitch && !e.chord);
    expect(heads.map((e) => e.pitch!.midi)).toEqual([60, 60, 60, 62, 62, 62]);
    expect(r.drills.every((d) => d.score.events.every((e) => e.dynamic === undefined))).toBe(true);
    for (const d of r.drills) expect(barProblems(d.score)).toEqual([]);
  });

  test("skips single-line music", () => {
    expect(generateDoubles(makePassage({ right: "C4/4 D4/4" }), doublesOptions.parse({}), ctx).drills).toEqual([]);
  });

  test("property: random thirds and sixths give exact bars and a span report", () => {
    fc.assert(
      fc.property(
        fc.array(fc.tuple(fc.integer({ min: 48, max: 84 }), fc.constantFrom(3, 4, 8, 9)), { minLength: 1, maxLength: 6 }),
        fc.integer({ min: 2, max: 5 }),
        (pairs, repeats) => {
          const names = ["C", "C#", "D", "D#", "E", "F", "F#", "G", "G#", "A", "A#", "B"];
          const nm = (m: number) => `${names[m % 12]}${Math.floor(m / 12) - 1}`;
          const p = makePassage({ right: pairs.map(([m, iv]) => `[${nm(m)},${nm(m + iv)}]/8`).join(" ") });
          for (const d of generateDoubles(p, doublesOptions.parse({ repeats }), ctx).drills) {
            expect(barProblems(d.score)).toEqual([]);
            // The widest pair by key distance (hand.ts geometry, 165.1 mm octave: FACTS.md §1).
            const widest = Math.max(...pairs.map(([m, iv]) => keyDistanceMm(m, m + iv)));
            expect(d.maxSpan.right?.mm).toBeCloseTo(widest, 0);
          }
        },
      ),
      { numRuns: 40 },
    );
  });
});
