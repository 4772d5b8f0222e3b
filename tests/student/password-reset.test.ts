// better-auth's password reset sends its link through Knotwork's mail: it lands in the outbox.
import { afterAll, beforeAll, expect, test } from "vitest";
import { countRows, useTempDatabase } from "../db/temp-db";
import { buildStudio, PASSWORDS } from "./studio-fixture";

let t: Awaited<ReturnType<typeof useTempDatabase>>;
beforeAll(async () => {
  t = await useTempDatabase("reset");
  await buildStudio(t.db, "reset");
});
afterAll(() => t?.cleanup());

test("a reset request stores a mail with the link; the token sets a new password", async () => {
  const { auth } = await import("@/lib/auth");
  const before = await countRows(t.client, "outbox");
  await auth.api.requestPasswordReset({ body: { email: "sol-reset@knotwork.test", redirectTo: "/reset-password" } });
  expect(await countRows(t.client, "outbox")).toBe(before + 1);
  const row = (await t.client.execute(`SELECT "to", subject, text FROM outbox ORDER BY created_at DESC LIMIT 1`)).rows[0];
  expect(row.to).toBe("sol-reset@knotwork.test");
  const token = String(row.text).match(/reset-password\/([\w-]+)/)?.[1];
  expect(token).toBeTruthy();
  await auth.api.resetPassword({ body: { token: token!, newPassword: "a-new-slow-password" } });
  await expect(auth.api.signInEmail({ body: { email: "sol-reset@knotwork.test", password: PASSWORDS.student } })).rejects.toThrow();
  const ok = await auth.api.signInEmail({ body: { email: "sol-reset@knotwork.test", password: "a-new-slow-password" } });
  expect(ok.user.email).toBe("sol-reset@knotwork.test");
});

test("an unknown e-mail stores no mail", async () => {
  const { auth } = await import("@/lib/auth");
  const before = await countRows(t.client, "outbox");
  await auth.api.requestPasswordReset({ body: { email: "nobody@knotwork.test", redirectTo: "/reset-password" } });
  expect(await countRows(t.client, "outbox")).toBe(before);
});
