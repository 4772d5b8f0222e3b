/**
 * Seeds the hardening database: the demo studio (lib/demo/seed.ts), one saved drill sheet with an
 * assignment, a practice entry and an open invitation in it, and a second, unrelated studio with its
 * own teacher and student. Writes the ids the access-control suite maps route segments to.
 *
 * Run with tsx: `DATABASE_URL=file:… tsx tests/hardening/seed-studios.ts <ids.json>`.
 */
import fs from "node:fs";
import { and, eq } from "drizzle-orm";
import { db, dbClient } from "../../db";
import { runMigrations } from "../../db/migrate";
import { getKnotSource } from "../../db/queries/knot-drills";
import { insertPracticeEntry } from "../../db/queries/practice";
import { saveSheet } from "../../db/queries/sheets";
import { createAssignments } from "../../db/queries/assignments";
import { DEMO_PASSWORD, DEMO_STUDENTS, DEMO_TEACHER, seedDemo } from "../../lib/demo/seed";
import { membership, passage, practiceEntry, score, sheetDrill, user } from "../../db/schema";
import { acceptInvitation, createInvitation } from "../../lib/students/invitations";
import { generateForKnot } from "../../lib/knots/generate";
import { pickedDrills } from "../../lib/sheets/save";
import { createTeacherAccount } from "../../lib/auth/teacher-sign-up";
import { OTHER_STUDENT, OTHER_TEACHER, SEEDED_SHEET_TITLE, type SeedIds } from "./personas";

async function membershipOf(email: string) {
  const [row] = await db
    .select({ id: membership.id, userId: membership.userId, studioId: membership.studioId })
    .from(membership)
    .innerJoin(user, eq(user.id, membership.userId))
    .where(eq(user.email, email))
    .limit(1);
  if (!row) throw new Error(`no membership for ${email}`);
  return row;
}

async function main(out: string) {
  await runMigrations(db);
  const { studioId } = await seedDemo(db);
  const teacher = await membershipOf(DEMO_TEACHER.email);
  const student = await membershipOf(DEMO_STUDENTS[0].email);
  const secondStudent = await membershipOf(DEMO_STUDENTS[1].email);
  const [knot] = await db.select({ id: passage.id, scoreId: passage.scoreId }).from(passage).where(eq(passage.studioId, studioId)).limit(1);
  if (!knot) throw new Error("the demo studio has no knot");

  const src = await getKnotSource(db, studioId, knot.id);
  if (!src) throw new Error("knot source missing");
  const generated = generateForKnot(src, { families: ["blocking", "stops"], options: {} });
  const picks = generated.drills.slice(0, 3).map((d) => ({ key: d.key, studentNote: "", tempo: { start: 60, target: 80 } }));
  const sheetId = await saveSheet(db, {
    studioId,
    createdBy: teacher.userId,
    passageId: knot.id,
    title: SEEDED_SHEET_TITLE,
    drills: pickedDrills(generated, picks),
  });
  const [drill] = await db.select({ id: sheetDrill.id }).from(sheetDrill).where(eq(sheetDrill.sheetId, sheetId)).limit(1);
  const [assignmentId] = await createAssignments(db, {
    studioId,
    sheetId,
    studentMembershipIds: [student.id],
    dueDate: "2031-05-01",
    tempoGoals: {},
    note: "Slow hands, quiet wrist.",
    createdBy: teacher.userId,
  });
  const practiceEntryId = await insertPracticeEntry(db, {
    studioId,
    assignmentId,
    studentMembershipId: student.id,
    practisedOn: "2031-04-20",
    minutes: 15,
    tempos: {},
    ease: 3,
    comment: "Bar two still uneven.",
  });
  const invite = await createInvitation({ studioId, email: "newcomer@knotwork.test", invitedBy: teacher.userId });

  // A second studio: its members must never see anything of the demo studio.
  const other = await createTeacherAccount(db, { ...OTHER_TEACHER, password: DEMO_PASSWORD });
  if (!other.ok) throw new Error(other.message);
  const otherInvite = await createInvitation({ studioId: other.data.studioId, email: OTHER_STUDENT.email, invitedBy: other.data.userId });
  const otherStudent = await acceptInvitation(otherInvite.token, { name: OTHER_STUDENT.name, password: DEMO_PASSWORD });
  if (!otherStudent.ok) throw new Error(otherStudent.message);

  const scores = await db.select({ id: score.id, title: score.title }).from(score).where(eq(score.studioId, studioId));
  const [entry] = await db.select({ id: practiceEntry.id }).from(practiceEntry).where(and(eq(practiceEntry.id, practiceEntryId)));
  const ids: SeedIds = {
    studioId,
    scoreId: knot.scoreId,
    passageId: knot.id,
    sheetId,
    sheetDrillId: drill.id,
    assignmentId,
    practiceEntryId: entry.id,
    studentMembershipId: student.id,
    secondStudentMembershipId: secondStudent.id,
    invitationId: invite.id,
    invitationToken: invite.token,
    otherStudioId: other.data.studioId,
    pieceTitles: scores.map((s) => s.title),
    drillKeys: picks.map((p) => p.key),
  };
  fs.writeFileSync(out, JSON.stringify(ids, null, 2));
  dbClient().close();
}

main(process.argv[2] ?? "ids.json").catch((err) => {
  console.error(err);
  process.exit(1);
});
