import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import type { TestProject } from "vitest/node";
import { buildIsStale, freePort, repoRoot, run, startNext, waitForHealth } from "./server";

declare module "vitest" {
  export interface ProvidedContext {
    baseURL: string;
    /** The served app's SQLite file and uploads folder, for "nothing stored" checks. */
    databaseFile: string;
    uploadsDir: string;
  }
}

/**
 * Builds once when needed, then serves the production build on a free loopback port with a fresh
 * temp database (migrated and seeded with the demo studio).
 */
export default async function setup(project: TestProject) {
  const base: NodeJS.ProcessEnv = { ...process.env, NEXT_TELEMETRY_DISABLED: "1" };
  if (buildIsStale()) run(path.join(repoRoot, "node_modules/.bin/next"), ["build"], base);

  const dir = fs.mkdtempSync(path.join(os.tmpdir(), "knotwork-browser-"));
  const port = await freePort();
  const url = `http://127.0.0.1:${port}`;
  const env: NodeJS.ProcessEnv = {
    ...base,
    NODE_ENV: "production",
    DATABASE_URL: `file:${path.join(dir, "browser.db")}`,
    UPLOADS_DIR: path.join(dir, "uploads"),
    BETTER_AUTH_SECRET: "browser-test-secret-only-for-this-run-0123456789",
    BETTER_AUTH_URL: url,
    // Serves the development score lab (app/lab) that the score-component browser test drives.
    KNOTWORK_LAB: "1",
    // Serves the development outbox (app/dev/outbox), where the student browser test reads invitations.
    KNOTWORK_DEV_OUTBOX: "1",
    // Every browser test signs in from the same loopback address within a minute or two; the limits
    // themselves are proved by the hardening suite, which keeps the defaults.
    AUTH_RATE_LIMIT_MAX: "1000",
    AUTH_SIGN_IN_MAX: "1000",
  };
  run(path.join(repoRoot, "node_modules/.bin/tsx"), ["scripts/db-seed.ts"], env);
  const child = startNext(port, env, "inherit");
  await waitForHealth(url, child);
  project.provide("baseURL", url);
  project.provide("databaseFile", path.join(dir, "browser.db"));
  project.provide("uploadsDir", path.join(dir, "uploads"));

  return async () => {
    child.kill("SIGTERM");
    await new Promise((r) => setTimeout(r, 300));
    if (child.exitCode === null) child.kill("SIGKILL");
    fs.rmSync(dir, { recursive: true, force: true });
  };
}
