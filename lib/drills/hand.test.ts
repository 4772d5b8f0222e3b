import { describe, expect, test } from "vitest";
import {
  DEFAULT_PROFILE,
  OCTAVE_WIDTHS,
  PRACTICAL_ALLOWANCE_MM,
  isBlackKey,
  keyDistanceMm,
  pairReach,
  profileFromInches,
  profileInches,
  spanOf,
} from "./hand";

describe("keyDistanceMm", () => {
  test("tenth C4–E5 centre to centre is 212.3 mm (FACTS.md §1, derived: 9 × 165.1/7)", () => {
    expect(keyDistanceMm(60, 76)).toBeCloseTo(212.3, 1);
  });
  test("octave is 165.1 mm and a ninth 188.7 mm (FACTS.md §1, derived)", () => {
    expect(keyDistanceMm(60, 72)).toBeCloseTo(165.1, 6);
    expect(keyDistanceMm(48, 60)).toBeCloseTo(165.1, 6);
    expect(keyDistanceMm(60, 74)).toBeCloseTo(188.7, 1);
  });
  test("white-key pitch is 23.59 mm (FACTS.md §1, derived 165.1 / 7)", () => {
    expect(keyDistanceMm(64, 65)).toBeCloseTo(23.59, 2); // E–F, two whites side by side
    expect(keyDistanceMm(60, 62)).toBeCloseTo(23.59, 2); // C–D
  });
  test("black keys sit halfway between their white neighbours (model stated in hand.ts)", () => {
    expect(keyDistanceMm(60, 61)).toBeCloseTo(23.59 / 2, 2);
    expect(keyDistanceMm(61, 63)).toBeCloseTo(23.59, 2); // C♯–D♯
    expect(keyDistanceMm(63, 66)).toBeCloseTo((2 * 165.1) / 7, 6); // D♯–F♯ straddle E–F
  });
  test("is symmetric and scales with a narrower octave (DS 6.0 = 152.4 mm, FACTS.md §1)", () => {
    expect(keyDistanceMm(76, 60)).toBeCloseTo(keyDistanceMm(60, 76), 9);
    expect(keyDistanceMm(60, 72, 152.4)).toBeCloseTo(152.4, 6);
  });
  test("black keys: five per octave, C♯ D♯ F♯ G♯ A♯ (common practice)", () => {
    const blacks = Array.from({ length: 12 }, (_, i) => 60 + i).filter(isBlackKey);
    expect(blacks).toEqual([61, 63, 66, 68, 70]);
    expect(isBlackKey(21)).toBe(false); // A0, lowest key (FACTS.md §1)
  });
});

describe("hand profiles", () => {
  test("octave widths list the standard 6.5 in and the DS 6.0/5.5/5.1 in sizes (FACTS.md §1, PASK)", () => {
    expect(OCTAVE_WIDTHS.map((w) => w.inches)).toEqual([6.5, 6.0, 5.5, 5.1]);
    for (const w of OCTAVE_WIDTHS) expect(w.mm).toBeCloseTo(w.inches * 25.4, 6);
  });
  test("profileFromInches round-trips and keeps the keyboard", () => {
    const p = profileFromInches(8.2, 152.4);
    expect(profileInches(p)).toBeCloseTo(8.2, 9);
    expect(p.octaveMm).toBe(152.4);
    expect(p.spanMm).toBeCloseTo(8.2 * 25.4 - PRACTICAL_ALLOWANCE_MM, 9);
  });
  test("default profile is the female adult mean 7.9 in (FACTS.md §4): ninth reachable, tenth not", () => {
    expect(profileInches(DEFAULT_PROFILE)).toBeCloseTo(7.9, 9);
    const ninth = spanOf([{ midi: 60 }, { midi: 74 }], null, DEFAULT_PROFILE);
    const tenth = spanOf([{ midi: 60 }, { midi: 76 }], null, DEFAULT_PROFILE);
    const octave = spanOf([{ midi: 60 }, { midi: 72 }], null, DEFAULT_PROFILE);
    expect(octave.overComfortable).toBe(false);
    expect(ninth.overPractical).toBe(false);
    expect(tenth.overPractical).toBe(true);
  });
});

describe("spanOf", () => {
  const tenthChord = [{ midi: 60 }, { midi: 67 }, { midi: 76 }];
  test("an 8.5-in hand reaches a tenth (PASK benchmark, FACTS.md §4)", () => {
    const r = spanOf(tenthChord, null, profileFromInches(8.5));
    expect(r.semitones).toBe(16);
    expect(r.mm).toBeCloseTo(212.3, 1);
    expect(r.overPractical).toBe(false);
  });
  test("a small hand (8 in or less, Wristen et al. 2005 / FACTS.md §4) does not reach a tenth", () => {
    expect(spanOf(tenthChord, null, profileFromInches(8.0)).overPractical).toBe(true);
    expect(spanOf(tenthChord, null, profileFromInches(7.5)).overPractical).toBe(true);
  });
  test("a narrower keyboard (DS 5.5) brings the tenth within a small hand (FACTS.md §1)", () => {
    expect(spanOf(tenthChord, null, profileFromInches(8.0, 139.7)).overPractical).toBe(false);
  });
  test("reads NoteEvent-like objects and skips rests", () => {
    const r = spanOf([{ pitch: { midi: 50 } }, { pitch: null }, { pitch: { midi: 62 } }], null, DEFAULT_PROFILE);
    expect(r.semitones).toBe(12);
    expect(spanOf([{ pitch: null }], null, DEFAULT_PROFILE).mm).toBe(0);
  });
  test("inner finger pairs reach less than 1–5 (Parncutt et al. 1997 MaxPrac, FACTS.md §5)", () => {
    expect(pairReach(2, 3)).toBeCloseTo(5 / 15, 9);
    const sixth = [{ midi: 60 }, { midi: 69 }];
    expect(spanOf(sixth, [1, 5], DEFAULT_PROFILE).overComfortable).toBe(false);
    expect(spanOf(sixth, [2, 3], DEFAULT_PROFILE).overPractical).toBe(true);
  });
});
