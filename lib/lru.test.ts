import { describe, expect, test } from "vitest";
import { Lru } from "./lru";

describe("Lru", () => {
  test("evicts the least recently used entry beyond maxEntries", () => {
    const lru = new Lru<string, number>({ maxEntries: 2 });
    lru.set("a", 1);
    lru.set("b", 2);
    expect(lru.get("a")).toBe(1); // a is now the newest
    lru.set("c", 3);
    expect(lru.get("b")).toBeUndefined();
    expect(lru.get("a")).toBe(1);
    expect(lru.get("c")).toBe(3);
    expect(lru.size).toBe(2);
  });

  test("keeps the summed weight under maxWeight and refuses a value heavier than the bound", () => {
    const lru = new Lru<string, string>({ maxEntries: 100, maxWeight: 10, weigh: (v) => v.length });
    lru.set("a", "xxxx");
    lru.set("b", "yyyy");
    lru.set("c", "zzzz");
    expect(lru.weight).toBeLessThanOrEqual(10);
    expect(lru.get("a")).toBeUndefined();
    expect(lru.get("c")).toBe("zzzz");
    lru.set("huge", "x".repeat(11));
    expect(lru.get("huge")).toBeUndefined();
    expect(lru.get("c")).toBe("zzzz");
  });

  test("replacing a key updates its weight instead of adding to it", () => {
    const lru = new Lru<string, string>({ maxEntries: 5, maxWeight: 100, weigh: (v) => v.length });
    lru.set("a", "xxxxx");
    lru.set("a", "xx");
    expect(lru.weight).toBe(2);
    expect(lru.size).toBe(1);
  });
});
