import Fraction from "fraction.js";
import fc from "fast-check";
import { Interval, Note, Scale } from "tonal";
import { describe, expect, test } from "vitest";
import { makeContext } from "../build";
import { profileFromInches } from "../hand";
import { pitchFromName, pitchName } from "../spell";
import { makePassage } from "../test-passages";
import type { Drill } from "../types";
import { barProblems } from "./shared-2-layout";
import { generateSequence, mirrorPitch, movePitch, overAfter, sequenceOptions } from "./sequence";

const ctx = makeContext();
const names = (d: Drill, staff: number) => d.score.events.filter((e) => e.staff === staff && e.pitch).map((e) => pitchName(e.pitch!));
const C = { fifths: 0, mode: "major" };

/** Note name at scale ordinal o (0 = tonic of octave 0) via tonal's Scale.degrees (1-based, no 0). */
const degreeName = (scale: string, o: number) => Scale.degrees(`${scale.split(" ")[0]}0 ${scale.slice(scale.indexOf(" ") + 1)}`)(o >= 0 ? o + 1 : o);
const ordinalOf = (scale: string, name: string) => {
  for (let o = -10; o < 80; o++) if (degreeName(scale, o) === name) return o;
  throw new Error(`${name} not in ${scale}`);
};

describe("sequence", () => {
  const arpeggio = makePassage({ right: "C4/8@1 E4/8@2 G4/8@4 E4/8@2" });

  test("diatonic: C E G E moved up a step each time in C major (tonal Scale.get('C major'))", () => {
    const o = sequenceOptions.parse({ repetitions: 3 });
    const d = generateSequence(arpeggio, o, ctx).drills.find((x) => x.variant === "sequence")!;
    expect(names(d, 1)).toEqual(["C4", "E4", "G4", "E4", "D4", "F4", "A4", "F4", "E4", "G4", "B4", "G4"]);
    expect(d.score.events.filter((e) => e.pitch).every((e) => e.duration.equals(0.5))).toBe(true);
    // The source fingering stays on the first statement only; moved notes are not the score's.
    expect(d.score.events[1].fingering?.[0].finger).toBe(2);
    expect(d.fingeringSource[d.score.events[5].id]).not.toBe("score");
    expect(barProblems(d.score)).toEqual([]);
  });

  test("mirror: the left hand goes down from C3 by the same scale steps", () => {
    const o = sequenceOptions.parse({ repetitions: 2 });
    const d = generateSequence(arpeggio, o, ctx).drills.find((x) => x.variant === "mirror")!;
    expect(names(d, 2)).toEqual(["C3", "A2", "F2", "A2", "B2", "G2", "E2", "G2"]);
  });

  test("chromatic: up a semitone with sharps, down with flats (common practice)", () => {
    const up = sequenceOptions.parse({ motion: "chromatic", repetitions: 2, mirror: false });
    expect(names(generateSequence(arpeggio, up, ctx).drills[0], 1).slice(4)).toEqual(["C#4", "F4", "G#4", "F4"]);
    const down = sequenceOptions.parse({ motion: "chromatic", semitones: -1, repetitions: 2, mirror: false });
    expect(names(generateSequence(arpeggio, down, ctx).drills[0], 1).slice(4)).toEqual(["B3", "Eb4", "Gb4", "Eb4"]);
  });

  test("stops at the top of the keyboard with a warning (C8 = 108, FACTS.md §1)", () => {
    const high = makePassage({ right: "E7/8 G7/8" });
    const d = generateSequence(high, sequenceOptions.parse({ steps: 2, mirror: false }), ctx).drills[0];
    expect(names(d, 1)).toEqual(["E7", "G7", "G7", "B7"]);
    expect(d.warnings.some((w) => w.code === "range" && w.message.startsWith("Stopped after 2 repetitions"))).toBe(true);
    // A figure that cannot move at all writes no "sequence" of one statement: the family says why.
    const top = generateSequence(makePassage({ right: "G7/8 B7/8" }), sequenceOptions.parse({ steps: 2, mirror: false }), ctx);
    expect(top.drills).toEqual([]);
    expect(top.skipped).toMatch(/can move/);
  });

  // Minor keys move through the harmonic minor (its leading tone is a scale note; common practice).
  test("property: diatonic moves and mirrors equal tonal's Scale.degrees; chromatic ones tonal's Note.transpose", () => {
    const keys = [["C major", 0, "major"], ["G major", 1, "major"], ["F major", -1, "major"], ["D harmonic minor", -1, "minor"], ["E harmonic minor", 1, "minor"]] as const;
    fc.assert(
      fc.property(fc.constantFrom(...keys), fc.integer({ min: 14, max: 48 }), fc.integer({ min: -3, max: 3 }), fc.integer({ min: -4, max: 4 }), (k, ord, steps, rep) => {
        const [scale, fifths, mode] = k;
        const key = { fifths, mode };
        const src = degreeName(scale, ord);
        const o = sequenceOptions.parse({ steps: steps || 1 });
        const moved = pitchName(movePitch(pitchFromName(src), rep, o, key));
        expect(moved).toBe(degreeName(scale, ord + rep * (steps || 1)));
        const axisName = degreeName(scale, 28);
        const targetName = degreeName(scale, 21);
        const mir = pitchName(mirrorPitch(pitchFromName(axisName), pitchFromName(src), pitchFromName(targetName), o, key));
        expect(mir).toBe(degreeName(scale, 21 - (ordinalOf(scale, src) - 28)));
        const oc = sequenceOptions.parse({ motion: "chromatic", semitones: steps || 1 });
        const ch = movePitch(pitchFromName(src), rep, oc, key);
        expect(ch.midi).toBe(Note.midi(Note.transpose(src, Interval.fromSemitones(rep * (steps || 1)))));
        const mc = mirrorPitch(pitchFromName(axisName), pitchFromName(src), pitchFromName(targetName), oc, key);
        expect(mc.midi).toBe(Note.midi(Note.transpose(targetName, Interval.fromSemitones(-Interval.semitones(Interval.distance(axisName, src))!))));
      }),
      { numRuns: 200 },
    );
  });

  test("property: bars exact, range A0–C8 and, with safety on, no chord past the profile it started within", () => {
    const small = makeContext({ profile: profileFromInches(6.5) });
    fc.assert(
      fc.property(
        fc.array(fc.tuple(fc.integer({ min: 30, max: 100 }), fc.integer({ min: 0, max: 9 })), { minLength: 2, maxLength: 6 }),
        fc.constantFrom("8", "16", "8t", "4"),
        fc.integer({ min: -3, max: 3 }).filter((n) => n !== 0),
        (cells, value, steps) => {
          const nm = (m: number) => Note.fromMidiSharps(m);
          const text = cells.map(([m, iv]) => (iv ? `[${nm(m)},${nm(m + iv)}]` : nm(m)) + `/${value.replace("t", "")}${value.endsWith("t") ? "t" : ""}`).join(" ");
          const pass = makePassage({ right: text });
          const figLen = pass.sonorities.right.slice(0, 4).reduce((a, s) => a.add(s.duration), new Fraction(0));
          for (const d of generateSequence(pass, sequenceOptions.parse({ steps, repetitions: 6 }), small).drills) {
            expect(barProblems(d.score)).toEqual([]);
            for (const e of d.score.events) if (e.pitch) expect(e.pitch.midi >= 21 && e.pitch.midi <= 108).toBe(true);
            // Only the figure as written may be over the profile; every moved statement is within it.
            expect(overAfter(d, figLen, small.profile)).toBe(false);
          }
        },
      ),
      { numRuns: 60 },
    );
  });
});

describe("sequence fingering", () => {
  test("each moved figure is fingered like the figure as written (the same shape, common practice)", () => {
    // 2-3-5-3 is the written fingering; a free estimate of D F A F would start on the thumb.
    const p = makePassage({ right: "C4/8@2 E4/8@3 G4/8@5 E4/8@3" });
    const d = generateSequence(p, sequenceOptions.parse({ mirror: false, repetitions: 3 }), makeContext()).drills[0]!;
    const fingers = d.score.events.filter((e) => e.pitch && e.staff === 1).map((e) => e.fingering?.[0]?.finger);
    expect(fingers).toHaveLength(12);
    expect(fingers.slice(0, 4)).toEqual([2, 3, 5, 3]);
    expect(fingers.slice(4, 8)).toEqual(fingers.slice(0, 4));
    expect(fingers.slice(8, 12)).toEqual(fingers.slice(0, 4));
    expect(d.score.events.filter((e) => e.pitch).slice(4).every((e) => d.fingeringSource[e.id] === "estimated")).toBe(true);
  });
});
