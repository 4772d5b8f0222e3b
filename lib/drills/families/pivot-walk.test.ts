import { describe, expect, test } from "vitest";
import { makeContext } from "../build";
import { drillText, makePassage } from "../test-passages";
import { pivotWalk, pivotWalkOptions } from "./pivot-walk";

const alberti = makePassage({ right: "C4/8 G4/8 E4/8 G4/8 C4/8 G4/8 E4/8 G4/8" });
const heads = (text: string[]) => text.filter((t) => !t.startsWith("r")).map((t) => t.split(":")[0]);

describe("pivot-walk", () => {
  test("options parse with defaults", () => {
    expect(pivotWalkOptions.parse({})).toEqual({ groupBy: "figure", maxSteps: 3 });
  });

  test("the recurring G4 walks up with sharps and down with flats, stopping before E4 (common practice)", () => {
    const [pivot] = pivotWalk.generate(alberti, pivotWalkOptions.parse({ groupBy: "half-bar" }), makeContext()).drills;
    expect(pivot.variant).toBe("pivot");
    // Hand-written: figure, +1 … +3, figure, −1, −2 (E4 is taken), figure.
    expect(heads(drillText(pivot.score.events))).toEqual([
      "C4", "G4", "E4", "G4",
      "C4", "G#4", "E4", "G#4", "C4", "A4", "E4", "A4", "C4", "A#4", "E4", "A#4",
      "C4", "G4", "E4", "G4",
      "C4", "Gb4", "E4", "Gb4", "C4", "F4", "E4", "F4",
      "C4", "G4", "E4", "G4",
    ]);
    expect(drillText(pivot.score.events)[0]).toBe("C4:1/2");
  });

  test("outer-note variant: the top note of a right-hand figure only walks inward (down)", () => {
    const [, outer] = pivotWalk.generate(alberti, pivotWalkOptions.parse({ groupBy: "half-bar" }), makeContext()).drills;
    expect(outer.variant).toBe("outer-inward");
    expect(heads(drillText(outer.score.events))).toEqual([
      "C4", "G4", "E4", "G4", "C4", "Gb4", "E4", "Gb4", "C4", "F4", "E4", "F4", "C4", "G4", "E4", "G4",
    ]);
  });

  test("safety keeps the figure within the profile; without it the wide step is written with a warning", () => {
    // Key geometry (FACTS.md §1, 23.59 mm per white key): C4–A4 = 117.9 mm, C4–A#4 = 129.7 mm.
    const small = { spanMm: 120, octaveMm: 165.1 };
    const p = makePassage({ right: "G4/8 C4/8 G4/8 E4/8" });
    const opts = pivotWalkOptions.parse({ groupBy: "half-bar" });
    const safe = pivotWalk.generate(p, opts, makeContext({ profile: small })).drills[0];
    expect(heads(drillText(safe.score.events)).filter((h) => h.startsWith("A"))).toEqual(["A4", "A4"]);
    expect(safe.warnings.filter((w) => w.code === "span")).toHaveLength(0);
    const free = pivotWalk.generate(p, opts, makeContext({ profile: small, safety: false })).drills[0];
    expect(heads(drillText(free.score.events))).toContain("A#4");
    expect(free.warnings.some((w) => w.code === "span")).toBe(true);
  });

  test("a figure split into beats is found over the bar: the pivot C4 of a left-hand accompaniment", () => {
    const p = makePassage({ left: "F3/8 C4/8 A3/8 C4/8 A3/8 C4/8", time: { beats: 3, beatType: 4 } });
    const [d] = pivotWalk.generate(p, pivotWalkOptions.parse({}), makeContext()).drills;
    expect(heads(drillText(d.score.events)).slice(6, 12)).toEqual(["F3", "C#4", "A3", "C#4", "A3", "C#4"]);
  });

  test("no recurring note: skipped with a reason", () => {
    const r = pivotWalk.generate(makePassage({ right: "C4/8 D4/8 E4/8 F4/8" }), pivotWalkOptions.parse({}), makeContext());
    expect(r.drills).toHaveLength(0);
    expect(r.skipped).toMatch(/recurring/);
  });
});
