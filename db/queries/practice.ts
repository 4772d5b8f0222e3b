import { asc, eq } from "drizzle-orm";
import { inStudio } from "../scope";
import type { Db } from "../index";
import { assignment, membership, practiceEntry, sheet, user } from "../schema";

export interface NewPracticeEntry {
  studioId: string;
  assignmentId: string;
  studentMembershipId: string;
  practisedOn: string;
  minutes: number;
  tempos: Record<string, number>;
  ease: number;
  comment: string | null;
}

/** Stores one practice entry; returns its id. */
export async function insertPracticeEntry(database: Db, input: NewPracticeEntry): Promise<string> {
  const id = crypto.randomUUID();
  await database.insert(practiceEntry).values({ id, ...input });
  return id;
}

/**
 * The studio's practice entries, oldest day first (chart order), optionally for one student and/or
 * one assignment. With the student's own membership id it is also the student's history.
 */
export async function listPracticeEntries(
  database: Db,
  studioId: string,
  filter: { studentMembershipId?: string; assignmentId?: string } = {},
) {
  return database
    .select({
      id: practiceEntry.id,
      assignmentId: practiceEntry.assignmentId,
      studentMembershipId: practiceEntry.studentMembershipId,
      studentName: user.name,
      sheetTitle: sheet.title,
      practisedOn: practiceEntry.practisedOn,
      minutes: practiceEntry.minutes,
      tempos: practiceEntry.tempos,
      ease: practiceEntry.ease,
      comment: practiceEntry.comment,
    })
    .from(practiceEntry)
    .innerJoin(assignment, eq(assignment.id, practiceEntry.assignmentId))
    .innerJoin(sheet, eq(sheet.id, assignment.sheetId))
    .innerJoin(membership, eq(membership.id, practiceEntry.studentMembershipId))
    .innerJoin(user, eq(user.id, membership.userId))
    .where(
      inStudio(
        practiceEntry,
        studioId,
        filter.studentMembershipId ? eq(practiceEntry.studentMembershipId, filter.studentMembershipId) : undefined,
        filter.assignmentId ? eq(practiceEntry.assignmentId, filter.assignmentId) : undefined,
      ),
    )
    .orderBy(asc(practiceEntry.practisedOn), asc(practiceEntry.createdAt));
}
