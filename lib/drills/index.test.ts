import { describe, expect, test } from "vitest";
import { families, generateDrills, suggestFamilies } from "./index";
import { SUGGESTIONS } from "./suggest";
import { makePassage } from "./test-passages";
import { PROBLEM_TAGS } from "./types";

// The fourteen generator rows of the drill-family table (DESIGN.md); the short-ending row is an option.
const IDS = [
  "blocking", "note-pairs", "rhythm-variants", "stops", "lift-rests", "scale-rhythm", "pivot-walk",
  "voice-isolation", "doubles", "octave-shift", "held-tone", "sequence", "thumb-pairs", "tempo-ladder",
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
    const p = makePassage({ right: "C4/4 D4/4 E4/4 F4/4" });
    const { drills, skipped } = generateDrills(p, { families: ["blocking", "pivot-walk", "no-such-family"] });
    expect(drills.length).toBeGreaterThan(0);
    expect(drills.every((d) => d.family === "blocking")).toBe(true);
    expect(skipped.map((s) => s.family)).toEqual(["pivot-walk", "no-such-family"]);
    expect(skipped.every((s) => s.reason.length > 0)).toBe(true);
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
