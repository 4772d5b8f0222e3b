import { describe, expect, test } from "vitest";
import { barAtTime, cursorX, hitTest, unitToPx, type BarBox, type BarTiming } from "@/components/score/score-layout";

// Two systems: bars 0–1 on the first (y 100 / 180), bar 2 on the second (y 400 / 480).
const boxes: BarBox[] = [
  { bar: 0, staff: 0, x: 50, y: 100, w: 200, h: 40 },
  { bar: 0, staff: 1, x: 50, y: 180, w: 200, h: 40 },
  { bar: 1, staff: 0, x: 250, y: 100, w: 150, h: 40 },
  { bar: 1, staff: 1, x: 250, y: 180, w: 150, h: 40 },
  { bar: 2, staff: 0, x: 50, y: 400, w: 300, h: 40 },
  { bar: 2, staff: 1, x: 50, y: 480, w: 300, h: 40 },
];

describe("score-layout", () => {
  test("OSMD's unit is 10 px times the zoom (STACK.md)", () => {
    expect(unitToPx(1)).toBe(10);
    expect(unitToPx(1.5)).toBe(15);
  });

  test.each([
    [60, 120, { bar: 0, staff: 0 }],
    [60, 200, { bar: 0, staff: 1 }],
    [300, 95, { bar: 1, staff: 0 }],
    [300, 228, { bar: 1, staff: 1 }],
    [100, 470, { bar: 2, staff: 1 }],
  ])("a point at (%d, %d) hits %o", (x, y, cell) => {
    expect(hitTest(boxes, x, y, 12)).toMatchObject(cell);
  });

  test("misses outside the bars and beyond the reach", () => {
    expect(hitTest(boxes, 20, 120, 12)).toBeNull();
    expect(hitTest(boxes, 100, 300, 12)).toBeNull();
    // A drag uses unlimited reach and lands on the nearest system.
    expect(hitTest(boxes, 100, 330, Infinity)).toMatchObject({ bar: 2, staff: 0 });
  });

  const bars: BarTiming[] = [
    { bar: 0, number: 1, startQ: 0, lengthQ: 4, entries: [{ q: 0, x: 70 }, { q: 2, x: 150 }] },
    { bar: 1, number: 2, startQ: 4, lengthQ: 4, entries: [] },
  ];

  test("finds the bar sounding at a time", () => {
    expect(barAtTime(bars, 0)?.bar).toBe(0);
    expect(barAtTime(bars, 3.99)?.bar).toBe(0);
    expect(barAtTime(bars, 4)?.bar).toBe(1);
    expect(barAtTime(bars, 8)).toBeNull();
  });

  test("the cursor moves between notes in proportion to time", () => {
    expect(cursorX(bars[0], 0, 250)).toBe(70);
    expect(cursorX(bars[0], 1, 250)).toBe(110);
    expect(cursorX(bars[0], 2, 250)).toBe(150);
    expect(cursorX(bars[0], 3, 250)).toBe(200);
    expect(cursorX(bars[1], 5, 400)).toBe(400);
  });
});
