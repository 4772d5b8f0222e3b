import { describe, expect, test } from "vitest";
import { mulberry32, pick, randomInt } from "./rng";

describe("rng", () => {
  test("the same seed repeats the same sequence, another seed differs", () => {
    const a = mulberry32(42);
    const b = mulberry32(42);
    const c = mulberry32(43);
    const seqA = [a(), a(), a()];
    expect([b(), b(), b()]).toEqual(seqA);
    expect([c(), c(), c()]).not.toEqual(seqA);
  });

  test("values stay in [0, 1) and spread over the range", () => {
    const rng = mulberry32(1);
    const values = Array.from({ length: 2000 }, () => rng());
    expect(values.every((v) => v >= 0 && v < 1)).toBe(true);
    const mean = values.reduce((s, v) => s + v, 0) / values.length;
    expect(mean).toBeGreaterThan(0.45);
    expect(mean).toBeLessThan(0.55);
  });

  test("randomInt covers both ends; pick stays inside the list", () => {
    const rng = mulberry32(9);
    const seen = new Set(Array.from({ length: 500 }, () => randomInt(rng, 1, 3)));
    expect([...seen].sort()).toEqual([1, 2, 3]);
    expect(["x", "y"]).toContain(pick(rng, ["x", "y"]));
    expect(() => pick(rng, [])).toThrow(RangeError);
  });
});
