import { desc, eq } from "drizzle-orm";
import { inStudio } from "../../lib/studio-scope";
import type { Db } from "../index";
import { assignment, practiceEntry, sheet } from "../schema";

/** A student's assignments (their drill sheets), newest first. */
export async function listAssignmentsForStudent(database: Db, studioId: string, membershipId: string) {
  return database
    .select({
      id: assignment.id,
      sheetId: assignment.sheetId,
      title: sheet.title,
      dueDate: assignment.dueDate,
      note: assignment.note,
    })
    .from(assignment)
    .innerJoin(sheet, eq(sheet.id, assignment.sheetId))
    .where(inStudio(assignment, studioId, eq(assignment.studentMembershipId, membershipId)))
    .orderBy(desc(assignment.createdAt));
}

/** A student's practice entries, most recent day first. */
export async function listPracticeForStudent(database: Db, studioId: string, membershipId: string) {
  return database
    .select({
      id: practiceEntry.id,
      practisedOn: practiceEntry.practisedOn,
      minutes: practiceEntry.minutes,
      ease: practiceEntry.ease,
      comment: practiceEntry.comment,
      sheetTitle: sheet.title,
    })
    .from(practiceEntry)
    .innerJoin(assignment, eq(assignment.id, practiceEntry.assignmentId))
    .innerJoin(sheet, eq(sheet.id, assignment.sheetId))
    .where(inStudio(practiceEntry, studioId, eq(practiceEntry.studentMembershipId, membershipId)))
    .orderBy(desc(practiceEntry.practisedOn));
}
