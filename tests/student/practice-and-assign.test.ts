// Server-side checks behind the student's practice form, the assign form and the invite form:
// bad input gets a clear message and nothing is stored (row counts unchanged).
import net from "node:net";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { countRows, useTempDatabase } from "../db/temp-db";
import { buildStudio, type StudioFixture } from "./studio-fixture";

let t: Awaited<ReturnType<typeof useTempDatabase>>;
let f: StudioFixture;
let logPractice: typeof import("../../app/(student)/my/log-practice").logPractice;
let assignSheet: typeof import("../../app/(teacher)/assignments/assign-sheet").assignSheet;
let ops: typeof import("../../app/(teacher)/students/student-ops");

const ORIGIN = "http://localhost:3000";

/** A loopback port nobody listens on: an SMTP connection to it is refused at once. */
function closedPort(): Promise<number> {
  return new Promise((resolve) => {
    const srv = net.createServer().listen(0, "127.0.0.1", () => {
      const port = (srv.address() as net.AddressInfo).port;
      srv.close(() => resolve(port));
    });
  });
}
const today = () => new Date().toISOString().slice(0, 10);
const student = (i: 0 | 1) => ({ role: "student" as const, studioId: f.studioId, membershipId: f.students[i].membershipId });
const teacher = () => ({
  role: "teacher" as const, studioId: f.studioId, studioName: "Alder Studio",
  user: { id: f.teacherUserId, name: "Ada Teacher", email: "ada-pa@knotwork.test" },
});
const entry = (over: Record<string, unknown> = {}) => ({
  assignmentId: f.assignmentId, practisedOn: today(), minutes: 20, tempos: { [f.drillIds[0]]: 66 }, ease: 3, comment: "Thumb felt late.", ...over,
});

beforeAll(async () => {
  t = await useTempDatabase("practice-assign");
  f = await buildStudio(t.db, "pa");
  ({ logPractice } = await import("../../app/(student)/my/log-practice"));
  ({ assignSheet } = await import("../../app/(teacher)/assignments/assign-sheet"));
  ops = await import("../../app/(teacher)/students/student-ops");
});
afterAll(() => t?.cleanup());

describe("logPractice", () => {
  test("a valid entry is stored with its tempo per drill", async () => {
    const before = await countRows(t.client, "practice_entry");
    const r = await logPractice(t.db, student(0), entry());
    expect(r.ok).toBe(true);
    expect(await countRows(t.client, "practice_entry")).toBe(before + 1);
    const { listPracticeEntries } = await import("@/db/queries/practice");
    const rows = await listPracticeEntries(t.db, f.studioId, { assignmentId: f.assignmentId });
    expect(rows.at(-1)?.tempos).toEqual({ [f.drillIds[0]]: 66 });
  });

  // The limits are Knotwork's own (issue #7): tempo 20–300 bpm, minutes 1–600, comment ≤ 2,000 characters.
  test.each([
    ["tempo 0", { tempos: { "DRILL": 0 } }, "tempos", /at least 20/],
    ["tempo 500", { tempos: { "DRILL": 500 } }, "tempos", /at most 300/],
    ["minutes −5", { minutes: -5 }, "minutes", /At least 1 minute/],
    ["a 10,000-character comment", { comment: "x".repeat(10_000) }, "comment", /under 2,000 characters/],
    ["ease 6", { ease: 6 }, "ease", /1 \(hard\) to 5/],
    ["a day in the future", { practisedOn: "2999-01-01" }, "practisedOn", /future/],
  ])("%s → a message on the field, nothing stored", async (_label, over, field, message) => {
    const fixed = JSON.parse(JSON.stringify(over).replace("DRILL", f.drillIds[0]));
    const before = await countRows(t.client, "practice_entry");
    const r = await logPractice(t.db, student(0), entry(fixed));
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(Object.keys(r.fieldErrors ?? {})).toContain(field);
    expect(JSON.stringify(r.fieldErrors)).toMatch(message);
    expect(await countRows(t.client, "practice_entry")).toBe(before);
  });

  test("another student's assignment id is not found, and nothing is stored", async () => {
    const before = await countRows(t.client, "practice_entry");
    const r = await logPractice(t.db, student(1), entry());
    expect(r).toEqual({ ok: false, message: "That drill sheet was not found." });
    expect(await countRows(t.client, "practice_entry")).toBe(before);
  });

  test("a tempo for a drill of another sheet is refused", async () => {
    const r = await logPractice(t.db, student(0), entry({ tempos: { "not-a-drill": 60 } }));
    expect(r.ok).toBe(false);
  });
});

