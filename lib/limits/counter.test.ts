// Database counters: atomic under concurrency, shared by every client of the same database file
// (two app servers = two libSQL clients on one file), windows end on time.
import path from "node:path";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { useTempDatabase } from "../../tests/db/temp-db";

let t: Awaited<ReturnType<typeof useTempDatabase>>;
let counter: typeof import("./counter");
let second: { db: import("../../db").Db; client: import("@libsql/client").Client };

beforeAll(async () => {
  t = await useTempDatabase("limit-counter");
  counter = await import("./counter");
  const { openDatabase } = await import("../../db");
  second = openDatabase(`file:${path.join(t.dir, "test.db")}`);
});
afterAll(() => {
  second?.client.close();
  t?.cleanup();
});

describe("dbCounter", () => {
  test("100 concurrent hits from two clients of one file count to exactly 100", async () => {
    const a = counter.dbCounter("race", 60_000, t.db);
    const b = counter.dbCounter("race", 60_000, second.db);
    const results = await Promise.all(Array.from({ length: 100 }, (_, i) => (i % 2 ? a : b).hit("k", 1_000)));
    expect(results.map((r) => r.count).sort((x, y) => x - y)).toEqual(Array.from({ length: 100 }, (_, i) => i + 1));
    expect(await b.peek("k", 1_000)).toEqual({ count: 100, resetAt: 61_000 });
  });

  test("a window ends on time and starts again at 1; scopes do not mix", async () => {
    const c = counter.dbCounter("win", 1_000, t.db);
    expect((await c.hit("k", 0)).count).toBe(1);
    expect((await c.hit("k", 999)).count).toBe(2);
    expect(await c.peek("k", 1_000)).toBeNull();
    expect(await c.hit("k", 1_000)).toEqual({ count: 1, resetAt: 2_000 });
    expect(await counter.dbCounter("other", 1_000, t.db).peek("k", 1_000)).toBeNull();
  });

  test("a limiter reached through one client refuses on the other", async () => {
    const one = counter.dbRateLimiter("sign-up-test", 3, 60_000, t.db);
    const two = counter.dbRateLimiter("sign-up-test", 3, 60_000, second.db);
    expect([await one.take("203.0.113.1"), await one.take("203.0.113.1"), await one.take("203.0.113.1")]).toEqual([true, true, true]);
    expect(await two.take("203.0.113.1")).toBe(false);
    expect(await two.take("203.0.113.2")).toBe(true);
  });

  test("failure counter: blocked after max failures across clients, cleared by a success", async () => {
    const one = counter.dbFailureCounter("fail-test", 2, 1_000, t.db);
    const two = counter.dbFailureCounter("fail-test", 2, 1_000, second.db);
    await one.fail("a@x.test", 0);
    expect(await two.blockedFor("a@x.test", 1)).toBe(0);
    await two.fail("a@x.test", 1);
    expect(await one.blockedFor("a@x.test", 10)).toBe(990);
    expect(await one.blockedFor("a@x.test", 1_000)).toBe(0);
    await two.fail("a@x.test", 1_000);
    await one.clear("a@x.test");
    expect(await two.blockedFor("a@x.test", 1_001)).toBe(0);
  });
});
