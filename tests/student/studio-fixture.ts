// A small invented studio for the student-side tests: one teacher, two students, one saved drill
// sheet of three drills cut from a demo piece (composed for Knotwork), assigned to the first student.
import type { Db } from "@/db";
import { demoPiece, firstBars } from "../handout/sample-sheet";

export const PASSWORDS = { teacher: "teach-slowly", student: "practise-daily" } as const;

export interface StudioFixture {
  studioId: string;
  teacherUserId: string;
  teacherMembershipId: string;
  sheetId: string;
  drillIds: string[];
  drillTitles: string[];
  students: { membershipId: string; email: string; name: string }[];
  assignmentId: string;
}

export async function buildStudio(db: Db, tag: string): Promise<StudioFixture> {
  const { createTeacherAccount } = await import("@/lib/auth/teacher-sign-up");
  const { createInvitation, acceptInvitation } = await import("@/lib/students/invitations");
  const { findMembershipForUser } = await import("@/db/queries/memberships");
  const { saveSheet, getSheet } = await import("@/db/queries/sheets");
  const { createAssignments } = await import("@/db/queries/assignments");
  const teacher = await createTeacherAccount(db, {
    name: "Ada Teacher", email: `ada-${tag}@knotwork.test`, password: PASSWORDS.teacher, studioName: "Alder Studio",
  });
  if (!teacher.ok) throw new Error(teacher.message);
  const { studioId, userId } = teacher.data;
  const students = [];
  for (const name of ["Sol Student", "Mira Student"]) {
    const email = `${name.split(" ")[0].toLowerCase()}-${tag}@knotwork.test`;
    const { token } = await createInvitation({ studioId, email, invitedBy: userId }, db);
    const s = await acceptInvitation(token, { name, password: PASSWORDS.student }, db);
    if (!s.ok) throw new Error(s.message);
    students.push({ membershipId: s.data.membershipId, email, name });
  }
  const study = demoPiece("pebble-study");
  const drillTitles = ["Blocked groups, bar 1", "Stops on the third note", "Dotted pairs ♯ and ♭"];
  const sheetId = await saveSheet(db, {
    studioId,
    createdBy: userId,
    passageId: null,
    title: "Even triplets in the study",
    drills: drillTitles.map((title, i) => ({
      family: "blocking",
      variant: "plain",
      title,
      teacherNote: "",
      studentNote: `Play it ${i + 1} times, light wrist.`,
      musicxml: firstBars(study, 1, i),
      meta: { tempo: { start: 50, target: 72 } },
    })),
  });
  const sheet = await getSheet(db, studioId, sheetId);
  const drillIds = sheet!.drills.map((d) => d.id);
  const [assignmentId] = await createAssignments(db, {
    studioId, sheetId, studentMembershipIds: [students[0].membershipId], dueDate: "2099-01-01",
    tempoGoals: Object.fromEntries(drillIds.map((id) => [id, 80])), note: null, createdBy: userId,
  });
  const teacherMember = await findMembershipForUser(db, userId);
  return { studioId, teacherUserId: userId, teacherMembershipId: teacherMember!.membershipId, sheetId, drillIds, drillTitles, students, assignmentId };
}

/** The better-auth session cookie for an e-mail and password. */
export async function cookieFor(email: string, password: string): Promise<string> {
  const { auth } = await import("@/lib/auth");
  const res = await auth.api.signInEmail({ body: { email, password }, returnHeaders: true });
  const token = (res.headers.get("set-cookie") ?? "").match(/(better-auth\.session_token=[^;]+)/)?.[1];
  if (!token) throw new Error(`no session cookie for ${email}`);
  return token;
}
