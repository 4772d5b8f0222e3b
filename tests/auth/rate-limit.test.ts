import { describe, expect, test } from "vitest";
import { clientKey, createRateLimiter } from "../../lib/auth/rate-limit";

describe("createRateLimiter", () => {
  test("allows max attempts per window per key, then refuses until the window ends", () => {
    const limiter = createRateLimiter(3, 1000);
    const results = [0, 1, 2, 3].map(() => limiter.take("a", 0));
    expect(results).toEqual([true, true, true, false]);
    expect(limiter.take("b", 10)).toBe(true);
    expect(limiter.take("a", 999)).toBe(false);
    expect(limiter.take("a", 1000)).toBe(true);
  });

  test("keys by the first forwarded address", () => {
    expect(clientKey(new Headers({ "x-forwarded-for": "203.0.113.7, 10.0.0.1" }))).toBe("203.0.113.7");
    expect(clientKey(new Headers())).toBe("local");
  });
});
