import Fraction from "fraction.js";
import { describe, expect, test } from "vitest";
import type { NoteEvent } from "../score/types";
import { estimateFingering } from "./fingering";
import { STANDARD_FINGERINGS } from "./fingering-tables";
import { buildNotes } from "./note-builder";

const names = (s: string) => s.split(" ");

describe("estimateFingering — common practice", () => {
  // Common practice: right-hand C, G, D, A, E major one octave 1-2-3-1-2-3-4-5.
  test.each([
    ["C", "C4 D4 E4 F4 G4 A4 B4 C5"],
    ["G", "G4 A4 B4 C5 D5 E5 F#5 G5"],
    ["D", "D4 E4 F#4 G4 A4 B4 C#5 D5"],
    ["A", "A4 B4 C#5 D5 E5 F#5 G#5 A5"],
    ["E", "E4 F#4 G#4 A4 B4 C#5 D#5 E5"],
  ])("right hand %s major scale 1-2-3-1-2-3-4-5", (_, notes) => {
    expect(estimateFingering(buildNotes(names(notes)), "right").fingers).toEqual([1, 2, 3, 1, 2, 3, 4, 5]);
  });
  test("left hand C major scale 5-4-3-2-1-3-2-1 (common practice)", () => {
    expect(estimateFingering(buildNotes(names("C3 D3 E3 F3 G3 A3 B3 C4")), "left").fingers).toEqual([5, 4, 3, 2, 1, 3, 2, 1]);
  });
  test("five-finger position C–G 1-2-3-4-5 (common practice)", () => {
    expect(estimateFingering(buildNotes(names("C4 D4 E4 F4 G4")), "right").fingers).toEqual([1, 2, 3, 4, 5]);
  });
  test("two-octave C major right hand 1-2-3-1-2-3-4-1-2-3-1-2-3-4-5 (common practice)", () => {
    const notes = names("C4 D4 E4 F4 G4 A4 B4 C5 D5 E5 F5 G5 A5 B5 C6");
    expect(estimateFingering(buildNotes(notes, { perBar: 16 }), "right").fingers).toEqual([1, 2, 3, 1, 2, 3, 4, 1, 2, 3, 1, 2, 3, 4, 5]);
  });
  test("reproduces at least 90% of the standard table (fingering-tables.ts, common practice)", () => {
    const result = (model: "parncutt" | "jacobs") => {
      const misses = STANDARD_FINGERINGS.filter((e) => estimateFingering(buildNotes(e.notes), e.hand, { model }).fingers.join() !== e.fingers.join());
      const exact = STANDARD_FINGERINGS.length - misses.length;
      console.log(`${model}: ${exact} of ${STANDARD_FINGERINGS.length} standard fingerings reproduced exactly (${((100 * exact) / STANDARD_FINGERINGS.length).toFixed(1)}%); missed: ${misses.map((m) => m.name).join("; ") || "none"}`);
      return exact / STANDARD_FINGERINGS.length;
    };
    expect(STANDARD_FINGERINGS.length).toBeGreaterThanOrEqual(20);
    expect(result("parncutt")).toBeGreaterThanOrEqual(0.9);
    expect(result("jacobs")).toBeGreaterThanOrEqual(0.75); // reported; Jacobs is the optional model
  });
});

describe("estimateFingering — behaviour", () => {
  test("written fingerings are fixed points and neighbours adapt", () => {
    // C major with a written 4 on F4: the estimator must keep it and keep the line playable.
    const events = buildNotes(names("C4 D4 E4 F4/4 G4 A4 B4 C5"));
    const { fingers } = estimateFingering(events, "right");
    expect(fingers[3]).toBe(4);
    expect(fingers).not.toEqual([1, 2, 3, 1, 2, 3, 4, 5]);
    for (let i = 1; i < fingers.length; i++) expect(fingers[i]).not.toBe(fingers[i - 1]);
  });
  test("rests get null and tied continuations keep the finger", () => {
    const events = buildNotes(names("C4 r E4 G4"));
    const tieStart = { ...events[3]!, tie: "start" as const };
    const tieStop: NoteEvent = { ...events[3]!, id: "tied", onset: events[3]!.onset.add(new Fraction(1, 2)), tie: "stop" };
    const all = [events[0]!, events[1]!, events[2]!, tieStart, tieStop];
    const { fingers, costPerNote } = estimateFingering(all, "right");
    expect(fingers[1]).toBeNull();
    expect(fingers[4]).toBe(fingers[3]);
    expect(costPerNote[1]).toBe(0);
  });
  test("chords take fingers in pitch order: C major triad 1-3-5 right, 5-3-1 left (common practice)", () => {
    expect(estimateFingering(buildNotes(["C4+E4+G4"]), "right").fingers).toEqual([1, 3, 5]);
    expect(estimateFingering(buildNotes(["C3+E3+G3"]), "left").fingers).toEqual([5, 3, 1]);
    const seq = estimateFingering(buildNotes(["C4+E4+G4", "C4+F4+A4", "B3+D4+G4", "C4+E4+G4"]), "right").fingers;
    for (let k = 0; k < 4; k++) expect(seq[3 * k]!).toBeLessThan(seq[3 * k + 2]!);
  });
  test("cost per bar is the sum of the costs per note", () => {
    const events = buildNotes(names("C4 E4 G4 C5 E5 G5 C6 E6 C4 F4 A4 C5"), { perBar: 4 });
    const r = estimateFingering(events, "right");
    for (const bar of [0, 1, 2]) {
      const sum = events.reduce((acc, e, i) => acc + (e.measure === bar ? r.costPerNote[i]! : 0), 0);
      expect(r.costPerBar.get(bar)).toBeCloseTo(sum, 9);
    }
  });
  test("a wide leap costs more than a step", () => {
    const step = estimateFingering(buildNotes(names("C4 D4 C4 D4")), "right");
    const leap = estimateFingering(buildNotes(names("C4 E5 C4 E5")), "right");
    const total = (r: typeof step) => r.costPerNote.reduce((a, b) => a + b, 0);
    expect(total(leap)).toBeGreaterThan(total(step));
  });
  test("empty input and a lone note", () => {
    expect(estimateFingering([], "right").fingers).toEqual([]);
    expect(estimateFingering(buildNotes(["C4"]), "right").fingers).toHaveLength(1);
  });
});

describe("estimateFingering — hints", () => {
  // Common practice: C D E F G with the hand in one position is 1-2-3-4-5; a hint of 2 on C moves the hand.
  test("a hint that fits is followed; written fingerings still win", () => {
    const events = buildNotes(names("C4 D4 E4 F4 G4"));
    expect(estimateFingering(events, "right", { hints: [2, null, null, null, null] }).fingers[0]).toBe(2);
    expect(estimateFingering(events, "right", { hints: [1, 2, 3, 4, 5], costs: false }).fingers).toEqual([1, 2, 3, 4, 5]);
  });
  test("a chord's hints that cannot be played together (1 on the top note, 3 below) are ignored", () => {
    const t = new Fraction(0);
    const chord: NoteEvent[] = buildNotes(names("C4 E4 G4")).map((e, i) => ({ ...e, onset: t, chord: i > 0 }));
    const { fingers } = estimateFingering(chord, "right", { hints: [3, null, 1] });
    expect(fingers[0]! < fingers[1]! && fingers[1]! < fingers[2]!).toBe(true); // right-hand chord fingers rise with pitch
  });
});
