import { describe, expect, test } from "vitest";
import { busyResponse, createGate, QueueFullError } from "./gate";

const later = <T>(v: T, ms = 20) => new Promise<T>((r) => setTimeout(() => r(v), ms));

describe("createGate", () => {
  test("at most `running` jobs at once; the rest wait their turn in order", async () => {
    const gate = createGate(2, 10);
    let now = 0;
    let peak = 0;
    const order: number[] = [];
    await Promise.all(
      Array.from({ length: 6 }, (_, i) =>
        gate.run(async () => {
          peak = Math.max(peak, ++now);
          await later(null, 10);
          now--;
          order.push(i);
        }),
      ),
    );
    expect(peak).toBe(2);
    expect(order).toEqual([0, 1, 2, 3, 4, 5]);
    expect(gate.stats()).toEqual({ running: 0, queued: 0, refused: 0 });
  });

  test("a full queue refuses at once with QueueFullError → 503 with Retry-After", async () => {
    const gate = createGate(1, 1, 7);
    const first = gate.run(() => later(1, 500));
    const second = gate.run(() => later(2));
    const t0 = performance.now();
    const third = await gate.run(() => later(3)).catch((e: unknown) => e);
    expect(performance.now() - t0).toBeLessThan(200); // the first job holds its slot for 500 ms
    expect(third).toBeInstanceOf(QueueFullError);
    const res = busyResponse(third as QueueFullError);
    expect(res.status).toBe(503);
    expect(res.headers.get("retry-after")).toBe("7");
    expect(await Promise.all([first, second])).toEqual([1, 2]);
    expect(gate.stats().refused).toBe(1);
  });

  test("a failing job frees its slot", async () => {
    const gate = createGate(1, 0);
    await expect(gate.run(() => Promise.reject(new Error("boom")))).rejects.toThrow("boom");
    expect(await gate.run(() => later("ok"))).toBe("ok");
  });
});