describe("assignSheet", () => {
  const input = (over: Record<string, unknown> = {}) => ({
    sheetId: f.sheetId, studentMembershipIds: [f.students[1].membershipId], dueDate: "2099-06-01",
    tempoGoals: { [f.drillIds[1]]: 90 }, ...over,
  });

  test("a failed SMTP delivery is reported, the assignment is stored once and the mail waits in the outbox", async () => {
    const port = await closedPort();
    const [a0, o0] = [await countRows(t.client, "assignment"), await countRows(t.client, "outbox")];
    process.env.SMTP_URL = `smtp://127.0.0.1:${port}`;
    try {
      const r = await assignSheet(t.db, teacher(), input(), ORIGIN);
      expect(r.ok).toBe(true);
      if (!r.ok) return;
      expect(r.data.undelivered).toEqual([f.students[1].email]);
    } finally {
      delete process.env.SMTP_URL;
    }
    expect(await countRows(t.client, "assignment")).toBe(a0 + 1);
    expect(await countRows(t.client, "outbox")).toBe(o0 + 1);
    const unsent = await t.client.execute("SELECT sent_at FROM outbox ORDER BY created_at DESC LIMIT 1");
    expect(unsent.rows[0].sent_at).toBeNull();
  });

  test("assigns in one go and mails each student the link to their sheet", async () => {
    const [a0, o0] = [await countRows(t.client, "assignment"), await countRows(t.client, "outbox")];
    const r = await assignSheet(t.db, teacher(), input({ studentMembershipIds: f.students.map((s) => s.membershipId) }), ORIGIN);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(await countRows(t.client, "assignment")).toBe(a0 + 2);
    expect(await countRows(t.client, "outbox")).toBe(o0 + 2);
    const mail = await t.client.execute(`SELECT "to", text FROM outbox ORDER BY created_at DESC LIMIT 2`);
    const texts = mail.rows.map((row) => String(row.text)).join("\n");
    for (const id of r.data.ids) expect(texts).toContain(`${ORIGIN}/my/assignments/${id}`);
  });

  test.each([
    ["a due date in the past", { dueDate: "2020-01-01" }, "dueDate", /cannot be in the past/],
    ["tempo goal 0", { tempoGoals: { "DRILL": 0 } }, "tempoGoals", /at least 20/],
    ["tempo goal 500", { tempoGoals: { "DRILL": 500 } }, "tempoGoals", /at most 300/],
    ["no student", { studentMembershipIds: [] }, "studentMembershipIds", /at least one student/],
  ])("%s → a message, nothing stored or mailed", async (_l, over, field, message) => {
    const fixed = JSON.parse(JSON.stringify(over).replace("DRILL", f.drillIds[0]));
    const [a0, o0] = [await countRows(t.client, "assignment"), await countRows(t.client, "outbox")];
    const r = await assignSheet(t.db, teacher(), input(fixed), ORIGIN);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(JSON.stringify(r.fieldErrors?.[field])).toMatch(message);
    expect([await countRows(t.client, "assignment"), await countRows(t.client, "outbox")]).toEqual([a0, o0]);
  });

  test("today's date is accepted as a due date", async () => {
    const r = await assignSheet(t.db, teacher(), input({ dueDate: today() }), ORIGIN);
    expect(r.ok).toBe(true);
  });

  test("a student of another studio cannot be assigned", async () => {
    const r = await assignSheet(t.db, teacher(), input({ studentMembershipIds: ["someone-else"] }), ORIGIN);
    expect(r.ok).toBe(false);
  });
});

