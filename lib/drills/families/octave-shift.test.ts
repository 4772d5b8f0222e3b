import fc from "fast-check";
import { Note } from "tonal";
import { describe, expect, test } from "vitest";
import { makeContext } from "../build";
import { pitchName } from "../spell";
import { makePassage } from "../test-passages";
import { generateOctaveShift, octavePath, octaveShiftOptions } from "./octave-shift";
import { barProblems } from "./shared-2-layout";

const ctx = makeContext();

describe("octave-shift", () => {
  test("a beat group C4 E4 (eighths) up one octave and back, then down", () => {
    const p = makePassage({ right: "C4/8@1 E4/8@3 G4/4 G4/2" });
    const r = generateOctaveShift(p, octaveShiftOptions.parse({ octaves: 1 }), ctx);
    const up = r.drills.find((d) => d.variant === "up")!;
    expect(up.score.events.filter((e) => e.pitch).map((e) => `${pitchName(e.pitch!)}:${e.duration.toFraction()}`)).toEqual([
      "C4:1/2", "E4:1/2", "C5:1/2", "E5:1/2", "C4:1/2", "E4:1/2",
    ]);
    expect(up.score.events[0].fingering?.[0].finger).toBe(1);
    const down = r.drills.find((d) => d.variant === "down")!;
    expect(down.score.events.filter((e) => e.pitch).map((e) => pitchName(e.pitch!))).toEqual(["C4", "E4", "C3", "E3", "C4", "E4"]);
    expect(barProblems(up.score)).toEqual([]);
  });

  test("the path out and back", () => {
    expect(octavePath("up", 2)).toEqual([0, 1, 2, 1, 0]);
  });

  test("a clef change where the hand moves two octaves down from middle C", () => {
    const p = makePassage({ right: "C4/8 E4/8", time: { beats: 1, beatType: 4 } });
    const d = generateOctaveShift(p, octaveShiftOptions.parse({ octaves: 2, directions: ["down"] }), ctx).drills[0];
    // Bars: C4 E4 | C3 E3 | C2 E2 | C3 E3 | C4 E4 — a bass clef is needed below the staff (common practice).
    const signs = d.score.measures.map((m) => m.clefs[0].sign);
    expect(signs[0]).toBe("G");
    expect(signs[1]).toBe("F");
    expect(signs[2]).toBe("F");
    expect(d.score.measures.some((m) => m.changes.some((c) => c.clef))).toBe(true);
  });

  test("near the top of the keyboard only the octaves that fit (C8 = 108, FACTS.md §1)", () => {
    const p = makePassage({ right: "C7/8 E7/8" }); // E8 would be 112: off the keyboard
    const d = generateOctaveShift(p, octaveShiftOptions.parse({ directions: ["up"] }), ctx);
    expect(d).toEqual({ drills: [], skipped: "no group fits in another octave" });
  });

  test("property: bars exact, A0–C8, each statement an exact octave of the group", () => {
    fc.assert(
      fc.property(fc.array(fc.integer({ min: 21, max: 108 }), { minLength: 1, maxLength: 4 }), fc.constantFrom("8", "16", "8t"), (midis, v) => {
        const text = midis.map((m) => `${Note.fromMidiSharps(m)}/${v.replace("t", "")}${v.endsWith("t") ? "t" : ""}`).join(" ");
        const r = generateOctaveShift(makePassage({ right: text }), octaveShiftOptions.parse({}), ctx);
        for (const d of r.drills) {
          expect(barProblems(d.score)).toEqual([]);
          const ms = d.score.events.filter((e) => e.pitch && e.tie !== "stop" && e.tie !== "continue").map((e) => e.pitch!.midi);
          for (const m of ms) expect(m >= 21 && m <= 108).toBe(true);
          // Every note is an octave transposition of a group note (tonal Note.chroma).
          const chromas = new Set(midis.map((m) => m % 12));
          for (const m of ms) expect(chromas.has(m % 12)).toBe(true);
        }
      }),
      { numRuns: 60 },
    );
  });
});
