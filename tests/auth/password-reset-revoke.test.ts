// A password reset signs the account out everywhere and voids the other reset links.
// OWASP Forgot Password Cheat Sheet: reset tokens are single use; after a reset, existing sessions are
// invalidated. better-auth docs: emailAndPassword.revokeSessionsOnPasswordReset, onPasswordReset.
import { afterAll, beforeAll, describe, expect, test, vi } from "vitest";
import { useTempDatabase } from "../db/temp-db";
import { memberCookie } from "../sheets/member-cookie";
import { buildStudio, PASSWORDS } from "../student/studio-fixture";

const request = vi.hoisted(() => ({ headers: new Headers() }));
vi.mock("next/headers", () => ({
  headers: async () => request.headers,
  cookies: async () => ({ get: () => undefined, getAll: () => [], set: () => undefined, delete: () => undefined }),
}));

let t: Awaited<ReturnType<typeof useTempDatabase>>;
const email = "sol-revoke@knotwork.test";

beforeAll(async () => {
  t = await useTempDatabase("reset-revoke");
  await buildStudio(t.db, "revoke");
});
afterAll(() => t?.cleanup());

async function resetLink(): Promise<string> {
  const { auth } = await import("@/lib/auth");
  await auth.api.requestPasswordReset({ body: { email, redirectTo: "/reset-password" } });
  const row = (await t.client.execute(`SELECT text FROM outbox WHERE "to" = ? ORDER BY created_at DESC, rowid DESC LIMIT 1`, [email])).rows[0];
  return String(row.text).match(/reset-password\/([\w-]+)/)![1];
}

/** The studio context the app computes for a Cookie header (lib/session.ts, as every page and route uses it). */
async function contextFor(cookie: string) {
  vi.resetModules(); // a fresh request: React cache and the session memo start empty
  request.headers = new Headers({ cookie });
  const { getStudioContext } = await import("@/lib/auth/session");
  return getStudioContext();
}

describe("password reset", () => {
  test("revokes the user's other sessions, even with the signed cookie copy still in the browser", async () => {
    const laptop = await memberCookie(email, PASSWORDS.student);
    const phone = await memberCookie(email, PASSWORDS.student);
    expect(laptop).toContain("session_data"); // the cookie cache copy is there
    expect((await contextFor(laptop))?.role).toBe("student");
    expect((await contextFor(phone))?.role).toBe("student");

    const token = await resetLink();
    const { auth } = await import("@/lib/auth");
    await auth.api.resetPassword({ body: { token, newPassword: "a-brand-new-password" } });

    const userId = String((await t.client.execute("select id from user where email = ?", [email])).rows[0].id);
    expect(Number((await t.client.execute("select count(*) as n from session where user_id = ?", [userId])).rows[0].n)).toBe(0);
    expect(await contextFor(laptop)).toBeNull();
    expect(await contextFor(phone)).toBeNull();
    // The new password works and gives a working session.
    expect((await contextFor(await memberCookie(email, "a-brand-new-password")))?.role).toBe("student");
  });

  test("using one reset link voids every other outstanding link of the account", async () => {
    const first = await resetLink();
    const second = await resetLink();
    const third = await resetLink();
    expect(new Set([first, second, third]).size).toBe(3);
    const { auth } = await import("@/lib/auth");
    await auth.api.resetPassword({ body: { token: second, newPassword: "second-new-password" } });
    for (const token of [first, third, second]) {
      await expect(auth.api.resetPassword({ body: { token, newPassword: "attacker-password-1" } })).rejects.toThrow(/invalid token/i);
    }
    const ok = await auth.api.signInEmail({ body: { email, password: "second-new-password" } });
    expect(ok.user.email).toBe(email);
  });
});
