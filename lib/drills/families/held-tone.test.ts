import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { makeContext } from "../build";
import { makePassage } from "../test-passages";
import type { Drill } from "../types";
import { findRecurringWindows, generateHeldTone, heldToneOptions } from "./held-tone";
import { barProblems } from "./shared-2-layout";

const opts = heldToneOptions.parse({});
const ctx = makeContext();
/** Notes of one voice as "name:duration" (rests as "r"), in time order; durations in quarter notes. */
const line = (d: Drill, staff: number, voice?: string) =>
  d.score.events
    .filter((e) => e.staff === staff && (voice === undefined || e.voice === voice))
    .map((e) => `${e.pitch ? `${e.pitch.step}${e.pitch.alter ? "#" : ""}${e.pitch.octave}` : "r"}:${e.duration.toFraction()}`);

// An Alberti figure in C (common practice: C G E G, the G returning every other note).
const alberti = makePassage({ left: "C3/8@5 G3/8@1 E3/8@3 G3/8@1 C3/8 G3/8 E3/8 G3/8" });

describe("held-tone", () => {
  test("finds G3 returning at every other note", () => {
    const w = findRecurringWindows(alberti.sonorities.left, 3);
    expect(w).toEqual([{ start: 0, end: 8, recurring: [1, 3, 5, 7], midi: 55 }]);
  });

  test("hold: G3 held from its first entry to the bar's end while C3 E3 C3 E3 play as quarters", () => {
    const d = generateHeldTone(alberti, opts, ctx).drills.find((x) => x.variant === "hold")!;
    // G (55) is above C and E, so it is the upper voice: an eighth rest, then G held 3½ quarters to the bar end.
    expect(line(d, 1, "1")).toEqual(["r:1/2", "G3:7/2"]);
    expect(line(d, 1, "2")).toEqual(["C3:1", "E3:1", "C3:1", "E3:1"]);
    expect(d.hands).toBe("left");
    // The score's fingerings stay on their notes (C3 with 5, E3 with 3).
    const c3 = d.score.events.find((e) => e.pitch?.midi === 48)!;
    expect(c3.fingering?.[0].finger).toBe(5);
    expect(d.fingeringSource[c3.id]).toBe("score");
    expect(barProblems(d.score)).toEqual([]);
  });

  test("silent: the diamond note starts with the figure and carries the instruction", () => {
    const d = generateHeldTone(alberti, opts, ctx).drills.find((x) => x.variant === "silent")!;
    const g = d.score.events.filter((e) => e.pitch?.midi === 55);
    expect(g[0].onset.toFraction()).toBe("0");
    expect(g[0].marks).toContain("diamond");
    expect(g.reduce((s, e) => s + e.duration.valueOf(), 0)).toBe(4);
  });

  test("other-hand: the right hand takes the four G3 eighths at their own places", () => {
    const d = generateHeldTone(alberti, opts, ctx).drills.find((x) => x.variant === "other-hand")!;
    expect(d.hands).toBe("both");
    expect(line(d, 1)).toEqual(["r:1/2", "G3:1/2", "r:1/2", "G3:1/2", "r:1/2", "G3:1/2", "r:1/2", "G3:1/2"]);
    expect(line(d, 2)).toEqual(["C3:1/2", "r:1/2", "E3:1/2", "r:1/2", "C3:1/2", "r:1/2", "E3:1/2", "r:1/2"]);
  });

  test("skips a scale, where nothing recurs", () => {
    const r = generateHeldTone(makePassage({ right: "C4/8 D4/8 E4/8 F4/8 G4/8 A4/8 B4/8 C5/8" }), opts, ctx);
    expect(r).toEqual({ drills: [], skipped: "No note comes back every other note, so there is nothing to hold." });
  });

  test("options schema has defaults", () => {
    expect(heldToneOptions.parse({}).variants).toEqual(["hold", "silent", "other-hand"]);
  });

  test("property: random broken-chord figures give exact bars within A0–C8 (FACTS.md §1)", () => {
    const names = ["C", "D", "E", "F", "G", "A", "B"];
    fc.assert(
      fc.property(
        fc.array(fc.tuple(fc.integer({ min: 0, max: 6 }), fc.integer({ min: 1, max: 6 })), { minLength: 2, maxLength: 6 }),
        fc.integer({ min: 0, max: 6 }),
        fc.constantFrom("8", "16", "8t"),
        (cells, rec, value) => {
          const [den, trip] = value === "8t" ? ["8", "t"] : [value, ""];
          const text = cells
            .flatMap(([s, o]) => [`${names[s]}${o}`, `${names[rec]}${o === 6 ? 5 : o + 1}`])
            .map((n) => `${n}/${den}${trip}`)
            .join(" ");
          const r = generateHeldTone(makePassage({ right: text }), opts, ctx);
          for (const d of r.drills) {
            expect(barProblems(d.score)).toEqual([]);
            for (const e of d.score.events) if (e.pitch) expect(e.pitch.midi >= 21 && e.pitch.midi <= 108).toBe(true);
          }
        },
      ),
      { numRuns: 40 },
    );
  });
});
