/**
 * Security headers, role escalation and sign-in rate limiting on the production server.
 * The rate-limit hammering runs last in this file: it uses up the loopback address's sign-in
 * budget, and every persona signed in once in the global set-up, before it.
 */
import { describe, expect, test } from "vitest";
import { buildActions, callAction } from "./actions-http";
import { baseURL, ids, probe, query, studioDigest } from "./context";
import { PERSONA_LOGINS } from "./personas";

describe("security headers", () => {
  // Header names and values: CSP Level 3 (W3C: default-src, object-src, frame-ancestors, base-uri),
  // the Fetch standard (X-Content-Type-Options: nosniff) and Referrer Policy (W3C), from memory.
  test.each(["/", "/sign-in", "/api/health", "/pieces", "/no-such-page", "/api/pieces"])("%s carries them", async (url) => {
    const res = await probe("GET", url, "anonymous");
    const csp = res.headers.get("content-security-policy") ?? "";
    const directives = new Map(csp.split(";").map((d) => d.trim().split(/\s+/)).map(([k, ...v]) => [k, v] as const));
    expect(directives.get("default-src")).toEqual(["'self'"]);
    expect(directives.get("frame-ancestors")).toEqual(["'none'"]);
    expect(directives.get("object-src")).toEqual(["'none'"]);
    expect(directives.get("base-uri")).toEqual(["'self'"]);
    // No remote origin anywhere: nothing is fetched from the internet at run time.
    expect(csp).not.toMatch(/https?:|\*/);
    // Production never allows eval.
    expect(directives.get("script-src")).not.toContain("'unsafe-eval'");
    expect(res.headers.get("x-content-type-options")).toBe("nosniff");
    expect(res.headers.get("referrer-policy")).toBe("strict-origin-when-cross-origin");
    // No framework fingerprint (OWASP HTTP Headers Cheat Sheet: remove X-Powered-By).
    expect(res.headers.get("x-powered-by")).toBeNull();
  });
});

describe("role escalation", () => {
  test("better-auth's own sign-up endpoint is closed, with or without a role field", async () => {
    const before = await query("select count(*) as n from user");
    for (const extra of [{}, { role: "teacher" }, { role: "teacher", studioId: ids.studioId }]) {
      const res = await probe("POST", "/api/auth/sign-up/email", "anonymous", {
        headers: { "content-type": "application/json" },
        body: JSON.stringify({ name: "Mallory Quince", email: "mallory@elsewhere.test", password: "a-long-password-1", ...extra }),
      });
      expect(res.status, res.body).toBeGreaterThanOrEqual(400);
      expect(res.status).toBeLessThan(500);
    }
    expect(await query("select count(*) as n from user")).toEqual(before);
  });

  test("the teacher sign-up ignores role and studio fields: a new teacher of a new studio", async () => {
    const action = buildActions().find((a) => a.exportedName === "signUpTeacher");
    expect(action, "the sign-up action is in the build").toBeTruthy();
    const before = await studioDigest();
    const form = new FormData();
    const email = "escalator@elsewhere.test";
    for (const [k, v] of Object.entries({
      name: "Esme Latchford", email, password: "a-long-password-2", studioName: "Ladder Studio",
      role: "student", studioId: ids.studioId, userId: "forged", membershipId: ids.studentMembershipId,
    })) form.set(k, v);
    const res = await callAction(action!, "/sign-up", "anonymous", [null, form]);
    expect(res.status).toBeLessThan(500);
    const rows = await query(
      "select m.role, m.studio_id, s.name from membership m join user u on u.id = m.user_id join studio s on s.id = m.studio_id where u.email = ?",
      [email],
    );
    expect(rows, `sign-up answered ${res.status}: ${res.body.slice(-400)}`).toHaveLength(1);
    expect(rows[0]).toMatchObject({ role: "teacher", name: "Ladder Studio" });
    expect(rows[0]!.studio_id).not.toBe(ids.studioId);
    expect(await studioDigest()).toBe(before);
  });

  test("a student cannot make herself a teacher or move studio through update-user", async () => {
    const before = await studioDigest();
    for (const body of [{ role: "teacher" }, { studioId: ids.otherStudioId, role: "teacher" }]) {
      const res = await probe("POST", "/api/auth/update-user", "demoStudent", { headers: { "content-type": "application/json" }, body: JSON.stringify(body) });
      expect(res.status).toBeLessThan(500);
    }
    const rows = await query("select m.role, m.studio_id from membership m where m.id = ?", [ids.studentMembershipId]);
    expect(rows[0]).toMatchObject({ role: "student", studio_id: ids.studioId });
    expect(await studioDigest()).toBe(before);
    // And she is still a student everywhere that counts.
    expect((await probe("GET", "/pieces", "demoStudent")).status).toBe(403);
    expect((await probe("GET", "/api/pieces", "demoStudent")).status).toBeGreaterThanOrEqual(401);
  });
});

describe("sign-in rate limiting", () => {
  test("hammering sign-in from one address gets 429 and the right password is refused while limited", async () => {
    const statuses: number[] = [];
    for (let i = 0; i < 16; i++) {
      const res = await fetch(`${baseURL}/api/auth/sign-in/email`, {
        method: "POST",
        headers: { "content-type": "application/json", origin: baseURL },
        body: JSON.stringify({ email: PERSONA_LOGINS.demoTeacher.email, password: `wrong-guess-${i}` }),
      });
      statuses.push(res.status);
    }
    expect(statuses).toContain(429);
    // Wrong guesses before the limit are plain 401s (better-auth's INVALID_EMAIL_OR_PASSWORD).
    expect(statuses.slice(0, 3).every((s) => s === 401)).toBe(true);
    const right = await fetch(`${baseURL}/api/auth/sign-in/email`, {
      method: "POST",
      headers: { "content-type": "application/json", origin: baseURL },
      body: JSON.stringify(PERSONA_LOGINS.demoTeacher),
    });
    expect(right.status).toBe(429);
  });

  test("changing X-Forwarded-For on every try does not help: with no TRUSTED_PROXY the limit keys on the socket address", async () => {
    // The test above used up the loopback address's sign-in budget. Now a different account, and a new
    // claimed address on every try (TEST-NET-3, RFC 5737): each is still 429 from the per-address
    // limiter, not the per-account one (this account has no failures yet). better-auth docs, "Rate
    // Limit → Connecting IP address"; OWASP Authentication Cheat Sheet, "Login Throttling".
    for (let i = 0; i < 5; i++) {
      const res = await fetch(`${baseURL}/api/auth/sign-in/email`, {
        method: "POST",
        headers: { "content-type": "application/json", origin: baseURL, "x-forwarded-for": `203.0.113.${i + 1}`, "x-real-ip": `203.0.113.${i + 101}` },
        body: JSON.stringify({ email: PERSONA_LOGINS.otherStudent.email, password: `rotating-guess-${i}` }),
      });
      const body = await res.text();
      expect(res.status, body).toBe(429);
      expect(body).not.toContain("TOO_MANY_FAILED_SIGN_INS");
    }
  });
});
