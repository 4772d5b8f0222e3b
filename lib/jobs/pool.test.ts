import path from "node:path";
import { afterAll, describe, expect, onTestFinished, test } from "vitest";
import { createPool, JobLimitError, limitResponse } from "./pool";

const worker = path.resolve(__dirname, "fixtures/test-worker.cjs");
type Answer = { threadId: number; heapUsedMb: number; kept: number };

describe("createPool", () => {
  const pool = createPool({ filename: worker, threads: 1, timeoutMs: 400, maxOldGenerationSizeMb: 48, what: "this test job" });
  afterAll(() => pool.close());

  test("a job runs off the request thread and answers", async () => {
    const a = await pool.run<Answer>({ kind: "spin", ms: 10 });
    expect(a.threadId).toBeGreaterThan(0); // the main thread is 0
  });

  test("a job past its time limit fails with a sentence, and its worker (with all it held) is gone", async () => {
    const held = await pool.run<Answer>({ kind: "hold", chunks: 20 }); // ~16 MB kept by this worker
    expect(held.kept).toBe(20);
    const t0 = performance.now();
    const err = await pool.run({ kind: "spin", ms: 20_000 }).catch((e: unknown) => e);
    expect(performance.now() - t0).toBeLessThan(3000); // stopped at 0.4 s, not after 20 s
    expect(err).toBeInstanceOf(JobLimitError);
    expect((err as JobLimitError).limit).toBe("time");
    expect((err as Error).message).toBe("Making this test job took longer than 0.4 s, so it was stopped. Try fewer or shorter drills.");
    const res = limitResponse(err as JobLimitError);
    expect(res.status).toBe(503);
    expect(((await res.json()) as { message: string }).message).toMatch(/stopped/);
    // The next job gets a fresh worker: a new thread holding none of the old one's memory.
    const after = await pool.run<Answer>({ kind: "spin", ms: 1 });
    expect(after.threadId).not.toBe(held.threadId);
    expect(after.kept).toBe(0);
  });

  test("a job past its memory limit fails with a sentence, and the next job runs in a fresh worker", async () => {
    const pool = createPool({ filename: worker, threads: 1, timeoutMs: 20_000, maxOldGenerationSizeMb: 48, what: "this test job" });
    onTestFinished(() => pool.close());
    const before = await pool.run<Answer>({ kind: "spin", ms: 1 });
    const err = await pool.run({ kind: "grow" }).catch((e: unknown) => e);
    expect(err).toBeInstanceOf(JobLimitError);
    expect((err as JobLimitError).limit).toBe("memory");
    expect((err as Error).message).toContain("more than 48 MB");
    const after = await pool.run<Answer>({ kind: "spin", ms: 1 });
    expect(after.threadId).not.toBe(before.threadId);
    expect(after.kept).toBe(0);
    expect(after.heapUsedMb).toBeLessThan(48);
  });

  test("an idle worker exits, giving back all it held", async () => {
    const pool = createPool({ filename: worker, threads: 1, timeoutMs: 5_000, maxOldGenerationSizeMb: 48, idleTimeoutMs: 200 });
    onTestFinished(() => pool.close());
    const held = await pool.run<Answer>({ kind: "hold", chunks: 10 });
    expect(held.kept).toBe(10);
    expect(pool.stats().threads).toBe(1);
    await new Promise((r) => setTimeout(r, 1_000));
    expect(pool.stats().threads).toBe(0);
    expect((await pool.run<Answer>({ kind: "spin", ms: 1 })).kept).toBe(0);
  });
});
