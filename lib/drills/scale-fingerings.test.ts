/**
 * The scale table, row by row: all 24 keys (majors, harmonic and melodic minors), both hands, one and
 * two octaves. Expected fingerings are the scale books' (common practice, from memory — as printed in
 * the usual scale manuals; no single book quoted); scale notes are checked against tonal's `Scale.get`
 * (the reference library, source named beside the check). Playability follows DRILL-RUBRIC §4.
 */
import { Note, Scale } from "tonal";
import { describe, expect, test } from "vitest";
import type { Hand } from "../score/types";
import { isBlackKey } from "./hand";
import { fingeredScale, scaleFingers, SCALE_ROWS, type ScaleForm } from "./scale-fingerings";

// [tonic, form, RH one octave up, LH one octave up, source]. Each row: common practice, from memory,
// except those marked "rule": melodic-minor rows worked out by the books' rule (thumb on white keys).
const ROWS: [string, ScaleForm, string, string, string][] = [
  ["C", "major", "12312345", "54321321", "common practice, from memory"],
  ["G", "major", "12312345", "54321321", "common practice, from memory"],
  ["D", "major", "12312345", "54321321", "common practice, from memory"],
  ["A", "major", "12312345", "54321321", "common practice, from memory"],
  ["E", "major", "12312345", "54321321", "common practice, from memory"],
  ["B", "major", "12312345", "43214321", "common practice, from memory"],
  ["F#", "major", "23412312", "43213214", "common practice, from memory"],
  ["Gb", "major", "23412312", "43213214", "common practice, from memory (as F♯)"],
  ["Db", "major", "23123412", "32143213", "common practice, from memory"],
  ["Ab", "major", "34123123", "32143213", "common practice, from memory"],
  ["Eb", "major", "31234123", "32143213", "common practice, from memory"],
  ["Bb", "major", "41231234", "32143213", "common practice, from memory"],
  ["F", "major", "12341234", "54321321", "common practice, from memory"],
  ["A", "harmonic minor", "12312345", "54321321", "common practice, from memory"],
  ["E", "harmonic minor", "12312345", "54321321", "common practice, from memory"],
  ["B", "harmonic minor", "12312345", "43214321", "common practice, from memory"],
  ["F#", "harmonic minor", "34123123", "43213214", "common practice, from memory"],
  ["C#", "harmonic minor", "34123123", "32143213", "common practice, from memory"],
  ["G#", "harmonic minor", "34123123", "32143213", "common practice, from memory"],
  ["D#", "harmonic minor", "31234123", "21432132", "common practice, from memory (as E♭)"],
  ["Bb", "harmonic minor", "21231234", "21321432", "common practice, from memory"],
  ["F", "harmonic minor", "12341234", "54321321", "common practice, from memory"],
  ["C", "harmonic minor", "12312345", "54321321", "common practice, from memory"],
  ["G", "harmonic minor", "12312345", "54321321", "common practice, from memory"],
  ["D", "harmonic minor", "12312345", "54321321", "common practice, from memory"],
  ["A", "melodic minor", "12312345", "54321321", "common practice, from memory"],
  ["E", "melodic minor", "12312345", "54321321", "common practice, from memory"],
  ["B", "melodic minor", "12312345", "43214321", "common practice, from memory"],
  ["F#", "melodic minor", "23123412", "43213214", "rule"],
  ["C#", "melodic minor", "23123412", "32143213", "rule"],
  ["G#", "melodic minor", "34123123", "32143213", "rule"],
  ["Eb", "melodic minor", "31234123", "21432132", "common practice, from memory"],
  ["Bb", "melodic minor", "21231234", "21321432", "common practice, from memory"],
  ["F", "melodic minor", "12341234", "54321321", "common practice, from memory"],
  ["C", "melodic minor", "12312345", "54321321", "common practice, from memory"],
  ["G", "melodic minor", "12312345", "54321321", "common practice, from memory"],
  ["D", "melodic minor", "12312345", "54321321", "common practice, from memory"],
];
const digits = (s: string) => [...s].map(Number);
const tonalName = (tonic: string, form: ScaleForm) => `${tonic} ${form === "natural minor" ? "minor" : form}`;

