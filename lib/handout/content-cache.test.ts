import { describe, expect, test } from "vitest";
import { contentCache, contentKey, stableJson } from "./content-cache";

describe("contentCache", () => {
  test("equal content (keys in any order) is made once; other content is made again", async () => {
    let made = 0;
    const cache = contentCache("t", async (i: { a: number; b: string }) => ({ made: ++made, sum: i.a }), { maxEntries: 4, maxBytes: 1000, weigh: () => 1 });
    const first = await cache.get({ a: 1, b: "x" });
    expect(await cache.get({ b: "x", a: 1 })).toBe(first);
    expect((await cache.get({ a: 2, b: "x" })).made).toBe(2);
    expect(cache.stats()).toMatchObject({ hits: 1, misses: 2, entries: 2 });
  });

  test("concurrent requests for one key share a single run; a failure is not kept", async () => {
    let runs = 0;
    let fail = true;
    const cache = contentCache("t", async (i: number) => {
      runs++;
      await new Promise((r) => setTimeout(r, 20));
      if (fail) throw new Error("boom");
      return i * 2;
    }, { maxEntries: 4, maxBytes: 1000, weigh: () => 1 });
    const all = await Promise.allSettled([cache.get(1), cache.get(1), cache.get(1)]);
    expect(all.every((r) => r.status === "rejected")).toBe(true);
    expect(runs).toBe(1);
    fail = false;
    expect(await cache.get(1)).toBe(2);
    expect(runs).toBe(2);
  });

  test("the key hashes the stable JSON of the input (dates as ISO text)", () => {
    expect(stableJson({ b: [1, { d: 1, c: 2 }], a: new Date(0) })).toBe('{"a":"1970-01-01T00:00:00.000Z","b":[1,{"c":2,"d":1}]}');
    expect(contentKey("k", { x: 1, y: 2 })).toBe(contentKey("k", { y: 2, x: 1 }));
    expect(contentKey("k", { x: 1 })).not.toBe(contentKey("j", { x: 1 }));
  });
});