describe("invitations", () => {
  test("an invitation whose e-mail cannot be delivered is stored once and the teacher is told", async () => {
    const before = await countRows(t.client, "invitation");
    process.env.SMTP_URL = `smtp://127.0.0.1:${await closedPort()}`;
    try {
      const r = await ops.inviteStudent(t.db, teacher(), { email: "unreachable.pupil@knotwork.test" }, ORIGIN);
      expect(r.ok && r.data.delivered).toBe(false);
      expect(r.ok).toBe(true);
    } finally {
      delete process.env.SMTP_URL;
    }
    expect(await countRows(t.client, "invitation")).toBe(before + 1);
  });

  test("inviting stores an invitation and an outbox mail with the link; the link works once", async () => {
    const o0 = await countRows(t.client, "outbox");
    const r = await ops.inviteStudent(t.db, teacher(), { email: "New.Pupil@knotwork.test" }, ORIGIN);
    expect(r).toEqual({ ok: true, data: { email: "new.pupil@knotwork.test", delivered: true } });
    expect(await countRows(t.client, "outbox")).toBe(o0 + 1);
    const row = (await t.client.execute(`SELECT text FROM outbox WHERE "to" = 'new.pupil@knotwork.test'`)).rows[0];
    const token = String(row.text).match(/\/invite\/([\w-]+)/)?.[1];
    expect(token).toBeTruthy();
    const { invitationByToken } = await import("@/db/queries/invitations");
    const { acceptInvitation } = await import("@/lib/students/invitations");
    expect((await invitationByToken(t.db, token!)).state).toBe("valid");
    expect((await acceptInvitation(token!, { name: "New Pupil", password: "practise-daily" }, t.db)).ok).toBe(true);
    expect((await invitationByToken(t.db, token!)).state).toBe("used");
    const users = await countRows(t.client, "user");
    const again = await acceptInvitation(token!, { name: "Someone Else", password: "practise-daily" }, t.db);
    expect(again.ok ? "" : again.message).toMatch(/already been used/);
    expect(await countRows(t.client, "user")).toBe(users);
  });

  test("an expired link is reported as expired and stores nothing", async () => {
    const { createInvitation, acceptInvitation } = await import("@/lib/students/invitations");
    const { invitationByToken } = await import("@/db/queries/invitations");
    const { token } = await createInvitation({ studioId: f.studioId, email: "late@knotwork.test", invitedBy: f.teacherUserId, ttlMs: -1000 }, t.db);
    expect((await invitationByToken(t.db, token)).state).toBe("expired");
    const users = await countRows(t.client, "user");
    const r = await acceptInvitation(token, { name: "Late Pupil", password: "practise-daily" }, t.db);
    expect(r.ok ? "" : r.message).toMatch(/expired/);
    expect(await countRows(t.client, "user")).toBe(users);
  });

  test("inviting a current member is refused", async () => {
    const r = await ops.inviteStudent(t.db, teacher(), { email: f.students[0].email }, ORIGIN);
    expect(r.ok).toBe(false);
  });
});

describe("updateHandProfile", () => {
  test("inches are a measured full span: 8.5 in → 215.9 mm − one white key (23.59 mm) ≈ 192.3 mm (FACTS.md §1, §4)", async () => {
    const r = await ops.updateHandProfile(t.db, teacher(), { membershipId: f.students[0].membershipId, unit: "in", span: 8.5, octave: "standard" });
    expect(r.ok && r.data.spanMm).toBeCloseTo(192.3, 1);
  });
  test("a narrow keyboard DS 5.5 stores a 139.7 mm octave (FACTS.md §1, 5.5 in × 25.4)", async () => {
    const r = await ops.updateHandProfile(t.db, teacher(), { membershipId: f.students[0].membershipId, unit: "mm", span: 170, octave: "ds5.5" });
    expect(r).toEqual({ ok: true, data: { spanMm: 170, octaveMm: 139.7 } });
  });
  test("a 20 mm span is refused with a message", async () => {
    const r = await ops.updateHandProfile(t.db, teacher(), { membershipId: f.students[0].membershipId, unit: "mm", span: 20, octave: "standard" });
    expect(r.ok ? "" : JSON.stringify(r.fieldErrors)).toMatch(/between 100 and 280 mm/);
  });
});
