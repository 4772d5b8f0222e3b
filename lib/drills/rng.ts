/**
 * Seedable random numbers for drill generators, so the same seed gives the same drills.
 */
import type { Rng } from "./types";

/**
 * A mulberry32 generator: a 32-bit state, values in [0, 1).
 *
 * @example
 * const rng = mulberry32(7);
 * const a = rng(); // same value every time the seed is 7
 */
export function mulberry32(seed: number): Rng {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/**
 * A whole number in [min, max], both ends included.
 *
 * @example
 * randomInt(mulberry32(1), 1, 6); // a die roll
 */
export function randomInt(rng: Rng, min: number, max: number): number {
  return min + Math.floor(rng() * (max - min + 1));
}

/**
 * One element of a non-empty list.
 *
 * @example
 * pick(mulberry32(3), ["a", "b", "c"]);
 */
export function pick<T>(rng: Rng, items: readonly T[]): T {
  if (items.length === 0) throw new RangeError("pick needs at least one item");
  return items[Math.min(items.length - 1, Math.floor(rng() * items.length))];
}
