import { describe, expect, test } from "vitest";
import {
  describeSelection,
  handAfterPointing,
  handOfStaff,
  isHandStaff,
  moveCell,
  sameSelection,
  spanSelection,
  staffInHand,
} from "@/components/score/bar-selection";

describe("bar-selection", () => {
  test("a span is ordered whichever way the pointer moved", () => {
    expect(spanSelection(5, 2, "left")).toEqual({ from: 2, to: 5, hand: "left" });
    expect(spanSelection(2, 5, "right")).toEqual({ from: 2, to: 5, hand: "right" });
  });

  test("staff 1 of a grand staff is the right hand, staff 2 the left (common practice)", () => {
    expect([handOfStaff(0), handOfStaff(1)]).toEqual(["right", "left"]);
    expect(staffInHand(1, "both")).toBe(true);
    expect(staffInHand(1, "right")).toBe(false);
  });

  test("pointing at a staff picks its hand unless both hands were chosen", () => {
    expect(handAfterPointing("right", 1)).toBe("left");
    expect(handAfterPointing(undefined, 0)).toBe("right");
    expect(handAfterPointing("both", 1)).toBe("both");
  });

  test.each([
    ["ArrowRight", { bar: 3, staff: 0 }, { bar: 4, staff: 0 }],
    ["ArrowLeft", { bar: 0, staff: 0 }, { bar: 0, staff: 0 }],
    ["ArrowRight", { bar: 9, staff: 1 }, { bar: 9, staff: 1 }],
    ["ArrowDown", { bar: 3, staff: 0 }, { bar: 3, staff: 1 }],
    ["ArrowDown", { bar: 3, staff: 1 }, { bar: 3, staff: 1 }],
    ["ArrowUp", { bar: 3, staff: 1 }, { bar: 3, staff: 0 }],
    ["Home", { bar: 6, staff: 1 }, { bar: 0, staff: 1 }],
    ["End", { bar: 2, staff: 0 }, { bar: 9, staff: 0 }],
  ] as const)("%s from %o moves to %o within 10 bars × 2 staves", (key, from, to) => {
    expect(moveCell(from, key, 10, 2)).toEqual(to);
  });

  test("a single staff keeps the focus on it", () => {
    expect(moveCell({ bar: 0, staff: 0 }, "ArrowDown", 4, 1)).toEqual({ bar: 0, staff: 0 });
  });

  test("announces 1-based or printed bar numbers with the hand", () => {
    expect(describeSelection({ from: 2, to: 3, hand: "right" })).toBe("Bars 3–4 selected, right hand");
    expect(describeSelection({ from: 0, to: 0, hand: "both" }, [0, 1, 2])).toBe("Bar 0 selected, both hands");
    expect(describeSelection({ from: 1, to: 2, hand: "left" }, [0, 1, 2])).toBe("Bars 1–2 selected, left hand");
    expect(describeSelection(null)).toBe("No bars selected");
  });

  test("compares selections by value", () => {
    expect(sameSelection({ from: 1, to: 2, hand: "left" }, { from: 1, to: 2, hand: "left" })).toBe(true);
    expect(sameSelection({ from: 1, to: 2, hand: "left" }, { from: 1, to: 2, hand: "both" })).toBe(false);
    expect(sameSelection(null, undefined)).toBe(true);
  });
});

describe("staff map of a song (voice + piano)", () => {
  // Engraved staves: 0 = voice, 1 = piano upper (right hand), 2 = piano lower (left hand).
  const hands = [null, "right", "left"] as const;
  test("only the piano's staves are hands; the voice staff is never selected", () => {
    expect(isHandStaff(0, hands)).toBe(false);
    expect(handOfStaff(1, hands)).toBe("right");
    expect(handOfStaff(2, hands)).toBe("left");
    expect(staffInHand(0, "both", hands)).toBe(false);
    expect(staffInHand(0, "right", hands)).toBe(false);
    expect(staffInHand(2, "both", hands)).toBe(true);
    expect(handAfterPointing("right", 2, hands)).toBe("left");
  });
});
