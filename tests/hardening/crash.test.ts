/**
 * Crash safety, CI size: five SIGKILLs of the production server during concurrent writes (save
 * sheet, assign, log practice); after each restart the database is intact, every acknowledged write
 * is there and nothing is half saved. `npm run crash` runs the full 50.
 */
import { describe, expect, test } from "vitest";
import { crashTest } from "../../scripts/crash-test";

describe("crash safety", () => {
  test("five kills at random moments lose no acknowledged write and leave nothing half saved", async () => {
    const lines: string[] = [];
    const acks = await crashTest(5, (l) => lines.push(l));
    expect(lines).toHaveLength(5);
    // The load really wrote through every path before the kills.
    expect(acks.sheets.length).toBeGreaterThan(0);
    expect(acks.assignmentBatches.length).toBeGreaterThan(0);
    expect(acks.practice.length).toBeGreaterThan(0);
  });
});
