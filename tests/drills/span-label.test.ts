import { describe, expect, test } from "vitest";
import { spanParts } from "../../components/drills/span-label";

describe("span badge parts", () => {
  test("a drill of single notes in every hand gets no badge", () => {
    expect(spanParts({ right: { semitones: 0, mm: 0 } })).toEqual([]);
    expect(spanParts({ right: { semitones: 0, mm: 0 }, left: { semitones: 0, mm: 0 } })).toEqual([]);
    expect(spanParts({})).toEqual([]);
    expect(spanParts(undefined)).toEqual([]);
  });

  test("a stretching hand shows semitones and rounded millimetres; a one-note hand beside it reads single notes", () => {
    expect(spanParts({ right: { semitones: 12, mm: 164.6 }, left: { semitones: 0, mm: 0 } })).toEqual(["RH 12 st · 165 mm", "LH single notes"]);
    expect(spanParts({ left: { semitones: 7, mm: 95.2 } })).toEqual(["LH 7 st · 95 mm"]);
  });
});
