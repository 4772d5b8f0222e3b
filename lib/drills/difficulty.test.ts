import { describe, expect, test } from "vitest";
import { buildScore, type NoteSpec } from "../score/test-builders";
import { difficultyMap, hardestBars } from "./difficulty";
import { intervalName } from "./difficulty-bars";
import { parseNoteName } from "./note-builder";
import { profileFromInches } from "./hand";

/** Eight eighth notes per 4/4 bar from note names (chords as "C4+E4"), on one staff. */
function bar(bar: number, names: string[], staff = 1): NoteSpec[] {
  return names.flatMap((n, k) => n.split("+").map((p) => ({ pitch: p, onset: bar * 4 + k / 2, duration: 0.5, staff })));
}
const scale = ["C4", "D4", "E4", "F4", "G4", "A4", "B4", "C5"];
const tenths = ["C4+E5", "D4+F5", "C4+E5", "D4+F5", "C4+E5", "D4+F5", "C4+E5", "D4+F5"];

describe("difficultyMap", () => {
  const score = buildScore({
    bars: 4,
    notes: [...bar(0, scale), ...bar(1, tenths), ...bar(3, scale.slice().reverse()), ...bar(0, ["C3", "G3", "E3", "G3", "C3", "G3", "E3", "G3"], 2)],
  });
  const map = difficultyMap(score);
  test("one value per bar and hand, all within 0–1", () => {
    expect(map.right).toHaveLength(4);
    expect(map.left).toHaveLength(4);
    for (const v of [...map.right, ...map.left]) {
      expect(v).toBeGreaterThanOrEqual(0);
      expect(v).toBeLessThanOrEqual(1);
    }
  });
  test("empty bars score 0 and a bar of tenths scores above a bar of scale", () => {
    expect(map.right[2]).toBe(0);
    expect(map.left[1]).toBe(0);
    expect(map.right[1]!).toBeGreaterThan(map.right[0]!);
    expect(map.right[1]!).toBeGreaterThan(0.9); // tenths are over the default profile's practical limit
    expect(map.right[0]!).toBeLessThan(0.5); // plain scale work is easy
  });
  test("a bigger hand finds the tenth bar easier (PASK 8.5-in benchmark, FACTS.md §4)", () => {
    const big = difficultyMap(score, { profile: profileFromInches(9.5) });
    expect(big.right[1]!).toBeLessThan(map.right[1]!);
  });
});

describe("hardestBars", () => {
  const score = buildScore({
    bars: 3,
    notes: [
      ...bar(0, scale),
      ...bar(1, tenths),
      // semitone trills: busy but narrow
      ...bar(2, ["C#4", "D4", "C#4", "D4", "D#4", "E4", "D#4", "E4"]),
    ],
  });
  test("the tenth bar comes first, with the reason in plain words (212.3 mm, FACTS.md §1)", () => {
    const top = hardestBars(score, 2);
    expect(top).toHaveLength(2);
    expect(top[0]!.measure).toBe(1);
    expect(top[0]!.number).toBe("2");
    expect(top[0]!.hand).toBe("right");
    expect(top[0]!.reasons[0]).toBe("stretch of a tenth (212 mm)");
    expect(top[0]!.score).toBeGreaterThanOrEqual(top[1]!.score);
  });
  test("n limits the list and every entry has a reason", () => {
    expect(hardestBars(score, 0)).toEqual([]);
    for (const h of hardestBars(score, 10)) expect(h.reasons.length).toBeGreaterThan(0);
  });
  test("position changes are named for a leaping line", () => {
    const leaps = buildScore({ bars: 1, notes: bar(0, ["C4", "C5", "D4", "D5", "E4", "E5", "F4", "F5"]) });
    const [top] = hardestBars(leaps, 1);
    expect(top!.reasons).toContain("many position changes");
  });
  test("thumb on black keys is named when the written fingering puts it there", () => {
    const notes = bar(0, ["E4", "F#4", "G4", "F#4", "E4", "F#4", "G4", "F#4"]).map((n, i) => ({
      ...n, extra: { fingering: [{ finger: i % 2 === 1 ? 1 : 2 }] },
    }));
    const [top] = hardestBars(buildScore({ bars: 1, notes }), 1);
    expect(top!.reasons).toContain("thumb on black keys");
  });
});

describe("intervalName (staff steps, common practice)", () => {
  test.each([
    ["C4", "E5", "a tenth"],
    ["C4", "C5", "an octave"],
    ["A4", "C6", "a tenth"],
    ["F3", "F2", "an octave"],
    ["C4", "F5", "an eleventh"],
  ])("%s–%s is %s", (a, b, name) => {
    expect(intervalName(parseNoteName(a), parseNoteName(b))).toBe(name);
  });
});
