import type { Db } from "@/db";
import { createAssignments, studentsById } from "@/db/queries/assignments";
import { getSheet } from "@/db/queries/sheets";
import { fail, fromZodError, ok, type ActionResult } from "@/lib/action-result";
import { assignmentMail, sendMail } from "@/lib/mail";
import type { StudioContext } from "@/lib/auth/session";
import { AssignmentInput } from "./assignment-input";

/**
 * Assigns a sheet of the teacher's studio to students of the same studio, all in one transaction,
 * then e-mails each student the link to their drill sheet.
 */
export async function assignSheet(
  database: Db,
  ctx: Pick<StudioContext, "role" | "studioId" | "user">,
  raw: unknown,
  origin: string,
): Promise<ActionResult<{ ids: string[]; undelivered: string[] }>> {
  if (ctx.role !== "teacher") return fail("Only teachers assign drill sheets.");
  const parsed = AssignmentInput.safeParse(raw);
  if (!parsed.success) return fromZodError(parsed.error);
  const input = parsed.data;
  const sheet = await getSheet(database, ctx.studioId, input.sheetId);
  if (!sheet) return fail("That drill sheet was not found.");
  const unique = [...new Set(input.studentMembershipIds)];
  const students = await studentsById(database, ctx.studioId, unique);
  if (students.length !== unique.length) return fail("One of the students is not in your studio.");
  const drillIds = new Set(sheet.drills.map((d) => d.id));
  const tempoGoals: Record<string, number> = {};
  for (const [id, bpm] of Object.entries(input.tempoGoals)) {
    if (bpm === undefined) continue;
    if (!drillIds.has(id)) return fail("A tempo goal was given for a drill that is not on this sheet.");
    tempoGoals[id] = bpm;
  }
  const ids = await createAssignments(database, {
    studioId: ctx.studioId,
    sheetId: sheet.id,
    studentMembershipIds: unique,
    dueDate: input.dueDate,
    tempoGoals,
    note: input.note?.trim() ? input.note.trim() : null,
    createdBy: ctx.user.id,
  });
  const undelivered: string[] = [];
  for (const [i, membershipId] of unique.entries()) {
    const s = students.find((x) => x.membershipId === membershipId)!;
    const mail = assignmentMail({
      studentName: s.name,
      sheetTitle: sheet.title,
      teacherName: ctx.user.name,
      dueDate: input.dueDate,
      link: `${origin}/my/assignments/${ids[i]}`,
    });
    const sent = await sendMail({ to: s.email, ...mail, studioId: ctx.studioId }, database);
    if (sent.error) undelivered.push(s.email);
  }
  return ok({ ids, undelivered });
}
