/**
 * The per-account sign-in limit: a client that changes its X-Forwarded-For address on every try
 * (so better-auth's per-address limiter never sees two tries from one address) still gets HTTP 429
 * on the 11th wrong password for the same e-mail, and the right password is refused while locked.
 */
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { useTempDatabase } from "../db/temp-db";

let t: Awaited<ReturnType<typeof useTempDatabase>>;
let auth: typeof import("../../lib/auth").auth;
let limit: typeof import("../../lib/auth/sign-in-limit");
const base = "http://localhost:3000";
let address = 0;

beforeAll(async () => {
  t = await useTempDatabase("account-limit");
  ({ auth } = await import("../../lib/auth"));
  limit = await import("../../lib/auth/sign-in-limit");
  const { createTeacherAccount } = await import("../../lib/auth/teacher-sign-up");
  for (const [name, email] of [["Pia Rowntree", "pia@knotwork.test"], ["Cato Ferris", "cato@knotwork.test"]]) {
    const made = await createTeacherAccount(t.db, { name, email, password: "right-password", studioName: `${name} Studio` });
    if (!made.ok) throw new Error(made.message);
  }
});
afterAll(() => t.cleanup());

/** One sign-in through the HTTP handler from a never-seen address (TEST-NET-3, RFC 5737; fewer than 255 tries in this file). */
async function signIn(email: string, password: string): Promise<Response> {
  address += 1;
  return auth.handler(
    new Request(`${base}/api/auth/sign-in/email`, {
      method: "POST",
      headers: { "content-type": "application/json", origin: base, "x-forwarded-for": `203.0.113.${address}` },
      body: JSON.stringify({ email, password }),
    }),
  );
}

describe("per-account sign-in limit", () => {
  test("rotating X-Forwarded-For: 10 wrong passwords are 401, the 11th is 429, then even the right one", async () => {
    const statuses: number[] = [];
    for (let i = 0; i < limit.SIGN_IN_FAILURES_MAX; i++) statuses.push((await signIn("pia@knotwork.test", `wrong-${i}`)).status);
    expect(statuses).toEqual(Array(10).fill(401));
    const eleventh = await signIn("PIA@knotwork.test", "wrong-10");
    expect(eleventh.status).toBe(429);
    expect(((await eleventh.json()) as { message: string }).message).toBe(limit.TOO_MANY_FAILURES_MESSAGE);
    // RFC 6585 §4: a 429 may say how long to wait with Retry-After (seconds).
    const wait = Number(eleventh.headers.get("retry-after"));
    expect(wait).toBeGreaterThan(0);
    expect(wait).toBeLessThanOrEqual(15 * 60);
    expect((await signIn("pia@knotwork.test", "right-password")).status).toBe(429);
  });

  test("another account is not affected, and a success clears its own count", async () => {
    for (let i = 0; i < 9; i++) expect((await signIn("cato@knotwork.test", `wrong-${i}`)).status).toBe(401);
    expect((await signIn("cato@knotwork.test", "right-password")).status).toBe(200);
    for (let i = 0; i < 10; i++) expect((await signIn("cato@knotwork.test", `again-${i}`)).status).toBe(401);
    expect((await signIn("cato@knotwork.test", "right-password")).status).toBe(429);
  });
});

describe("failure counter", () => {
  test("blocks after max failures and lets the key try again when the window ends", () => {
    const c = limit.createFailureCounter(2, 1000);
    c.fail("a", 0);
    expect(c.blockedFor("a", 1)).toBe(0);
    c.fail("a", 1);
    expect(c.blockedFor("a", 10)).toBe(990);
    expect(c.blockedFor("b", 10)).toBe(0);
    expect(c.blockedFor("a", 1000)).toBe(0);
    c.fail("a", 1000);
    expect(c.blockedFor("a", 1001)).toBe(0);
  });
});
