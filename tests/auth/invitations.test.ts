import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { countRows, useTempDatabase } from "../db/temp-db";

let t: Awaited<ReturnType<typeof useTempDatabase>>;
let inv: typeof import("../../lib/students/invitations");
let auth: typeof import("../../lib/auth").auth;

beforeAll(async () => {
  t = await useTempDatabase("invitations");
  inv = await import("../../lib/students/invitations");
  ({ auth } = await import("../../lib/auth"));
  await t.client.execute("INSERT INTO studio (id, name) VALUES ('s1', 'Quince Row Studio')");
});
afterAll(() => t.cleanup());

describe("acceptInvitation", () => {
  test("creates a student member once, then refuses the same token", async () => {
    const { token } = await inv.createInvitation({ studioId: "s1", email: "Pip@knotwork.test", invitedBy: null }, t.db);
    const stored = await t.client.execute("SELECT token_hash FROM invitation");
    expect(JSON.stringify(stored.rows)).not.toContain(token);

    const first = await inv.acceptInvitation(token, { name: "Pip Ashdown", password: "scales-daily" }, t.db);
    expect(first.ok).toBe(true);
    if (!first.ok) return;
    const m = await t.client.execute({ sql: "SELECT role, studio_id FROM membership WHERE user_id = ?", args: [first.data.userId] });
    expect(m.rows).toEqual([expect.objectContaining({ role: "student", studio_id: "s1" })]);
    const signIn = await auth.api.signInEmail({ body: { email: "pip@knotwork.test", password: "scales-daily" } });
    expect(signIn.user.id).toBe(first.data.userId);

    const users = await countRows(t.client, "user");
    const again = await inv.acceptInvitation(token, { name: "Pip Again", password: "scales-daily" }, t.db);
    expect(again.ok).toBe(false);
    if (!again.ok) expect(again.message).toMatch(/already been used/);
    expect(await countRows(t.client, "user")).toBe(users);
  });

  test("refuses an expired token and an unknown token, storing nothing", async () => {
    const issued = new Date("2030-01-01T10:00:00Z");
    const { token } = await inv.createInvitation(
      { studioId: "s1", email: "late@knotwork.test", invitedBy: null, ttlMs: 60_000, now: issued },
      t.db,
    );
    const users = await countRows(t.client, "user");
    const later = new Date(issued.getTime() + 60_001);
    const expired = await inv.acceptInvitation(token, { name: "Late Student", password: "scales-daily" }, t.db, later);
    expect(expired.ok).toBe(false);
    if (!expired.ok) expect(expired.message).toMatch(/expired/);
    const unknown = await inv.acceptInvitation("not-a-token", { name: "Nobody", password: "scales-daily" }, t.db);
    expect(unknown.ok).toBe(false);
    expect(await countRows(t.client, "user")).toBe(users);
    // Still valid just before the deadline.
    const inTime = await inv.acceptInvitation(token, { name: "Late Student", password: "scales-daily" }, t.db, new Date(issued.getTime() + 59_000));
    expect(inTime.ok).toBe(true);
  });

  test("a short password is refused with a field message", async () => {
    const { token } = await inv.createInvitation({ studioId: "s1", email: "short@knotwork.test", invitedBy: null }, t.db);
    const res = await inv.acceptInvitation(token, { name: "Short", password: "abc" }, t.db);
    expect(res.ok).toBe(false);
    if (!res.ok) expect(res.fieldErrors?.password?.[0]).toMatch(/at least 8/);
  });
});
