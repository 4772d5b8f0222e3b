// Handouts and engraved drills are kept by content: the second request for the same handout is
// byte-for-byte the first and costs no engraving; a copy for another student reuses every drill.
import { describe, expect, test } from "vitest";
import { engravingCacheStats } from "@/lib/handout/engraving-cache";
import { handoutCacheStats, handoutPdf } from "@/lib/jobs/render-cache";
import { eightDrillSheet } from "./sample-sheet";

describe("handout cache", () => {
  test("same input → same bytes from the cache, far faster; another student's copy engraves nothing new", async () => {
    const input = eightDrillSheet("a4");
    const t0 = performance.now();
    const first = await handoutPdf(input);
    const cold = performance.now() - t0;
    const svgAfterFirst = engravingCacheStats();
    const t1 = performance.now();
    const second = await handoutPdf(structuredClone(input));
    const warm = performance.now() - t1;
    expect(Buffer.from(second).equals(Buffer.from(first))).toBe(true);
    expect(warm).toBeLessThan(Math.max(50, cold / 10));
    expect(handoutCacheStats()).toMatchObject({ hits: 1, misses: 1 });

    const copy = await handoutPdf({ ...input, studentName: "Wren Example" });
    expect(Buffer.from(copy).subarray(0, 5).toString()).toBe("%PDF-");
    expect(handoutCacheStats().misses).toBe(2);
    // Every drill of the copy came from the engraving cache.
    expect(engravingCacheStats().misses).toBe(svgAfterFirst.misses);
    expect(engravingCacheStats().hits).toBeGreaterThanOrEqual(svgAfterFirst.hits + input.drills.length);
  }, 120_000);
});
