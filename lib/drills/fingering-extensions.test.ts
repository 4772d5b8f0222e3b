/**
 * The estimator's extensions for real music (fingering.ts opening comment): scale runs from the scale
 * table, rests, held notes, chord stacks, repeated figures and cross-staff voices. Expected fingerings
 * are the scale books' (scale-fingerings.ts; common practice, from memory) or follow from the rule named
 * beside the check; black keys by hand.ts (FACTS.md §1 key model).
 */
import Fraction from "fraction.js";
import { Note } from "tonal";
import { describe, expect, test } from "vitest";
import type { KeySignature, NoteEvent } from "../score/types";
import { voiceHomes } from "./difficulty-bars";
import { estimateFingering } from "./fingering";
import { chordWrittenFingers } from "./fingering-slices";
import { FITTED_TUNING, PUBLISHED_TUNING } from "./fingering-tuning";
import { isBlackKey } from "./hand";
import { buildNotes } from "./note-builder";
import { fingeredScale, SCALE_ROWS } from "./scale-fingerings";

/** Key signature of a table row: fifths from the tonic's pitch class (tonal `Note.chroma`). */
function keyOfRow(tonic: string, form: string): KeySignature {
  const fifthsOfMajor = (((Note.chroma(tonic)! * 7) % 12) + 12) % 12;
  const major = fifthsOfMajor > 6 ? fifthsOfMajor - 12 : fifthsOfMajor;
  return form === "major" ? { fifths: major, mode: "major" } : { fifths: major - 3, mode: "minor" };
}

describe("scale runs take the scale book's fingering (scale-fingerings.ts)", () => {
  const cases = SCALE_ROWS.flatMap((r) => (["right", "left"] as const).map((hand) => [r.tonic, r.form, hand] as const));
  test.each(cases)("%s %s, %s hand, two octaves up and down, key known", (tonic, form, hand) => {
    const s = fingeredScale(tonic, form, hand, 2, hand === "right" ? 4 : 2)!;
    const key = keyOfRow(tonic, form);
    const got = estimateFingering(buildNotes(s.notes, { perBar: 64 }), hand, { keyOf: () => key, costs: false }).fingers;
    expect(got).toEqual(s.fingers);
  });

  test("key unknown: no one-octave scale of the 24 keys puts the thumb or fifth on a black key", () => {
    let exact = 0;
    for (const [tonic, form, hand] of cases) {
      const s = fingeredScale(tonic, form, hand, 1, 4)!;
      const notes = s.notes.slice(0, 8);
      const got = estimateFingering(buildNotes(notes), hand, { costs: false }).fingers;
      got.forEach((f, i) => {
        if (f === 1 || f === 5) expect(isBlackKey(Note.midi(notes[i]!)!), `${tonic} ${form} ${hand}: ${notes[i]} with ${f}`).toBe(false);
      });
      if (got.join() === s.fingers.slice(0, 8).join()) exact++;
    }
    expect(exact).toBeGreaterThanOrEqual(65); // of 72; the rest differ only in a starting or end finger
  });

  test("E♭ major right hand without the key: thumb on F and C as the books have it (the issue's case)", () => {
    const got = estimateFingering(buildNotes("Eb4 F4 G4 Ab4 Bb4 C5 D5 Eb5".split(" ")), "right", { costs: false }).fingers;
    expect(got.slice(1)).toEqual([1, 2, 3, 4, 1, 2, 3]); // scale books: 3 1234 123
  });
});

describe("rests, held notes, chords and repeats", () => {
  test("across a rest the hand lifts: the same three-finger group is fingered alike in both places", () => {
    // C D E, rest, C D E two octaves up. Without a lift the published model prepares the leap by
    // ending on the thumb side and landing on 3-4-5; a pianist lifts and plays 1-2-3 twice (common practice).
    const events = buildNotes(["C4", "D4", "E4", "r", "C6", "D6", "E6"]);
    expect(estimateFingering(events, "right", { costs: false }).fingers).toEqual([1, 2, 3, null, 1, 2, 3]);
    expect(estimateFingering(events, "right", { tuning: PUBLISHED_TUNING, costs: false }).fingers).toEqual([1, 2, 3, null, 3, 4, 5]);
  });

  test("a note struck while another of the hand is held never takes the held note's finger", () => {
    // C4 held for a whole bar while D4 E4 F4 G4 pass over it (a held-tone figure).
    const held: NoteEvent = { ...buildNotes(["C4"])[0]!, id: "held", duration: new Fraction(4), voice: "2" };
    const moving = buildNotes(["E4", "F4", "G4", "A4", "G4", "F4", "E4", "D4"], { id: "m" });
    const events = [held, ...moving];
    const { fingers } = estimateFingering(events, "right", { costs: false });
    for (let i = 1; i < events.length; i++) expect(fingers[i]).not.toBe(fingers[0]);
  });

  test("a chord's stacked printed fingering on one note goes to the chord's keys in the hand's order", () => {
    const chord = buildNotes(["D5+F#5+A5"]);
    const stacked = chord.map((e, i) => (i === 0 ? { ...e, fingering: [{ finger: 1 }, { finger: 2 }, { finger: 3 }] } : e));
    expect(chordWrittenFingers(stacked, "right")).toEqual([1, 2, 3]);
    expect(chordWrittenFingers(stacked.map((e) => (e.fingering ? { ...e, fingering: [{ finger: 5 }, { finger: 3 }, { finger: 1 }] } : e)), "left")).toEqual([5, 3, 1]);
    // A substitution ("3-1" on one held key) is not a stack: the note keeps its first mark.
    const sub = chord.map((e, i) => (i === 0 ? { ...e, fingering: [{ finger: 3 }, { finger: 1, substitution: true }, { finger: 2 }] } : e));
    expect(chordWrittenFingers(sub, "right")).toEqual([3, null, null]);
    expect(estimateFingering(stacked, "right").fingers).toEqual([1, 2, 3]);
  });

  test("a repeated figure follows the fingering printed on another statement of it", () => {
    // C E G E three times; the editor marks G4 with 3 in the second statement only.
    const events = buildNotes(["C4", "E4", "G4", "E4", "C4", "E4", "G4/3", "E4", "C4", "E4", "G4", "E4"]);
    const { fingers } = estimateFingering(events, "right", { costs: false });
    const without = estimateFingering(events, "right", { costs: false, tuning: { ...FITTED_TUNING, repeatPrior: 0 } }).fingers;
    expect(without[2]).not.toBe(3); // on its own the search fingers the first statement's G4 otherwise
    expect(fingers[2]).toBe(3); // same notes on either side as the marked G4 → same finger
    expect(fingers.slice(0, 4)).toEqual(fingers.slice(4, 8));
  });
});

describe("voices that cross staves (difficulty-bars.ts voiceHomes)", () => {
  test("a voice with three quarters of its notes on staff 2 belongs to staff 2, a voice split evenly to neither", () => {
    const left = buildNotes(["C3", "E3", "G3", "C4"], { staff: 2, id: "l" }).map((e) => ({ ...e, voice: "5" }));
    const crossed = { ...left[3]!, staff: 1 };
    const split = [...buildNotes(["C5"], { id: "a" }), ...buildNotes(["C3"], { staff: 2, id: "b" })].map((e) => ({ ...e, voice: "2" }));
    const homes = voiceHomes([...left.slice(0, 3), crossed, ...split]);
    expect(homes.get("P1|5")).toBe(2);
    expect(homes.has("P1|2")).toBe(false);
  });
});
