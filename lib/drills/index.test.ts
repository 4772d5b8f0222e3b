import { describe, expect, test } from "vitest";
import { families, generateDrills, suggestFamilies } from "./index";
import { SUGGESTIONS } from "./suggest";
import { makePassage } from "./test-passages";
import { PROBLEM_TAGS, type DrillFamily } from "./types";

// The fourteen generator rows of the drill-family table (DESIGN.md); the short-ending row is an option.
const IDS = [
  "blocking", "note-pairs", "rhythm-variants", "stops", "lift-rests", "scale-rhythm", "pivot-walk",
  "voice-isolation", "doubles", "octave-shift", "held-tone", "sequence", "thumb-pairs", "tempo-ladder",
  // Techniques a complete lesson uses (DRILL-RUBRIC.md): chaining, octave doubling, grace notes slowed.
  "chaining", "octave-doubling", "ornaments",
];

describe("drill registry", () => {
  test("every family of the table is registered under its id, with options that parse from {}", () => {
    expect(Object.keys(families).sort()).toEqual([...IDS].sort());
    for (const [id, f] of Object.entries(families)) {
      expect(f.id).toBe(id);
      expect(f.label.length).toBeGreaterThan(0);
      expect(f.describe.length).toBeGreaterThan(0);
      expect(() => f.options.parse({})).not.toThrow();
    }
  });

  test("every suggested family exists", () => {
    for (const tag of PROBLEM_TAGS) for (const id of SUGGESTIONS[tag]) expect(families[id], `${tag} → ${id}`).toBeDefined();
    expect(suggestFamilies([...PROBLEM_TAGS]).every((id) => id in families)).toBe(true);
  });

  test("generateDrills runs the chosen families and lists the ones that do not apply, with a reason", () => {
    const p = makePassage({ right: "C4/4 E4/4 G4/4 C5/4" });
    const { drills, skipped } = generateDrills(p, { families: ["blocking", "pivot-walk", "no-such-family"] });
    expect(drills.length).toBeGreaterThan(0);
    expect(drills.every((d) => d.family === "blocking")).toBe(true);
    expect(skipped.map((s) => s.family)).toEqual(["pivot-walk", "no-such-family"]);
    expect(skipped.every((s) => s.reason.length > 0)).toBe(true);
  });

  test("a family that throws is skipped with its reason, and the other families still generate", () => {
    const registry = families as Record<string, DrillFamily>;
    registry["test-throws"] = {
      ...families.blocking,
      id: "test-throws",
      generate: () => {
        throw new Error("duration 683/1024 cannot be written");
      },
    } as DrillFamily;
    try {
      const p = makePassage({ right: "C4/4 D4/4 E4/4 F4/4" });
      const { drills, skipped } = generateDrills(p, { families: ["test-throws", "tempo-ladder"] });
      expect(drills.length).toBeGreaterThan(0);
      expect(drills.every((d) => d.family === "tempo-ladder")).toBe(true);
      expect(skipped).toHaveLength(1);
      expect(skipped[0].family).toBe("test-throws");
      expect(skipped[0].reason).toContain("683/1024 cannot be written");
    } finally {
      delete registry["test-throws"];
    }
  });

  test("options are validated by the family's schema; the same seed gives the same drills", () => {
    const p = makePassage({ right: "C4/8 G4/8 E4/8 G4/8 C4/8 G4/8 E4/8 G4/8", left: "C3/2 G2/2" });
    expect(() => generateDrills(p, { families: ["note-pairs"], options: { "note-pairs": { maxCells: 0 } } })).toThrow();
    const a = generateDrills(p, { seed: 5 });
    const b = generateDrills(p, { seed: 5 });
    expect(a.drills.map((d) => `${d.family}/${d.variant}/${d.score.events.length}`)).toEqual(
      b.drills.map((d) => `${d.family}/${d.variant}/${d.score.events.length}`),
    );
  });
});

describe("light endings through generateDrills", () => {
  const p = makePassage({ right: "C4/8 D4/8 E4/8 F4/8 G4/2" });
  const g4 = (lightEndings: boolean | undefined) =>
    generateDrills(p, { families: ["tempo-ladder"], lightEndings }).drills.flatMap((d) => d.score.events.filter((e) => e.pitch?.midi === 67));

  test("off by default: the final half note stays long", () => {
    expect(g4(undefined).length).toBeGreaterThan(0);
    for (const e of g4(undefined)) expect(e.duration.toFraction()).toBe("2");
  });

  test("on: each group's long final note becomes an eighth, staccato, and every bar still sums to 4/4 (MusicXML <time>)", () => {
    const notes = g4(true);
    expect(notes.length).toBeGreaterThan(0);
    for (const e of notes) {
      expect(e.duration.toFraction()).toBe("1/2");
      expect(e.marks).toContain("staccato");
    }
    for (const d of generateDrills(p, { families: ["tempo-ladder", "stops"], lightEndings: true }).drills) {
      for (const m of d.score.measures) {
        const sum = d.score.events.filter((e) => e.measure === m.index && !e.chord && !e.grace).reduce((s, e) => s + e.duration.valueOf(), 0);
        expect(sum, `${d.family}/${d.variant} bar ${m.number}`).toBeCloseTo(4, 9);
      }
    }
  });
});
