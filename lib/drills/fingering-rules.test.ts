/**
 * Each of the twelve rules scored on a constructed example, points worked out by hand from the rule's
 * definition. Source of every definition and span value: Parncutt, Sloboda, Clarke, Raekallio & Desain
 * (1997), rules and finger-pair table as quoted in FACTS.md §5; Jacobs (2001) changes as listed there.
 * MIDI: C4 = 60 (FACTS.md §2).
 */
import { describe, expect, test } from "vitest";
import { FINGER_SPANS, handInterval, noteCosts, pairCosts, pairSpan, totalCost, trioCosts } from "./fingering-rules";

const C4 = 60, Cs4 = 61, D4 = 62, Ds4 = 63, E4 = 64, F4 = 65, Fs4 = 66, G4 = 67, Gs4 = 68, A4 = 69, B3 = 59;
const C3 = 48, E3 = 52, G3 = 55, A3 = 57;

describe("span table (FACTS.md §5)", () => {
  test("rows as printed; either finger order reads the same row", () => {
    expect(FINGER_SPANS["1-2"]).toEqual({ minPrac: -5, minComf: -3, minRel: 1, maxRel: 5, maxComf: 8, maxPrac: 10 });
    expect(FINGER_SPANS["3-4"]).toEqual({ minPrac: 1, minComf: 1, minRel: 1, maxRel: 2, maxComf: 2, maxPrac: 4 });
    expect(pairSpan(5, 1)).toBe(FINGER_SPANS["1-5"]);
  });
  test("the left hand mirrors the right", () => {
    expect(handInterval(C4, E4, "left", "parncutt")).toBe(-4);
    expect(handInterval(C4, E4, "right", "jacobs")).toBeCloseTo((2 * 12) / 7, 9); // two white steps
  });
});

