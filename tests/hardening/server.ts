/**
 * The production build the hardening suite and the crash / load scripts run against. The build
 * folder is `.next` unless KNOTWORK_DIST_DIR names another (next.config.ts reads the same variable),
 * so the suite's build can be kept apart from a build someone else is running in the same tree.
 */
import { spawn, spawnSync, type ChildProcess } from "node:child_process";
import fs from "node:fs";
import net from "node:net";
import path from "node:path";

export const repoRoot = path.resolve(__dirname, "../..");
export const distDir = () => path.join(repoRoot, process.env.KNOTWORK_DIST_DIR || ".next");
const SOURCES = ["app", "components", "db", "lib", "public", "proxy.ts", "next.config.ts", "package.json", "postcss.config.mjs"];

function newestMtime(p: string): number {
  if (!fs.existsSync(p)) return 0;
  const st = fs.statSync(p);
  if (!st.isDirectory()) return st.mtimeMs;
  let newest = 0;
  for (const e of fs.readdirSync(p)) {
    if (e === "node_modules" || e.endsWith(".test.ts")) continue;
    newest = Math.max(newest, newestMtime(path.join(p, e)));
  }
  return newest;
}

/** True when there is no complete production build or a source file changed after it. */
export function buildIsStale(): boolean {
  const id = path.join(distDir(), "BUILD_ID");
  if (!fs.existsSync(id) || !fs.existsSync(path.join(distDir(), "server/app"))) return true;
  const built = fs.statSync(id).mtimeMs;
  return SOURCES.some((s) => newestMtime(path.join(repoRoot, s)) > built);
}

export function run(cmd: string, args: string[], env: NodeJS.ProcessEnv): void {
  const res = spawnSync(cmd, args, { cwd: repoRoot, env, stdio: "inherit" });
  if (res.status !== 0) throw new Error(`${cmd} ${args.join(" ")} exited with ${res.status}`);
}

/**
 * `next build` when the build is missing or older than the sources. A build into a second folder
 * makes Next add that folder's types to tsconfig.json: the file is put back as it was and those
 * generated types removed, so the project's type-check sees one build only. KNOTWORK_REUSE_BUILD=1
 * keeps an existing build even when sources are newer (for working on the suite itself).
 */
export function ensureBuild(env: NodeJS.ProcessEnv = process.env): void {
  // The heavy-work worker bundle (lib/jobs/worker.ts) is built every time: it takes well under a second.
  run(process.execPath, [path.join(repoRoot, "scripts/build-worker.mjs")], env);
  const reuse = process.env.KNOTWORK_REUSE_BUILD === "1" && fs.existsSync(path.join(distDir(), "BUILD_ID"));
  if (reuse || !buildIsStale()) return;
  const tsconfig = path.join(repoRoot, "tsconfig.json");
  const before = fs.readFileSync(tsconfig, "utf8");
  try {
    // A production build whatever the caller's NODE_ENV (vitest sets "test").
    run(path.join(repoRoot, "node_modules/.bin/next"), ["build"], { ...env, NODE_ENV: "production", NEXT_TELEMETRY_DISABLED: "1" });
  } finally {
    if (distDir() !== path.join(repoRoot, ".next")) {
      if (fs.readFileSync(tsconfig, "utf8") !== before) fs.writeFileSync(tsconfig, before);
      fs.rmSync(path.join(distDir(), "types"), { recursive: true, force: true });
    }
  }
}

export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const srv = net.createServer();
    srv.once("error", reject);
    srv.listen(0, "127.0.0.1", () => {
      const port = (srv.address() as net.AddressInfo).port;
      srv.close(() => resolve(port));
    });
  });
}

export async function waitForHealth(url: string, child: ChildProcess, timeoutMs = 60_000): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    if (child.exitCode !== null || child.signalCode !== null) throw new Error(`next start exited (${child.exitCode ?? child.signalCode})`);
    try {
      const res = await fetch(`${url}/api/health`);
      if (res.ok) return;
    } catch {
      // not up yet
    }
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`Knotwork did not answer on ${url} within ${timeoutMs} ms`);
}

/** `next start` on 127.0.0.1:port; output goes to the given stream mode (quiet by default). */
export function startNext(port: number, env: NodeJS.ProcessEnv, stdio: "ignore" | "inherit" = "ignore"): ChildProcess {
  const bin = path.join(repoRoot, "node_modules/.bin/next");
  // Not a vitest process: heavy work runs in its worker pool as in production (lib/jobs/heavy.ts).
  const serverEnv = { ...env };
  delete serverEnv.VITEST;
  return spawn(bin, ["start", "-p", String(port), "-H", "127.0.0.1"], { cwd: repoRoot, env: serverEnv, stdio: ["ignore", stdio, stdio] });
}

/** Stops a server started here: SIGTERM, then SIGKILL when it lingers. */
export async function stopServer(child: ChildProcess): Promise<void> {
  if (child.exitCode !== null || child.signalCode !== null) return;
  const gone = new Promise((r) => child.once("exit", r));
  child.kill("SIGTERM");
  await Promise.race([gone, new Promise((r) => setTimeout(r, 2000))]);
  if (child.exitCode === null && child.signalCode === null) child.kill("SIGKILL");
}
