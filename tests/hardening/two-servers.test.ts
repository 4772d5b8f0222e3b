/**
 * Two app servers on one database file (two `next start` processes on different ports, the same
 * DATABASE_URL): a limit reached through one is in force on the other, because better-auth's rate
 * limits (`rateLimit.storage: "database"`) and Knotwork's per-account sign-in limit
 * (lib/limits/counter.ts) live in the database, not in a process's memory.
 * Both servers trust the loopback address as their reverse proxy (TRUSTED_PROXY=127.0.0.1), so this
 * test can play the proxy and say which client address each request comes from.
 * better-auth docs, "Rate Limit → Storage"; OWASP Authentication Cheat Sheet, "Login Throttling".
 */
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import type { ChildProcess } from "node:child_process";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { PERSONA_LOGINS } from "./personas";
import { freePort, repoRoot, run, startNext, stopServer, waitForHealth } from "./server";

let dir: string;
const servers: ChildProcess[] = [];
let a: string;
let b: string;

beforeAll(async () => {
  dir = fs.mkdtempSync(path.join(os.tmpdir(), "knotwork-two-servers-"));
  const [portA, portB] = [await freePort(), await freePort()];
  a = `http://127.0.0.1:${portA}`;
  b = `http://127.0.0.1:${portB}`;
  const env: NodeJS.ProcessEnv = {
    ...process.env,
    NODE_ENV: "production",
    NEXT_TELEMETRY_DISABLED: "1",
    DATABASE_URL: `file:${path.join(dir, "shared.db")}`,
    UPLOADS_DIR: path.join(dir, "uploads"),
    BETTER_AUTH_SECRET: "two-servers-test-secret-only-for-this-run-0123456789",
    TRUSTED_PROXY: "127.0.0.1",
  };
  delete env.UPLOADTHING_TOKEN;
  delete env.SMTP_URL;
  run(path.join(repoRoot, "node_modules/.bin/tsx"), ["tests/hardening/seed-studios.ts", path.join(dir, "ids.json")], env);
  servers.push(startNext(portA, { ...env, BETTER_AUTH_URL: a }), startNext(portB, { ...env, BETTER_AUTH_URL: b }));
  await Promise.all([waitForHealth(a, servers[0]!), waitForHealth(b, servers[1]!)]);
}, 180_000);

afterAll(async () => {
  await Promise.all(servers.map((s) => stopServer(s)));
  if (dir) fs.rmSync(dir, { recursive: true, force: true });
});

/** One sign-in through `base` from client address `from` (TEST-NET-2/3, RFC 5737). */
async function signIn(base: string, from: string, email: string, password: string) {
  const res = await fetch(`${base}/api/auth/sign-in/email`, {
    method: "POST",
    headers: { "content-type": "application/json", origin: base, "x-forwarded-for": from },
    body: JSON.stringify({ email, password }),
  });
  return { status: res.status, body: await res.text() };
}

describe("two app servers, one database", () => {
  test("the per-address sign-in limit used up through server A refuses on server B", async () => {
    const from = "198.51.100.7";
    // Ten wrong tries through A, each for a different unknown e-mail (no per-account count grows).
    for (let i = 0; i < 10; i++) expect((await signIn(a, from, `nobody-${i}@elsewhere.test`, "wrong-password")).status).toBe(401);
    const onB = await signIn(b, from, PERSONA_LOGINS.demoTeacher.email, PERSONA_LOGINS.demoTeacher.password);
    expect(onB.status, onB.body).toBe(429);
    expect(onB.body).not.toContain("TOO_MANY_FAILED_SIGN_INS");
    // Another client address still signs in on B: the limit is per address, not global.
    expect((await signIn(b, "198.51.100.8", PERSONA_LOGINS.demoTeacher.email, PERSONA_LOGINS.demoTeacher.password)).status).toBe(200);
  });

  test("the per-account limit reached through A (a new address every try) holds on B", async () => {
    const email = PERSONA_LOGINS.otherStudent.email;
    for (let i = 0; i < 10; i++) expect((await signIn(a, `203.0.113.${i + 1}`, email, `guess-${i}`)).status).toBe(401);
    const onB = await signIn(b, "203.0.113.200", email, PERSONA_LOGINS.otherStudent.password);
    expect(onB.status, onB.body).toBe(429);
    expect(onB.body).toContain("TOO_MANY_FAILED_SIGN_INS");
  });
});
