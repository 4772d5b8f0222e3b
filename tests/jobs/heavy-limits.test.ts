// A real handout past the pool's time limit (set to 50 ms here, 60 s in production) fails with a
// sentence and a 503, through the same path the handout handler uses (lib/jobs/render-cache.ts).
import { execFileSync } from "node:child_process";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, test, vi } from "vitest";

vi.hoisted(() => {
  process.env.KNOTWORK_WORKERS = "1";
  process.env.KNOTWORK_JOB_TIMEOUT_MS = "50";
});

import { heavyPool } from "@/lib/jobs/heavy";
import { JobLimitError, limitResponse } from "@/lib/jobs/pool";
import { handoutPdf } from "@/lib/jobs/render-cache";
import { eightDrillSheet } from "../handout/sample-sheet";

const root = path.resolve(__dirname, "../..");

beforeAll(() => {
  execFileSync(process.execPath, [path.join(root, "scripts/build-worker.mjs")], { cwd: root, stdio: "ignore" });
}, 60_000);
afterAll(async () => {
  await heavyPool()?.close();
  delete process.env.KNOTWORK_WORKERS;
  delete process.env.KNOTWORK_JOB_TIMEOUT_MS;
});

describe("a heavy job past its time limit", () => {
  test("an eight-drill handout (seconds of engraving) is stopped at 50 ms with a sentence and a 503", async () => {
    const t0 = performance.now();
    const err = await handoutPdf(eightDrillSheet("a4")).catch((e: unknown) => e);
    expect(heavyPool()).not.toBeNull(); // it ran in the pool, not in-process
    expect(err).toBeInstanceOf(JobLimitError);
    expect((err as Error).message).toBe("Making these drills took longer than 0.05 s, so it was stopped. Try fewer or shorter drills.");
    expect(performance.now() - t0).toBeLessThan(5_000);
    const res = limitResponse(err as JobLimitError);
    expect(res.status).toBe(503);
    expect(res.headers.get("retry-after")).toBe("30");
    // That the stopped worker and all it held are gone is checked in lib/jobs/pool.test.ts.
  }, 60_000);
});
