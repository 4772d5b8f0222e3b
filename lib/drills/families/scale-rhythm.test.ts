import { Scale } from "tonal";
import { describe, expect, test } from "vitest";
import { makeContext } from "../build";
import { drillText, makePassage } from "../test-passages";
import { beatPattern, scaleFingering, scaleRhythm, scaleRhythmOptions, twoOctaveScale } from "./scale-rhythm";

const notesOf = (names: string[]) => names.map((n) => n.replace(/-?\d+$/, ""));

describe("scale-rhythm", () => {
  test("options parse with defaults", () => {
    expect(scaleRhythmOptions.parse({})).toEqual({ minorForm: "harmonic" });
  });

  test("two octaves up and down follow tonal's Scale.get(...).notes (reference: tonal)", () => {
    const d = twoOctaveScale({ fifths: 2, mode: "major" }, 4, "harmonic");
    expect(d).toHaveLength(29);
    const pcs = Scale.get("D major").notes;
    expect(notesOf(d.slice(0, 14))).toEqual([...pcs, ...pcs]);
    expect(d[14]).toBe("D6");
    expect(d.slice(15)).toEqual(d.slice(0, 14).reverse());
    const g = twoOctaveScale({ fifths: 2, mode: "minor" }, 2, "harmonic"); // B harmonic minor
    expect(notesOf(g.slice(0, 7))).toEqual(Scale.get("B harmonic minor").notes);
  });

  test("the beat pattern is read from the passage: sixteenths, and triplets with their ratio", () => {
    const ctx = makeContext();
    const six = beatPattern(makePassage({ right: "C4/16 D4/16 E4/16 F4/16 G4/4 C4/16 D4/16 E4/16 F4/16 G4/4" }), "right", ctx);
    expect(six.durations.map((d) => d.toFraction())).toEqual(["1/4", "1/4", "1/4", "1/4"]);
    const trip = beatPattern(makePassage({ right: "C4/8t D4/8t E4/8t F4/8t G4/8t A4/8t G4/2" }), "right", ctx);
    expect(trip.durations.map((d) => d.toFraction())).toEqual(["1/3", "1/3", "1/3"]);
    expect(trip.tuplet).toEqual({ actual: 3, normal: 2 });
  });

  test("C major in eighths: hand-written first notes, standard fingering (common practice, from memory)", () => {
    const p = makePassage({ right: "C4/8 D4/8 E4/8 F4/8 G4/2" });
    const [d] = scaleRhythm.generate(p, scaleRhythmOptions.parse({}), makeContext()).drills;
    const text = drillText(d.score.events);
    expect(text.slice(0, 4)).toEqual(["C4:1/2", "D4:1/2", "E4:1/2", "F4:1/2"]);
    // 29 eighths; the last tonic is held to the end of its beat (a quarter), then rests end the bar.
    expect(text[28]).toBe("C4:1");
    expect(text.slice(29).every((t) => t.startsWith("r:"))).toBe(true);
    const fingers = d.score.events.filter((e) => e.pitch).map((e) => e.fingering?.[0].finger);
    expect(fingers.slice(0, 8)).toEqual([1, 2, 3, 1, 2, 3, 4, 1]);
    expect(fingers[14]).toBe(5);
    // E♭ major right hand from the scale table (scale-fingerings.ts; common practice, from memory): 3123 4123.
    expect(scaleFingering("Eb", "major", "right")?.slice(0, 8)).toEqual([3, 1, 2, 3, 4, 1, 2, 3]);
  });

  test("two hands: each hand alone and hands together, the left two octaves lower", () => {
    const p = makePassage({ right: "C5/4 D5/4", left: "C3/4 G3/4" });
    const { drills } = scaleRhythm.generate(p, scaleRhythmOptions.parse({}), makeContext());
    expect(drills.map((d) => d.variant)).toEqual(["right-hand", "left-hand", "hands-together"]);
    const both = drills[2];
    expect(drillText(both.score.events, 1)[0]).toBe("C4:1");
    expect(drillText(both.score.events, 2)[0]).toBe("C2:1");
  });
});
