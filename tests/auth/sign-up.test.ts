import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { countRows, useTempDatabase } from "../db/temp-db";

let t: Awaited<ReturnType<typeof useTempDatabase>>;
let createTeacherAccount: typeof import("../../lib/auth/teacher-sign-up").createTeacherAccount;
let auth: typeof import("../../lib/auth").auth;

beforeAll(async () => {
  t = await useTempDatabase("sign-up");
  ({ createTeacherAccount } = await import("../../lib/auth/teacher-sign-up"));
  ({ auth } = await import("../../lib/auth"));
});
afterAll(() => t.cleanup());

const good = { name: "Maren Osei", email: "maren@knotwork.test", password: "correct horse 8", studioName: "Quince Row Studio" };

async function counts() {
  const out: Record<string, number> = {};
  for (const table of ["user", "account", "studio", "membership", "session"]) out[table] = await countRows(t.client, table);
  return out;
}

describe("teacher sign-up", () => {
  test("creates the user, a credential account, a studio and a teacher membership", async () => {
    const res = await createTeacherAccount(t.db, good);
    expect(res.ok).toBe(true);
    if (!res.ok) return;
    const m = await t.client.execute({
      sql: "SELECT m.role, s.name FROM membership m JOIN studio s ON s.id = m.studio_id WHERE m.user_id = ?",
      args: [res.data.userId],
    });
    expect(m.rows).toHaveLength(1);
    expect(m.rows[0]).toMatchObject({ role: "teacher", name: "Quince Row Studio" });
    // The stored hash is better-auth's: signing in through better-auth works with the password.
    const signIn = await auth.api.signInEmail({ body: { email: good.email, password: good.password } });
    expect(signIn.user.id).toBe(res.data.userId);
    await expect(
      auth.api.signInEmail({ body: { email: good.email, password: "wrong password" } }),
    ).rejects.toThrow();
  });

  test("a role or studioId sent in the body is ignored: always a new teacher studio", async () => {
    const other = await t.client.execute("INSERT INTO studio (id, name) VALUES ('victim', 'Other Studio') RETURNING id");
    expect(other.rows).toHaveLength(1);
    const res = await createTeacherAccount(t.db, {
      ...good,
      email: "sneaky@knotwork.test",
      role: "student",
      studioId: "victim",
    });
    expect(res.ok).toBe(true);
    if (!res.ok) return;
    expect(res.data.studioId).not.toBe("victim");
    const m = await t.client.execute({ sql: "SELECT role, studio_id FROM membership WHERE user_id = ?", args: [res.data.userId] });
    expect(m.rows).toEqual([expect.objectContaining({ role: "teacher", studio_id: res.data.studioId })]);
    const victims = await t.client.execute("SELECT count(*) AS n FROM membership WHERE studio_id = 'victim'");
    expect(Number((victims.rows[0] as unknown as { n: number }).n)).toBe(0);
  });

  test("better-auth's own sign-up endpoint is closed, so a client cannot create a user with any role", async () => {
    const before = await counts();
    for (const role of ["student", "teacher"]) {
      const res = await auth.handler(
        new Request("http://localhost:3000/api/auth/sign-up/email", {
          method: "POST",
          headers: { "content-type": "application/json", origin: "http://localhost:3000" },
          body: JSON.stringify({ name: "Rogue", email: `rogue-${role}@knotwork.test`, password: "password123", role, studioId: "victim" }),
        }),
      );
      expect(res.status).toBeGreaterThanOrEqual(400);
    }
    expect(await counts()).toEqual(before);
  });

  test.each([
    ["bad e-mail", { ...good, email: "not-an-email" }, "email", /valid address/],
    ["short password", { ...good, email: "short@knotwork.test", password: "seven77" }, "password", /at least 8/],
    ["missing name", { ...good, email: "noname@knotwork.test", name: "  " }, "name", /Name is required/],
    ["missing studio name", { ...good, email: "nostudio@knotwork.test", studioName: "" }, "studioName", /Studio name is required/],
    ["duplicate e-mail", { ...good, email: "MAREN@knotwork.test" }, "email", /already exists/],
  ])("%s gives a message naming the field and stores nothing", async (_label, input, field, message) => {
    const before = await counts();
    const res = await createTeacherAccount(t.db, input);
    expect(res.ok).toBe(false);
    if (res.ok) return;
    expect(res.fieldErrors?.[field]?.join(" ")).toMatch(message);
    expect(JSON.stringify(res)).not.toContain(input.password);
    expect(await counts()).toEqual(before);
  });
});
