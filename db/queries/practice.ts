import { asc, desc, eq } from "drizzle-orm";
import { inStudio } from "../scope";
import type { Db } from "../index";
import { practiceEntry, sheet, user } from "../schema";
import { joinEntrySheet, joinMemberUser, practiceColumns } from "./joins";

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
  const query = database
    .select({ ...practiceColumns, studentMembershipId: practiceEntry.studentMembershipId, studentName: user.name, sheetTitle: sheet.title })
    .from(practiceEntry)
    .$dynamic();
  return joinMemberUser(joinEntrySheet(query), practiceEntry.studentMembershipId)
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

/** A student's own practice entries, most recent day first (their practice log). */
export async function listPracticeForStudent(database: Db, studioId: string, membershipId: string) {
  const query = database.select({ ...practiceColumns, sheetTitle: sheet.title }).from(practiceEntry).$dynamic();
  return joinEntrySheet(query)
    .where(inStudio(practiceEntry, studioId, eq(practiceEntry.studentMembershipId, membershipId)))
    .orderBy(desc(practiceEntry.practisedOn), desc(practiceEntry.createdAt));
}