describe("scale-book rows (common practice, from memory)", () => {
  test("the table covers 12 majors, 12 harmonic and 12 melodic minors on 12 different tonics each", () => {
    for (const form of ["major", "harmonic minor", "melodic minor"] as const) {
      const chromas = new Set(SCALE_ROWS.filter((r) => r.form === form).map((r) => Note.chroma(r.tonic)));
      expect(chromas.size).toBe(12);
    }
  });

  test.each(ROWS)("%s %s: RH %s, LH %s, one octave (%s)", (tonic, form, rh, lh) => {
    expect(scaleFingers(tonic, form, "right", 1)?.up).toEqual(digits(rh));
    expect(scaleFingers(tonic, form, "left", 1)?.up).toEqual(digits(lh));
  });

  test.each(ROWS)("%s %s: two octaves repeat the seven-note pattern, both hands", (tonic, form, rh, lh) => {
    const r = digits(rh), l = digits(lh);
    // Scale books: RH 7-note pattern twice then the top finger; LH the bottom finger then the pattern twice.
    // B♭ minor's right hand starts on 2 but passes its inner tonic with 4 (common practice, from memory).
    const middle = tonic === "Bb" && form !== "major" ? 4 : r[0];
    expect(scaleFingers(tonic, form, "right", 2)?.up).toEqual([...r.slice(0, 7), middle, ...r.slice(1, 7), r[7]]);
    expect(scaleFingers(tonic, form, "left", 2)?.up).toEqual([l[0], ...l.slice(1), ...l.slice(1)]);
  });

  test("two-octave rows written out in full (common practice, from memory)", () => {
    expect(scaleFingers("C", "major", "right", 2)?.up).toEqual(digits("123123412312345"));
    expect(scaleFingers("C", "major", "left", 2)?.up).toEqual(digits("543213214321321"));
    expect(scaleFingers("B", "major", "left", 2)?.up).toEqual(digits("432143213214321"));
    expect(scaleFingers("F", "major", "right", 2)?.up).toEqual(digits("123412312341234"));
    expect(scaleFingers("Bb", "major", "right", 2)?.up).toEqual(digits("412312341231234"));
    expect(scaleFingers("Db", "major", "left", 2)?.up).toEqual(digits("321432132143213"));
    expect(scaleFingers("Bb", "harmonic minor", "right", 2)?.up).toEqual(digits("212312341231234"));
    // Melodic minor comes down as natural minor: F♯ minor's right hand comes down as F♯ major is fingered.
    expect(scaleFingers("F#", "melodic minor", "right", 1)?.down).toEqual(digits("21321432"));
  });

  test.each(ROWS)("%s %s: scale notes match tonal's Scale.get, up and (melodic: natural) down", (tonic, form) => {
    for (const hand of ["right", "left"] as Hand[]) {
      for (const octaves of [1, 2]) {
        const s = fingeredScale(tonic, form, hand, octaves, 3)!;
        const n = 7 * octaves + 1;
        expect(s.notes).toHaveLength(2 * n - 1);
        // Source: tonal Scale.get(name).notes, the pitch classes of the scale in order.
        const upPcs = Scale.get(tonalName(tonic, form)).notes;
        const downPcs = Scale.get(tonalName(tonic, form === "melodic minor" ? "natural minor" : form)).notes;
        s.notes.slice(0, n).forEach((name, i) => expect(Note.pitchClass(name)).toBe(upPcs[i % 7]));
        s.notes.slice(n - 1).forEach((name, i) => expect(Note.pitchClass(name)).toBe(downPcs[(7 - (i % 7)) % 7]));
        expect(s.fingers).toHaveLength(s.notes.length);
      }
    }
  });
});

describe("DRILL-RUBRIC §4 on every row", () => {
  const forms: ScaleForm[] = ["major", "harmonic minor", "melodic minor", "natural minor"];
  const all = ROWS.flatMap(([tonic]) => forms.map((form) => [tonic, form] as const));
  test.each(all)("%s %s: no thumb or fifth on a black key, no finger twice in a row, passes only with the thumb", (tonic, form) => {
    for (const hand of ["right", "left"] as Hand[]) {
      const s = fingeredScale(tonic, form, hand, 2, 3)!;
      const midis = s.notes.map((n) => Note.midi(n)!);
      s.fingers.forEach((finger, i) => {
        if (finger === 1 || finger === 5) expect(isBlackKey(midis[i]!), `${s.notes[i]} with ${finger}`).toBe(false);
        if (i === 0) return;
        const prev = s.fingers[i - 1]!;
        expect(finger).not.toBe(prev);
        // Fingers follow the hand's direction (RH up = higher finger) unless the thumb passes or is passed.
        const rising = midis[i]! > midis[i - 1]!;
        const natural = (hand === "right") === rising ? finger > prev : finger < prev;
        if (!natural) expect(finger === 1 || prev === 1).toBe(true);
      });
    }
  });

  test("an unknown tonic gives null", () => {
    expect(scaleFingers("H", "major", "right")).toBeNull();
  });
});
