import Fraction from "fraction.js";
import { describe, expect, test } from "vitest";
import type { Passage } from "../../score/types";
import { makeContext } from "../build";
import { drillText, makePassage } from "../test-passages";
import { barProblems } from "./shared-2-layout";
import { ornaments, ornamentsOptions } from "./ornaments";
import { pitchFromName } from "../spell";

/** A passage with one grace note (D5) before its second note (C5), as the reader gives it (duration 0). */
function withGrace(): Passage {
  const p = makePassage({ right: "E4/4 C5/4 G4/2" });
  const main = p.events.find((e) => e.pitch?.midi === 72)!;
  const grace = { ...main, id: "g1", pitch: pitchFromName("D5"), duration: new Fraction(0), grace: true, written: { type: "eighth", dots: 0, tuplet: null } };
  return { ...p, events: [...p.events.filter((e) => e !== main), grace, main].sort((a, b) => a.onset.compare(b.onset)) };
}

// Grace notes slowed into written notes and back (DRILL-RUBRIC.md techniques; common practice).
describe("ornaments", () => {
  test("written out in half, then a quarter of the main note, then back as a grace note", () => {
    const [d] = ornaments.generate(withGrace(), ornamentsOptions.parse({}), makeContext()).drills;
    expect(d.variant).toBe("slowed-then-back");
    // Hand-written: bar 1 D5 takes half of the quarter C5; bar 2 a quarter of it; bar 3 as written.
    expect(drillText(d.score.events)).toEqual([
      "E4:1", "D5:1/2", "C5:1/2", "G4:2",
      "E4:1", "D5:1/4", "C5:3/4", "G4:2",
      "E4:1", "D5:0", "C5:1", "G4:2",
    ]);
    const grace = d.score.events.filter((e) => e.grace);
    expect(grace).toHaveLength(1);
    expect(grace[0].pitch?.midi).toBe(74);
    expect(barProblems(d.score)).toEqual([]); // MusicXML 4.0: grace notes take no time in the bar
    expect(d.score.events.filter((e) => e.words).map((e) => e.words)).toEqual(["grace notes slowed", "quicker", "as written"]);
  });

  test("no grace notes: skipped with a reason", () => {
    const r = ornaments.generate(makePassage({ right: "C4/4 D4/4" }), ornamentsOptions.parse({}), makeContext());
    expect(r.drills).toHaveLength(0);
    expect(r.skipped).toMatch(/no grace notes/);
  });
});
