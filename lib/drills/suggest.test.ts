import { describe, expect, test } from "vitest";
import { SUGGESTIONS, suggestFamilies } from "./suggest";
import { PROBLEM_TAGS } from "./types";

describe("suggestFamilies", () => {
  test("every problem tag has suggestions", () => {
    for (const tag of PROBLEM_TAGS) expect(SUGGESTIONS[tag].length).toBeGreaterThan(0);
  });
  test("one tag keeps its table order; no tags, no suggestions", () => {
    expect(suggestFamilies(["voicing"])).toEqual([...SUGGESTIONS.voicing]);
    expect(suggestFamilies([])).toEqual([]);
  });
  test("a family named under two tags ranks above one named under only one", () => {
    const ranked = suggestFamilies(["release", "leap"]);
    expect(ranked[0]).toBe("lift-rests");
    expect(ranked.indexOf("stops")).toBeLessThan(ranked.indexOf("octave-shift"));
    expect(new Set(ranked).size).toBe(ranked.length);
  });
});
