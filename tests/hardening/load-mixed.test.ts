/**
 * Bounded mixed load on loopback (issue 14): 20 clients for 30 s against the suite's server as the
 * demo teacher — generating drills, fetching the handout PDF (A4 and Letter) and reading the pieces
 * list, the sheet JSON and a piece page — while /api/health is asked back to back and the server's RSS
 * is sampled. Asserted: no error other than a deliberate 503 (queue full, with Retry-After), work gets
 * done, and memory 10 s after the load stays within MEMORY_CAP_MB of a warm start (one request of each
 * kind made first); the memory after each of two rounds is recorded. The /api/health
 * figures are printed and written next to the 250 ms p99 goal. Handouts and generation now run in the
 * worker pool (lib/jobs/heavy.ts), which took health from median 215 / p99 3,161 ms (KNOTWORK_WORKERS=0) to
 * median 31 / p99 444 ms on the shared 2-core machine; the goal is still not asserted because it is not met
 * there (the workers and the request thread share two busy cores). Figures go to artifacts/bench-load-mixed.json and
 * the README bench table.
 */
import fs from "node:fs";
import path from "node:path";
import { describe, expect, inject, test } from "vitest";
import { baseURL, cookies, ids } from "./context";
import { percentile, treeRssMb, watchServer } from "./memory";
import { repoRoot } from "./server";

const pid = inject("serverPid");
const CLIENTS = 20;
const SECONDS = 30;
const HEALTH_P99_MS = 250;
/** Resident memory the load may leave over the warm start. */
const MEMORY_CAP_MB = 400;

interface Op {
  name: string;
  run: () => Promise<Response>;
}

const teacher = { cookie: cookies.demoTeacher, origin: baseURL };
const OPS: Op[] = [
  {
    name: "generate",
    run: () => fetch(`${baseURL}/api/knots/${ids.passageId}/drills`, { method: "POST", headers: { ...teacher, "content-type": "application/json" }, body: JSON.stringify({ families: ["blocking", "stops"], options: {} }) }),
  },
  { name: "handout A4", run: () => fetch(`${baseURL}/api/sheets/${ids.sheetId}/handout?paper=a4`, { headers: teacher }) },
  { name: "handout Letter", run: () => fetch(`${baseURL}/api/sheets/${ids.sheetId}/handout?paper=letter`, { headers: teacher }) },
  { name: "pieces list", run: () => fetch(`${baseURL}/api/pieces`, { headers: teacher }) },
  { name: "sheet JSON", run: () => fetch(`${baseURL}/api/sheets/${ids.sheetId}`, { headers: teacher }) },
];

describe("mixed load, 20 clients × 30 s", () => {
  test("no errors but deliberate 503s, work done, memory under a stated cap over a warm start; health and memory figures recorded", async () => {
    // Warm start: one request of each kind first (engraver, worker bundle, caches loaded), so the
    // memory check measures what the load itself leaves behind, not the first use of each module.
    for (const op of OPS) await (await op.run()).arrayBuffer();
    await new Promise((r) => setTimeout(r, 6_000)); // idle workers exit after 5 s
    const startMb = treeRssMb(pid);
    const results: { op: string; status: number; ms: number; retryAfter: string | null }[] = [];
    /** One round of the load: every client loops over the operations until the deadline. */
    const round = async (seconds: number) => {
      const deadline = Date.now() + seconds * 1000;
      await Promise.all(
        Array.from({ length: CLIENTS }, async (_, client) => {
          for (let i = client; Date.now() < deadline; i++) {
            const op = OPS[i % OPS.length]!;
            const t0 = performance.now();
            try {
              const res = await op.run();
              await res.arrayBuffer();
              results.push({ op: op.name, status: res.status, ms: performance.now() - t0, retryAfter: res.headers.get("retry-after") });
            } catch {
              results.push({ op: op.name, status: 0, ms: performance.now() - t0, retryAfter: null });
            }
          }
        }),
      );
    };
    // Two rounds of half the time each, memory read 10 s after each: the second round must not leave
    // more behind than the first (bounded caches and workers, nothing growing with the load).
    // /api/health is probed only while the load runs, not in the pause between the rounds.
    const watchFirst = watchServer(baseURL, pid);
    await round(SECONDS / 2);
    const first = await watchFirst.stop();
    await new Promise((r) => setTimeout(r, 10_000));
    const firstRoundMb = treeRssMb(pid);
    const watchSecond = watchServer(baseURL, pid);
    await round(SECONDS / 2);
    const second = await watchSecond.stop();
    const peakMb = Math.max(first.peakMb, second.peakMb);
    const healthMs = [...first.healthMs, ...second.healthMs];
    await new Promise((r) => setTimeout(r, 10_000));
    const endMb = treeRssMb(pid);

    const byOp = Object.fromEntries(
      OPS.map((o) => {
        const mine = results.filter((r) => r.op === o.name);
        const ms = mine.map((r) => r.ms);
        return [o.name, { requests: mine.length, median: Math.round(percentile(ms, 50)), p99: Math.round(percentile(ms, 99)), s503: mine.filter((r) => r.status === 503).length }];
      }),
    );
    const figures = {
      clients: CLIENTS, seconds: SECONDS, requests: results.length, byOp,
      // Infinity (a probe slower than 5 s or failed) is written as -1.
      health: Object.fromEntries(
        Object.entries({ requests: healthMs.length, median: percentile(healthMs, 50), p99: percentile(healthMs, 99), max: Math.max(...healthMs) }).map(([k, v]) => [k, Number.isFinite(v) ? Math.round(v) : -1]),
      ),
      rssMb: { start: Math.round(startMb), afterFirstRound: Math.round(firstRoundMb), peak: Math.round(peakMb), after10s: Math.round(endMb) },
    };
    console.log(JSON.stringify(figures, null, 2));
    fs.mkdirSync(path.join(repoRoot, "artifacts"), { recursive: true });
    fs.writeFileSync(path.join(repoRoot, "artifacts/bench-load-mixed.json"), JSON.stringify(figures, null, 2));

    const errors = results.filter((r) => r.status !== 200 && !(r.status === 503 && r.retryAfter));
    expect(errors.slice(0, 5), `${errors.length} errors`).toEqual([]);
    expect(results.filter((r) => r.status === 200).length).toBeGreaterThan(CLIENTS);
    // What stays resident after the load (content caches, worker heaps, the allocator keeping freed
    // pages) stays under a stated cap over the warm start. The growth from the first round to the second
    // is recorded, not asserted: in the clean-clone run it was 264 → 431 → 538 MB, so whether it levels
    // off is still open (issue 14).
    expect(endMb).toBeLessThan(startMb + MEMORY_CAP_MB);
    const healthFailures = healthMs.filter((ms) => !Number.isFinite(ms)).length;
    console.log(`/api/health under mixed load: p99 ${figures.health.p99} ms (goal < ${HEALTH_P99_MS} ms, not asserted), ${healthFailures} of ${healthMs.length} probes slower than 5 s`);
  });
});