describe("the twelve rules (Parncutt et al. 1997 via FACTS.md §5)", () => {
  test("1 Stretch: 2 points per semitone beyond MaxComf — C4(1)→E5(5): 16 − 13 = 3 → 6", () => {
    expect(pairCosts(C4, 1, 76, 5, "right", "parncutt").stretch).toBe(6);
    // below MinComf: 2-3 on a repeated key, d = 0 < MinComf 1 → 2
    expect(pairCosts(C4, 2, C4, 3, "right", "parncutt").stretch).toBe(2);
  });
  test("2 Small-Span: per semitone below MinRel, 2 without the thumb, 1 with it", () => {
    // C4(2)→D4(4): d = 2, MinRel(2-4) = 3 → 1 semitone × 2 = 2
    expect(pairCosts(C4, 2, D4, 4, "right", "parncutt").smallSpan).toBe(2);
    // C4(1)→C♯4(3): d = 1, MinRel(1-3) = 3 → 2 semitones × 1 = 2
    expect(pairCosts(C4, 1, Cs4, 3, "right", "parncutt").smallSpan).toBe(2);
  });
  test("3 Large-Span: per semitone above MaxRel, 2 without the thumb, 1 with it; Jacobs 1 for all", () => {
    // C4(2)→A4(5): d = 9, MaxRel(2-5) = 6 → 3 × 2 = 6 (and Stretch: 9 − 8 = 1 → 2)
    const c = pairCosts(C4, 2, A4, 5, "right", "parncutt");
    expect(c.largeSpan).toBe(6);
    expect(c.stretch).toBe(2);
    expect(pairCosts(C4, 2, A4, 5, "right", "jacobs").largeSpan).toBeGreaterThan(0);
    // Jacobs measures physically: C4–A4 = 5 white steps = 5 × 12/7 = 8.571 semitone units → (8.571 − 6) × 1
    expect(pairCosts(C4, 2, A4, 5, "right", "jacobs").largeSpan).toBeCloseTo((5 * 12) / 7 - 6, 9);
    // C4(1)→A4(2): d = 9, MaxRel(1-2) = 5 → 4 × 1 = 4
    expect(pairCosts(C4, 1, A4, 2, "right", "parncutt").largeSpan).toBe(4);
  });
  test("4 Position-Change-Count: 1 for a half change, 2 for a full change", () => {
    // C4(1) G4(3) E5(5): notes 1–3 span 16 > MaxComf(1-5) 13; note 2 not on the thumb → half change
    expect(trioCosts(C4, 1, G4, 3, 76, 5, "right", "parncutt").positionChangeCount).toBe(1);
    // B3(3) C4(1) F4(4): 3→4 span F4 − B3 = 6 > MaxPrac(3-4) 4, thumb on note 2, C4 between → full
    expect(trioCosts(B3, 3, C4, 1, F4, 4, "right", "parncutt").positionChangeCount).toBe(2);
    // C4(1) D4(2) E4(3): 4 ≤ MaxComf(1-3) 10 → no change
    expect(trioCosts(C4, 1, D4, 2, E4, 3, "right", "parncutt").positionChangeCount).toBe(0);
  });
  test("5 Position-Change-Size: semitones outside MinComf..MaxComf", () => {
    expect(trioCosts(C4, 1, G4, 3, 76, 5, "right", "parncutt").positionChangeSize).toBe(3); // 16 − 13
    expect(trioCosts(B3, 3, C4, 1, F4, 4, "right", "parncutt").positionChangeSize).toBe(4); // 6 − 2
    // E4(2) C4(1) D4(3): 2→3 interval D4 − E4 = −2 < MinComf 1 → 3; thumb not between → half change
    const below = trioCosts(E4, 2, C4, 1, D4, 3, "right", "parncutt");
    expect(below.positionChangeSize).toBe(3);
    expect(below.positionChangeCount).toBe(1);
  });
  test("6 Weak-Finger: 1 point for finger 4 or 5 (Jacobs: 4 only)", () => {
    expect(noteCosts(C4, 4, null, null, "parncutt").weakFinger).toBe(1);
    expect(noteCosts(C4, 5, null, null, "parncutt").weakFinger).toBe(1);
    expect(noteCosts(C4, 3, null, null, "parncutt").weakFinger).toBe(0);
    expect(noteCosts(C4, 5, null, null, "jacobs").weakFinger).toBe(0);
    expect(noteCosts(C4, 4, null, null, "jacobs").weakFinger).toBe(1);
  });
  test("7 Three-Four-Five: fingers 3, 4, 5 consecutive in any order (dropped by Jacobs)", () => {
    expect(trioCosts(C4, 3, E4, 5, D4, 4, "right", "parncutt").threeFourFive).toBe(1);
    expect(trioCosts(C4, 3, D4, 4, C4, 3, "right", "parncutt").threeFourFive).toBe(0);
    expect(trioCosts(C4, 3, E4, 5, D4, 4, "right", "jacobs").threeFourFive).toBe(0);
  });
  test("8 Three-to-Four: finger 3 immediately followed by 4", () => {
    expect(pairCosts(E4, 3, F4, 4, "right", "parncutt").threeToFour).toBe(1);
    expect(pairCosts(F4, 4, E4, 3, "right", "parncutt").threeToFour).toBe(0);
  });
  test("9 Four-on-Black: 3 and 4 consecutive, 3 on white and 4 on black", () => {
    expect(pairCosts(E4, 3, Fs4, 4, "right", "parncutt").fourOnBlack).toBe(1);
    expect(pairCosts(Fs4, 4, E4, 3, "right", "parncutt").fourOnBlack).toBe(1);
    expect(pairCosts(Ds4, 3, E4, 4, "right", "parncutt").fourOnBlack).toBe(0);
  });
  test("10 Thumb-on-Black: 1, plus 2 for a white key before, plus 2 for a white key after", () => {
    expect(noteCosts(Cs4, 1, C4, D4, "parncutt").thumbOnBlack).toBe(5);
    expect(noteCosts(Cs4, 1, Ds4, null, "parncutt").thumbOnBlack).toBe(1);
    expect(noteCosts(Cs4, 1, Ds4, D4, "parncutt").thumbOnBlack).toBe(3);
    expect(noteCosts(C4, 1, Cs4, Ds4, "parncutt").thumbOnBlack).toBe(0);
  });
  test("11 Five-on-Black: 2 for a white key before, 2 more for a white key after", () => {
    expect(noteCosts(Fs4, 5, E4, G4, "parncutt").fiveOnBlack).toBe(4);
    expect(noteCosts(Fs4, 5, Ds4, Gs4, "parncutt").fiveOnBlack).toBe(0);
    expect(noteCosts(Fs4, 5, E4, Gs4, "parncutt").fiveOnBlack).toBe(2);
  });
  test("12 Thumb-Passing: 1 on the same level, 3 for a white finger key and a black thumb key", () => {
    expect(pairCosts(E4, 3, F4, 1, "right", "parncutt").thumbPassing).toBe(1); // white → white
    expect(pairCosts(C4, 2, Cs4, 1, "right", "parncutt").thumbPassing).toBe(3); // finger white, thumb black
    expect(pairCosts(Ds4, 3, E4, 1, "right", "parncutt").thumbPassing).toBe(0); // finger black, thumb white
    expect(pairCosts(C4, 1, D4, 2, "right", "parncutt").thumbPassing).toBe(0); // no pass
    expect(pairCosts(F4, 1, E4, 3, "right", "parncutt").thumbPassing).toBe(1); // 3 over the thumb, descending
    expect(pairCosts(G3, 1, A3, 3, "left", "parncutt").thumbPassing).toBe(1); // left hand, 3 over, ascending
  });
  test("left hand C3(5)→E3(4) costs what right hand C4(4)→E4(5) costs (mirror)", () => {
    const left = totalCost(pairCosts(C3, 5, E3, 4, "left", "parncutt"));
    const right = totalCost(pairCosts(C4, 4, E4, 5, "right", "parncutt"));
    expect(left).toBe(right);
    expect(left).toBe(2 + 4); // Stretch 2 × (4 − 3), Large-Span 2 × (4 − 2)
  });
});
