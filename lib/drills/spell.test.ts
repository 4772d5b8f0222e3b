import { describe, expect, test } from "vitest";
import { Note } from "tonal";
import { chromaticStep, keyScaleName, keyTonic, pitchFromName, pitchName, shiftOctave, spellMidi, transposePitch } from "./spell";

const major = (fifths: number) => ({ fifths, mode: "major" as const });
const minor = (fifths: number) => ({ fifths, mode: "minor" as const });

describe("spell", () => {
  test("pitchFromName follows MusicXML octaves: C4 = MIDI 60 (FACTS.md §2), B#3 sounds as C4", () => {
    expect(pitchFromName("C4")).toEqual({ step: "C", alter: 0, octave: 4, midi: 60 });
    expect(pitchFromName("A0").midi).toBe(21); // FACTS.md §1: A0 = MIDI 21
    expect(pitchFromName("C8").midi).toBe(108); // FACTS.md §1: C8 = MIDI 108
    expect(pitchFromName("B#3")).toEqual({ step: "B", alter: 1, octave: 3, midi: 60 });
    expect(pitchFromName("Cb4")).toEqual({ step: "C", alter: -1, octave: 4, midi: 59 });
    expect(pitchName(pitchFromName("Bb2"))).toBe("Bb2");
    expect(() => pitchFromName("H4")).toThrow();
  });

  test("key tonics along the circle of fifths (common practice)", () => {
    expect(keyTonic(major(2))).toBe("D");
    expect(keyTonic(major(-3))).toBe("Eb");
    expect(keyTonic(minor(-1))).toBe("D");
    expect(keyTonic(minor(3))).toBe("F#");
    expect(keyScaleName(major(6))).toBe("F# major");
  });

  test("spellMidi uses the key's letters, including E# in F# major and the raised 7th in minor", () => {
    expect(pitchName(spellMidi(66, major(-1)))).toBe("Gb4");
    expect(pitchName(spellMidi(66, major(2)))).toBe("F#4");
    expect(pitchName(spellMidi(65, major(6)))).toBe("E#4"); // F# major: F# G# A# B C# D# E#
    expect(pitchName(spellMidi(61, minor(-1)))).toBe("C#4"); // D harmonic minor leading tone
    expect(pitchName(spellMidi(59, major(-6)))).toBe("Cb4"); // Gb major contains Cb
    expect(pitchName(spellMidi(61, major(0), "down"))).toBe("Db4");
    expect(pitchName(spellMidi(61, major(0), "up"))).toBe("C#4");
    for (let m = 21; m <= 108; m++) expect(spellMidi(m, major(-4)).midi).toBe(m);
  });

  test("chromatic steps: sharps going up, flats going down (common practice)", () => {
    expect(pitchName(chromaticStep(pitchFromName("C4"), 1))).toBe("C#4");
    expect(pitchName(chromaticStep(pitchFromName("C#4"), 1))).toBe("D4");
    expect(pitchName(chromaticStep(pitchFromName("D4"), -1))).toBe("Db4");
    expect(pitchName(chromaticStep(pitchFromName("C4"), -1))).toBe("B3");
  });

  test("with a key, chromatic steps keep the key's side: G, A♭, A, B♭ in E♭ major, never G♯ or A♯ (common practice)", () => {
    const eb = major(-3);
    const walk = ["G4"];
    for (let i = 0; i < 3; i++) walk.push(pitchName(chromaticStep(pitchFromName(walk[walk.length - 1]), 1, eb)));
    expect(walk).toEqual(["G4", "Ab4", "A4", "Bb4"]);
    // Every step of a flat key's walk is spelled with flats or naturals, both ways; a sharp key's with sharps.
    for (let m = 40; m < 90; m++) {
      expect(spellMidi(m, major(-2), "up").alter).toBeLessThanOrEqual(0);
      expect(spellMidi(m, major(3), "down").alter).toBeGreaterThanOrEqual(0);
      // Same sounding key as tonal's Note.midi (reference: tonal).
      expect(Note.midi(pitchName(spellMidi(m, major(-2), "up")))).toBe(m);
    }
  });

  test("transposePitch agrees with tonal Note.transpose and keeps MIDI consistent", () => {
    for (const [from, ivl] of [["C4", "3M"], ["F#3", "-2m"], ["Bb4", "8P"], ["E5", "5P"]] as const) {
      const p = transposePitch(pitchFromName(from), ivl);
      expect(pitchName(p)).toBe(Note.transpose(from, ivl)); // reference: tonal
      expect(p.midi).toBe(Note.midi(Note.transpose(from, ivl)));
    }
    expect(shiftOctave(pitchFromName("G3"), 1)).toEqual(pitchFromName("G4"));
  });
});
