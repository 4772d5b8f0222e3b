/**
 * HTTP load benchmark (autocannon, loopback only, bounded in time) against the production build
 * with its own temp database: the pieces list API, a drill sheet's JSON, and the generate handler,
 * each next to /api/health on the same server (the framework's ceiling).
 * Goals (issue 9): ≥ 50 % of the health endpoint's requests/s, p99 ≤ 100 ms, 0 errors.
 *
 * `npm run bench:http` runs the full 50 connections × 30 s; `--seconds N --connections N` override.
 * `npm run bench` calls `run()` (the same full run) for the project-wide table.
 */
import { type ChildProcess } from "node:child_process";
import fs from "node:fs";
import { createRequire } from "node:module";
import os from "node:os";
import path from "node:path";
import { ensureBuild, freePort, repoRoot, run as runCommand, startNext, stopServer, waitForHealth } from "../../tests/hardening/server";
import { PERSONA_LOGINS, signIn, type SeedIds } from "../../tests/hardening/personas";

interface CannonResult {
  requests: { average: number };
  latency: { p99: number; average: number };
  errors: number;
  timeouts: number;
  non2xx: number;
}
type Cannon = (opts: Record<string, unknown>) => Promise<CannonResult>;
const autocannon = createRequire(__filename)("autocannon") as Cannon;

export interface HttpTarget {
  name: string;
  rps: number;
  p99: number;
  errors: number;
  /** Requests/s relative to /api/health (1 for health itself). */
  ratio: number;
}

export interface BenchResult {
  readonly name: string;
  readonly value: number;
  readonly unit: string;
  readonly goal: string;
}

const arg = (name: string, fallback: number) => {
  const i = process.argv.indexOf(`--${name}`);
  return i > 0 ? Number(process.argv[i + 1]) : fallback;
};

/** The sheet's JSON route when the app has one, else the sheet page itself. */
function sheetPath(ids: SeedIds): { name: string; path: string } {
  const route = path.join(repoRoot, "app/api/sheets/[sheetId]/route.ts");
  if (fs.existsSync(route) && /export\s+(async\s+)?function\s+GET\b/.test(fs.readFileSync(route, "utf8"))) {
    return { name: "sheet JSON (GET /api/sheets/:id)", path: `/api/sheets/${ids.sheetId}` };
  }
  return { name: "sheet page (GET /sheets/:id; no sheet JSON route yet)", path: `/sheets/${ids.sheetId}` };
}

/** Starts a seeded production server, loads each target in turn, stops the server (`build: false`: use the build as it is). */
export async function httpBench(opts: { seconds: number; connections: number; build?: boolean }): Promise<HttpTarget[]> {
  if (opts.build !== false) ensureBuild();
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), "knotwork-bench-"));
  const port = await freePort();
  const base = `http://127.0.0.1:${port}`;
  const env: NodeJS.ProcessEnv = {
    ...process.env, NODE_ENV: "production", NEXT_TELEMETRY_DISABLED: "1", DATABASE_URL: `file:${path.join(dir, "bench.db")}`,
    UPLOADS_DIR: path.join(dir, "uploads"), BETTER_AUTH_SECRET: "bench-secret-only-for-this-run-0123456789abcdef", BETTER_AUTH_URL: base,
  };
  runCommand(path.join(repoRoot, "node_modules/.bin/tsx"), ["tests/hardening/seed-studios.ts", path.join(dir, "ids.json")], env);
  const ids = JSON.parse(fs.readFileSync(path.join(dir, "ids.json"), "utf8")) as SeedIds;
  let server: ChildProcess | null = startNext(port, env);
  try {
    await waitForHealth(base, server);
    const cookie = await signIn(base, PERSONA_LOGINS.demoTeacher.email, PERSONA_LOGINS.demoTeacher.password);
    const sheet = sheetPath(ids);
    const targets = [
      { name: "health (GET /api/health)", path: "/api/health", method: "GET" },
      { name: "pieces list (GET /api/pieces)", path: "/api/pieces", method: "GET" },
      { name: sheet.name, path: sheet.path, method: "GET" },
      {
        name: "generate (POST /api/knots/:id/drills)",
        path: `/api/knots/${ids.passageId}/drills`,
        method: "POST",
        body: JSON.stringify({ families: ["blocking", "stops"], options: {} }),
      },
    ];
    const out: HttpTarget[] = [];
    for (const t of targets) {
      const headers: Record<string, string> = { cookie, origin: base };
      if (t.body) headers["content-type"] = "application/json";
      // Warm the route (first request compiles nothing in production, but fills caches and JIT).
      await fetch(base + t.path, { method: t.method, headers, body: t.body });
      const r = await autocannon({ url: base + t.path, method: t.method, headers, body: t.body, connections: opts.connections, duration: opts.seconds });
      out.push({ name: t.name, rps: r.requests.average, p99: r.latency.p99, errors: r.errors + r.timeouts + r.non2xx, ratio: 0 });
    }
    const health = out[0]!.rps || 1;
    for (const t of out) t.ratio = t.rps / health;
    return out;
  } finally {
    if (server) await stopServer(server);
    server = null;
    fs.rmSync(dir, { recursive: true, force: true });
  }
}

/** Rows for the project-wide table. */
export function benchRows(targets: HttpTarget[], label: string): BenchResult[] {
  return targets.flatMap((t, i) => {
    const ok = t.p99 <= 100 && t.errors === 0 && (i === 0 || t.ratio >= 0.5);
    const mark = ok ? "✓" : "✗";
    return [
      { name: `HTTP ${t.name}, ${label}: requests/s`, value: Math.round(t.rps), unit: "req/s", goal: i === 0 ? "ceiling (reference)" : `≥ 50 % of health: ${Math.round(t.ratio * 100)} % ${t.ratio >= 0.5 ? "✓" : "✗"}` },
      { name: `HTTP ${t.name}, ${label}: p99 latency`, value: t.p99, unit: "ms", goal: `≤ 100 ms, 0 errors (${t.errors}) ${mark}` },
    ];
  });
}

export async function run(): Promise<BenchResult[]> {
  return benchRows(await httpBench({ seconds: 30, connections: 50 }), "50 conn × 30 s");
}

if (process.argv[1] && path.resolve(process.argv[1]) === path.resolve(__filename)) {
  const seconds = arg("seconds", 30);
  const connections = arg("connections", 50);
  httpBench({ seconds, connections }).then(
    (targets) => {
      for (const r of benchRows(targets, `${connections} conn × ${seconds} s`)) console.log(`${r.name}: ${r.value} ${r.unit} — goal ${r.goal}`);
      process.exit(0);
    },
    (err) => {
      console.error(err);
      process.exit(1);
    },
  );
}
