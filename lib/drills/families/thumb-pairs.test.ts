import fc from "fast-check";
import { Key, Note, Scale } from "tonal";
import { describe, expect, test } from "vitest";
import { makeContext } from "../build";
import { keyScaleName, pitchName } from "../spell";
import { passageKey, writableForm } from "../key-mode";
import { makePassage } from "../test-passages";
import type { Drill } from "../types";
import { barProblems } from "./shared-2-layout";
import { generateThumbPairs, onKeyboard, pairFingers, thumbPairsOptions } from "./thumb-pairs";

const ctx = makeContext();
const notes = (d: Drill) => d.score.events.filter((e) => e.pitch);
const names = (d: Drill) => notes(d).map((e) => pitchName(e.pitch!));
const fingers = (d: Drill) => notes(d).map((e) => e.fingering?.[0]?.finger);

describe("thumb-pairs", () => {
  // Right hand around middle C, C major: the scale C4…C5 (tonal Scale.get("C major")).
  const p = makePassage({ right: "E4/4 G4/4 C5/4 G4/4" });

  test("thumb and 3: C major up and down, fingers 1 3 1 3 …, eighth notes", () => {
    const d = generateThumbPairs(p, thumbPairsOptions.parse({ fingers: [3], fiveFinger: false }), ctx).drills[0];
    expect(names(d)).toEqual(["C4", "D4", "E4", "F4", "G4", "A4", "B4", "C5", "B4", "A4", "G4", "F4", "E4", "D4", "C4"]);
    expect(fingers(d)).toEqual([1, 3, 1, 3, 1, 3, 1, 3, 1, 3, 1, 3, 1, 3, 1]);
    expect(notes(d).every((e) => e.duration.equals(0.5))).toBe(true);
    expect(barProblems(d.score)).toEqual([]);
  });

  test("left hand starts on the other finger (little-finger side low)", () => {
    expect(pairFingers(4, 2, "left")).toEqual([2, 1, 2, 1]);
  });

  test("five-finger sideways and thumb takeover", () => {
    const r = generateThumbPairs(p, thumbPairsOptions.parse({ fingers: [2], positions: 2 }), ctx);
    const side = r.drills.find((d) => d.variant === "five-finger-sideways")!;
    expect(names(side)).toEqual([
      "C4", "D4", "E4", "F4", "G4", "F4", "E4", "D4",
      "D4", "E4", "F4", "G4", "A4", "G4", "F4", "E4",
      "C4", "D4", "E4", "F4", "G4", "F4", "E4", "D4", "C4",
    ]);
    expect(fingers(side).slice(0, 8)).toEqual([1, 2, 3, 4, 5, 4, 3, 2]);
    const take = r.drills.find((d) => d.variant === "thumb-takes-3")!;
    expect(names(take)).toEqual(["C4", "D4", "E4", "E4", "F4", "G4", "G4", "A4", "B4", "B4", "C5"]);
    expect(fingers(take)).toEqual([1, 2, 3, 1, 2, 3, 1, 2, 3, 1, 2]);
  });

  test("a low left hand (A0 sixteenths, G major): the takeover pattern moves up an octave onto the keyboard", () => {
    const low = makePassage({ left: "A0/16 A0/16 A0/16 A0/16", key: { fifths: 1, mode: "major" } });
    const r = generateThumbPairs(low, thumbPairsOptions.parse({}), ctx);
    // Lowest key A0 = MIDI 21 (FACTS.md §1): from G1 down, the pattern would reach G0 = 19.
    for (const d of r.drills) for (const e of notes(d)) expect(e.pitch!.midi, d.variant).toBeGreaterThanOrEqual(21);
    const take = r.drills.find((d) => d.variant === "thumb-takes-3")!;
    // G major from G2 down (tonal Scale.get("G major")): fingers 1–3, the thumb retaking finger 3's key.
    expect(names(take)).toEqual(["G2", "F#2", "E2", "E2", "D2", "C2", "C2", "B1", "A1", "A1", "G1"]);
    expect(fingers(take)).toEqual([1, 2, 3, 1, 2, 3, 1, 2, 3, 1, 2]);
  });

  test("onKeyboard moves a pattern by whole octaves only when it leaves A0–C8 (FACTS.md §1)", () => {
    expect(onKeyboard(["A0", "G0"])).toEqual(["A1", "G1"]);
    expect(onKeyboard(["B7", "D8"])).toEqual(["B6", "D7"]);
    expect(onKeyboard(["C4", "D4"])).toEqual(["C4", "D4"]);
  });

  test("property: scales equal tonal's Scale.get(...).notes; thumb pairs only ever use {1, k}; bars exact", () => {
    fc.assert(
      fc.property(
        fc.integer({ min: -7, max: 7 }), fc.constantFrom("major", "minor"), fc.constantFrom(2, 3, 4),
        fc.integer({ min: 1, max: 2 }), fc.constantFrom("right", "left"), fc.integer({ min: 21, max: 108 }),
        (fifths, mode, k, octaves, hand, midi) => {
          const key = { fifths, mode };
          const pass = makePassage({ [hand]: `${Note.fromMidiSharps(midi)}/4`, key });
          const o = thumbPairsOptions.parse({ fingers: [k], octaves, fiveFinger: true });
          const all = generateThumbPairs(pass, o, ctx).drills;
          for (const x of all) for (const e of notes(x)) expect(e.pitch!.midi >= 21 && e.pitch!.midi <= 108, x.variant).toBe(true);
          const d = all[0];
          // The passage's key (from its notes and signature); minor in harmonic form by default.
          // Reference: tonal's Scale.get(...).notes for major, Key.minorKey(...).harmonic.scale for minor.
          const pk = passageKey(pass);
          // (natural minor where the harmonic form would need a double sharp the passage does not have).
          const expected = pk.mode === "major" ? Scale.get(`${pk.tonic} major`).notes : Key.minorKey(pk.tonic)[writableForm(pk, "harmonic", pass)].scale;
          expect(keyScaleName({ fifths, mode: pk.mode })).toBe(`${pk.tonic} ${pk.mode}`);
          const pcs = notes(d).map((e) => Note.pitchClass(pitchName(e.pitch!)));
          for (let i = 0; i < 7 * octaves; i++) expect(pcs[i]).toBe(expected[i % 7]);
          expect(new Set(fingers(d))).toEqual(new Set([1, k]));
          expect(barProblems(d.score)).toEqual([]);
          for (const e of notes(d)) expect(e.pitch!.midi >= 21 && e.pitch!.midi <= 108).toBe(true);
        },
      ),
      { numRuns: 80 },
    );
  });
});
