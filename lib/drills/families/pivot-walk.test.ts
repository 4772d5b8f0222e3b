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

  // Rubric (pivot-walk; common practice): the hand shape moved by a semitone at a time, up and back,
  // span-safe — not one note moved and called a hand move.
  test("the whole hand shape around G4 walks up with sharps and down with flats, and back", () => {
    const [pivot] = pivotWalk.generate(alberti, pivotWalkOptions.parse({ groupBy: "half-bar" }), makeContext()).drills;
    expect(pivot.variant).toBe("pivot");
    // Hand-written: figure, +1 … +3 (every note moves), figure, −1 … −3, figure.
    expect(heads(drillText(pivot.score.events))).toEqual([
      "C4", "G4", "E4", "G4",
      "C#4", "G#4", "F4", "G#4", "D4", "A4", "F#4", "A4", "D#4", "A#4", "G4", "A#4",
      "C4", "G4", "E4", "G4",
      "B3", "Gb4", "Eb4", "Gb4", "Bb3", "F4", "D4", "F4", "A3", "E4", "Db4", "E4",
      "C4", "G4", "E4", "G4",
    ]);
    expect(drillText(pivot.score.events)[0]).toBe("C4:1/2");
    // The shape keeps its fingering: each moved note has the finger of the note it stands for.
    const fingerOf = (midi: number) => pivot.score.events.find((e) => e.pitch?.midi === midi)?.fingering?.[0].finger;
    expect(fingerOf(61)).toBe(fingerOf(60));
    expect(fingerOf(68)).toBe(fingerOf(67));
  });

  test("outer-note variant: the top note of a right-hand figure only walks inward (down)", () => {
    const [, outer] = pivotWalk.generate(alberti, pivotWalkOptions.parse({ groupBy: "half-bar" }), makeContext()).drills;
    expect(outer.variant).toBe("outer-inward");
    expect(heads(drillText(outer.score.events))).toEqual([
      "C4", "G4", "E4", "G4", "C4", "Gb4", "E4", "Gb4", "C4", "F4", "E4", "F4", "C4", "G4", "E4", "G4",
    ]);
  });

  test("safety keeps the figure within the profile; without it the wide step is written with a warning", () => {
    const p = makePassage({ right: "G4/8@5 C4/8@1 G4/8@5 E4/8@3" });
    const opts = pivotWalkOptions.parse({ groupBy: "half-bar" });
    // Key geometry (FACTS.md §1, 23.59 mm per white key): the fifth C4–G4 spans 4 white-key steps
    // (94.3 mm), and so do C#4–G#4, D4–A4, D#4–A#4; moved down, B3–F#4 spans 4.5 steps (106.1 mm).
    const tight = { spanMm: 100, octaveMm: 165.1 };
    const safe = pivotWalk.generate(p, opts, makeContext({ profile: tight })).drills[0];
    expect(heads(drillText(safe.score.events))).toContain("D#4");
    expect(heads(drillText(safe.score.events))).not.toContain("B3");
    expect(safe.warnings.filter((w) => w.code === "span")).toHaveLength(0);
    const free = pivotWalk.generate(p, opts, makeContext({ profile: tight, safety: false })).drills[0];
    expect(heads(drillText(free.score.events))).toContain("B3");
    expect(free.warnings.some((w) => w.code === "span")).toBe(true);
  });

  test("a figure split into beats is found over the bar: the pivot C4 of a left-hand accompaniment", () => {
    const p = makePassage({ left: "F3/8 C4/8 A3/8 C4/8 A3/8 C4/8", time: { beats: 3, beatType: 4 } });
    const [d] = pivotWalk.generate(p, pivotWalkOptions.parse({}), makeContext()).drills;
    expect(heads(drillText(d.score.events)).slice(6, 12)).toEqual(["F#3", "C#4", "A#3", "C#4", "A#3", "C#4"]);
  });

  test("no recurring note: skipped with a reason", () => {
    const r = pivotWalk.generate(makePassage({ right: "C4/8 D4/8 E4/8 F4/8" }), pivotWalkOptions.parse({}), makeContext());
    expect(r.drills).toHaveLength(0);
    expect(r.skipped).toMatch(/recurring/);
  });

  test("a label over a chord is written once, not on every note of it", () => {
    const chords = makePassage({ right: "[C4,E4]/4@1,3 G4/4@5 [C4,E4]/4@1,3 G4/4@5" });
    const [d] = pivotWalk.generate(chords, pivotWalkOptions.parse({ groupBy: "bar" }), makeContext()).drills;
    const words = d.score.events.filter((e) => e.words).map((e) => e.words);
    expect(words).toEqual(["up by semitones", "as written", "down by semitones", "as written"]);
  });
});
