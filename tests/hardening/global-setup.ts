import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import type { TestProject } from "vitest/node";
import { ensureBuild, freePort, repoRoot, run, startNext, stopServer, waitForHealth } from "./server";
import { PERSONA_LOGINS, signIn, type Cookies, type PersonaName } from "./personas";

declare module "vitest" {
  export interface ProvidedContext {
    baseURL: string;
    /** The server's own temp folder: database file and uploads. */
    hardeningDir: string;
    databaseURL: string;
    uploadsDir: string;
    /** JSON of SeedIds. */
    seedIds: string;
    /** JSON of Cookies. */
    cookies: string;
    /** Process id of the `next start` child (its RSS is measured by the memory tests). */
    serverPid: number;
  }
}

/**
 * The production build (built when stale) served on a free loopback port with its own temp database
 * and upload folder, seeded with the demo studio plus a second studio; every persona signed in once.
 */
export default async function setup(project: TestProject) {
  const base: NodeJS.ProcessEnv = { ...process.env, NEXT_TELEMETRY_DISABLED: "1" };
  ensureBuild(base);

  const dir = fs.mkdtempSync(path.join(os.tmpdir(), "knotwork-hardening-"));
  const uploadsDir = path.join(dir, "uploads");
  fs.mkdirSync(uploadsDir);
  const port = await freePort();
  const url = `http://127.0.0.1:${port}`;
  const databaseURL = `file:${path.join(dir, "hardening.db")}`;
  const env: NodeJS.ProcessEnv = {
    ...base,
    NODE_ENV: "production",
    DATABASE_URL: databaseURL,
    UPLOADS_DIR: uploadsDir,
    BETTER_AUTH_SECRET: "hardening-test-secret-only-for-this-run-0123456789",
    BETTER_AUTH_URL: url,
    KNOTWORK_LAB: "1",
  };
  delete env.UPLOADTHING_TOKEN;
  delete env.SMTP_URL;
  const idsFile = path.join(dir, "ids.json");
  run(path.join(repoRoot, "node_modules/.bin/tsx"), ["tests/hardening/seed-studios.ts", idsFile], env);
  const child = startNext(port, env);
  await waitForHealth(url, child);

  const cookies = { anonymous: "" } as Cookies;
  for (const [name, login] of Object.entries(PERSONA_LOGINS)) {
    cookies[name as PersonaName] = await signIn(url, login.email, login.password);
  }
  project.provide("baseURL", url);
  project.provide("hardeningDir", dir);
  project.provide("databaseURL", databaseURL);
  project.provide("uploadsDir", uploadsDir);
  project.provide("seedIds", fs.readFileSync(idsFile, "utf8"));
  project.provide("cookies", JSON.stringify(cookies));
  project.provide("serverPid", child.pid ?? 0);

  return async () => {
    await stopServer(child);
    fs.rmSync(dir, { recursive: true, force: true });
  };
}
