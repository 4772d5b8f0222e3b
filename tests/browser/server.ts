import { spawn, spawnSync, type ChildProcess } from "node:child_process";
import fs from "node:fs";
import net from "node:net";
import path from "node:path";

export const repoRoot = path.resolve(__dirname, "../..");
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

/** True when there is no production build or a source file changed after it. */
export function buildIsStale(): boolean {
  const id = path.join(repoRoot, ".next/BUILD_ID");
  if (!fs.existsSync(id)) return true;
  const built = fs.statSync(id).mtimeMs;
  return SOURCES.some((s) => newestMtime(path.join(repoRoot, s)) > built);
}

export function run(cmd: string, args: string[], env: NodeJS.ProcessEnv): void {
  const res = spawnSync(cmd, args, { cwd: repoRoot, env, stdio: "inherit" });
  if (res.status !== 0) throw new Error(`${cmd} ${args.join(" ")} exited with ${res.status}`);
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
    if (child.exitCode !== null) throw new Error(`next start exited with ${child.exitCode}`);
    try {
      const res = await fetch(`${url}/api/health`);
      if (res.ok) return;
    } catch {
      // not up yet
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`Knotwork did not answer on ${url} within ${timeoutMs} ms`);
}

export function startNext(port: number, env: NodeJS.ProcessEnv): ChildProcess {
  const bin = path.join(repoRoot, "node_modules/.bin/next");
  return spawn(bin, ["start", "-p", String(port), "-H", "127.0.0.1"], {
    cwd: repoRoot,
    env,
    stdio: ["ignore", "inherit", "inherit"],
    detached: false,
  });
}
