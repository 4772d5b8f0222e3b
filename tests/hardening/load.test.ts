/**
 * Load smoke run: the same benchmark as `npm run bench:http` for 5 s per target (10 connections),
 * on its own server. Asserts what must hold on any machine — every target answers, with no errors,
 * timeouts or non-2xx answers — and records the figures; the 50 × 30 s goals are judged by
 * `npm run bench:http`.
 */
import fs from "node:fs";
import path from "node:path";
import { describe, expect, test } from "vitest";
import { benchRows, httpBench } from "../../scripts/bench/http";
import { repoRoot } from "./server";

describe("HTTP load smoke run", () => {
  test("pieces list, sheet, generate and health answer under load without errors", async () => {
    // The suite's global set-up built the app; never rebuild under the running server.
    const targets = await httpBench({ seconds: 5, connections: 10, build: false });
    expect(targets.map((t) => t.name)).toEqual([
      expect.stringContaining("health"),
      expect.stringContaining("pieces"),
      expect.stringContaining("sheet"),
      expect.stringContaining("generate"),
    ]);
    for (const t of targets) {
      expect(t.errors, `${t.name} errors`).toBe(0);
      expect(t.rps, `${t.name} requests/s`).toBeGreaterThan(0);
    }
    fs.mkdirSync(path.join(repoRoot, "artifacts"), { recursive: true });
    fs.writeFileSync(path.join(repoRoot, "artifacts/bench-http-smoke.json"), JSON.stringify(benchRows(targets, "10 conn × 5 s"), null, 2));
  });
});
