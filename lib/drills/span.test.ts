import Fraction from "fraction.js";
import { describe, expect, test } from "vitest";
import type { NoteEvent, TieFlag } from "../score/types";
import { DEFAULT_PROFILE, keyDistanceMm, profileFromInches, spanLimits } from "./hand";
import { measureSpan } from "./span";
import { pitchFromName } from "./spell";

let ids = 0;
/** One right-hand note: name, onset and duration in quarters, optional tie and finger. */
function note(name: string, onset: number, duration: number, tie: TieFlag = "none", finger?: number): NoteEvent {
  return {
    id: `s${++ids}`, part: "P1", staff: 1, voice: "1", measure: 0,
    onset: new Fraction(onset), duration: new Fraction(duration),
    written: { type: "quarter", dots: 0, tuplet: null }, pitch: pitchFromName(name), chord: false, tie,
    ...(finger ? { fingering: [{ finger }] } : {}),
  } as NoteEvent;
}

describe("measureSpan over notes that sound together", () => {
  test("a held C4 with E5 struck later while it sounds is one stretch of a tenth", () => {
    // Held-tone shape: C4 held a whole bar; D4 and E4 pass; E5 struck on beat 4 while C4 still sounds.
    const events = [note("C4", 0, 4), note("D4", 1, 1), note("E4", 2, 1), note("E5", 3, 1)];
    const r = measureSpan(events, DEFAULT_PROFILE)!;
    // FACTS.md §1: white keys are octave/7 apart; C4–E5 spans 9 white steps = 9 × 165.1 / 7 ≈ 212.3 mm.
    expect(r.semitones).toBe(16);
    expect(r.mm).toBeCloseTo((9 * 165.1) / 7, 1);
    expect(r.mm).toBeCloseTo(keyDistanceMm(60, 76), 1);
    // Over the default hand's comfortable limit (spanLimits: the profile's spanMm).
    expect(r.mm).toBeGreaterThan(spanLimits(DEFAULT_PROFILE).comfortable);
    expect(r.overComfortable).toBe(true);
  });

  test("the same notes struck one after another (no overlap) measure no stretch", () => {
    // C4 ends exactly where E5 starts: legato, not held together.
    const events = [note("C4", 0, 3), note("E5", 3, 1)];
    const r = measureSpan(events, DEFAULT_PROFILE)!;
    expect(r.semitones).toBe(0);
    expect(r.overComfortable).toBe(false);
  });

  test("a tied held note counts for its whole length (ties merged)", () => {
    // C4 tied over the bar line (2 + 2 quarters), E5 struck at beat 3 under the tie's second half.
    const events = [note("C4", 0, 2, "start"), note("C4", 2, 2, "stop"), note("E5", 3, 1)];
    const r = measureSpan(events, DEFAULT_PROFILE)!;
    expect(r.semitones).toBe(16);
    expect(r.overComfortable).toBe(true);
  });

  test("an octave held under a passing note stays comfortable for the default hand", () => {
    // FACTS.md §1: an octave is 165.1 mm, under the default comfortable 177.1 mm (hand.ts).
    const events = [note("C4", 0, 2), note("G4", 1, 1), note("C5", 1.5, 0.5)];
    const r = measureSpan(events, DEFAULT_PROFILE)!;
    expect(r.semitones).toBe(12);
    expect(r.mm).toBeCloseTo(165.1, 1);
    expect(r.overComfortable).toBe(false);
  });

  test("a tenth is within a 8.5 in hand's practical reach but over its comfortable span", () => {
    // FACTS.md §4: PASK's benchmark — an 8.5 in span is needed to play a tenth.
    const r = measureSpan([note("C4", 0, 4), note("E5", 2, 1)], profileFromInches(8.5))!;
    expect(r.overComfortable).toBe(true);
    expect(r.overPractical).toBe(false);
  });

  test("rests and single notes give a zero stretch; no notes gives null", () => {
    expect(measureSpan([note("C4", 0, 1)], DEFAULT_PROFILE)?.semitones).toBe(0);
    expect(measureSpan([], DEFAULT_PROFILE)).toBeNull();
  });
});
