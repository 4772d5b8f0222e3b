import { Key, Scale } from "tonal";
import { describe, expect, test } from "vitest";
import { makeContext } from "./build";
import { keyLabel, keyScaleNotes, passageKey, scaleNameOf } from "./key-mode";
import { pitchName } from "./spell";
import { drillText, makePassage } from "./test-passages";
import { scaleRhythm, scaleRhythmOptions } from "./families/scale-rhythm";
import { generateSequence, sequenceOptions } from "./families/sequence";

const C = { fifths: 0, mode: "major" };

describe("key-mode", () => {
  test("a passage round A with its leading tone G♯ is in A minor; one round C stays in C major (common practice)", () => {
    expect(passageKey(makePassage({ right: "A4/8 C5/8 E5/8 G#4/8 A4/2", left: "A2/2 E3/2", key: C }))).toEqual({ tonic: "A", mode: "minor", fifths: 0 });
    expect(passageKey(makePassage({ right: "C4/8 E4/8 G4/8 C5/8 B4/8 D5/8 C5/4", key: C }))).toEqual({ tonic: "C", mode: "major", fifths: 0 });
    // Relative minor of E♭ major is C minor (tonal Key.majorKey("Eb").minorRelative).
    expect(passageKey(makePassage({ right: "C5/8 Eb5/8 G5/8 B4/8 C5/2", left: "C3/2 G2/2", key: { fifths: -3, mode: "major" } })).tonic).toBe(Key.majorKey("Eb").minorRelative);
    // A signature marked minor is kept; a note or two cannot overturn the signature.
    expect(passageKey(makePassage({ right: "C5/2 E5/2", key: { fifths: 0, mode: "minor" } })).mode).toBe("minor");
    expect(passageKey(makePassage({ right: "A4/1", key: C })).mode).toBe("major");
    // Under one sharp, a bar round A with G♯ centres on A minor (seen in the gallery: Wolf, bars 3–4);
    // without a note of its own (no G♯, no F natural) a neighbouring key is never chosen.
    const g = { fifths: 1, mode: "major" };
    expect(passageKey(makePassage({ right: "[C4,E4,A4]/4 B4/16 C5/16 D5/16 E5/16 F#5/16 G#5/16 [C5,E5,A5]/2", left: "A2/2 E3/2", key: g }))).toEqual({ tonic: "A", mode: "minor", fifths: 0 });
    expect(passageKey(makePassage({ right: "D4/8 F#4/8 A4/8 D5/8 C5/8 A4/8 F#4/4", left: "D3/2 D3/2", key: g })).fifths).toBe(1);
  });

  test("scales are tonal's: Scale.get for major, Key.minorKey(...)[form].scale for minor (reference: tonal)", () => {
    const a = { tonic: "A", mode: "minor" as const, fifths: 0 };
    expect(keyScaleNotes(a, "harmonic")).toEqual(Key.minorKey("A").harmonic.scale);
    expect(keyScaleNotes(a, "melodic")).toEqual(Key.minorKey("A").melodic.scale);
    expect(keyScaleNotes(a, "natural")).toEqual(Scale.get("A minor").notes);
    expect(keyScaleNotes({ tonic: "Eb", mode: "major", fifths: -3 })).toEqual(Scale.get("Eb major").notes);
    expect(scaleNameOf(a, "melodic")).toBe("A melodic minor");
    expect(keyLabel({ tonic: "Eb", mode: "major", fifths: -3 })).toBe("E♭ major");
  });

  test("scale-rhythm on an A minor passage plays A minor in the chosen form, not C major (DRILL-RUBRIC scale-rhythm)", () => {
    const p = makePassage({ right: "A4/8 B4/8 C5/8 B4/8 A4/8 G#4/8 A4/4", left: "A2/2 E2/2", key: C });
    for (const form of ["harmonic", "melodic"] as const) {
      const [d] = scaleRhythm.generate(p, scaleRhythmOptions.parse({ minorForm: form }), makeContext()).drills;
      expect(d.title).toMatch(new RegExp(`^A ${form} minor scale`));
      const up = drillText(d.score.events, 1).slice(0, 7).map((t) => t.split(":")[0].replace(/-?\d+$/, ""));
      expect(up).toEqual(Key.minorKey("A")[form].scale); // reference: tonal
    }
  });

  test("a diatonic sequence in F♯ minor moves E♯ to F♯, never F𝄪 (DRILL-RUBRIC sequence: no kept accidentals)", () => {
    const p = makePassage({ right: "F#4/8 E#4/8 F#4/8 G#4/8 A4/8 G#4/8 F#4/8 C#4/8", left: "F#2/2 C#3/2", key: { fifths: 3, mode: "major" } });
    const d = generateSequence(p, sequenceOptions.parse({ repetitions: 3 }), makeContext()).drills.find((x) => x.variant === "sequence")!;
    const names = d.score.events.filter((e) => e.pitch).map((e) => pitchName(e.pitch!));
    expect(names.slice(0, 8)).toEqual(["F#4", "E#4", "F#4", "G#4", "G#4", "F#4", "G#4", "A4"]);
    for (const e of d.score.events) if (e.pitch) expect(Math.abs(e.pitch.alter)).toBeLessThan(2);
  });
});
