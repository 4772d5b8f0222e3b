/**
 * Select shapes and joins that several studio queries share, so a list, its detail and the
 * student's own view of the same rows name the same columns. The joins take a dynamic select
 * (`.$dynamic()`, drizzle's way to pass a query through a function) and add inner joins only, which
 * leave the selected row type as it was (only a left join makes columns nullable), hence the casts.
 */
import { eq } from "drizzle-orm";
import type { SQLiteColumn, SQLiteSelect } from "drizzle-orm/sqlite-core";
import { assignment, membership, practiceEntry, sheet, user } from "../schema";

/** A student as the lists name them. */
export const studentColumns = { membershipId: membership.id, name: user.name, email: user.email };

/** A practice entry's own columns, as every practice list shows them. */
export const practiceColumns = {
  id: practiceEntry.id,
  assignmentId: practiceEntry.assignmentId,
  practisedOn: practiceEntry.practisedOn,
  minutes: practiceEntry.minutes,
  tempos: practiceEntry.tempos,
  ease: practiceEntry.ease,
  comment: practiceEntry.comment,
};

/** Joins the member (`membership`) a row points at through `memberColumn`, and that member's user. */
export function joinMemberUser<T extends SQLiteSelect>(query: T, memberColumn: SQLiteColumn): T {
  return query.innerJoin(membership, eq(membership.id, memberColumn)).innerJoin(user, eq(user.id, membership.userId)) as unknown as T;
}

/** Joins a practice entry's assignment and the assignment's drill sheet. */
export function joinEntrySheet<T extends SQLiteSelect>(query: T): T {
  return query.innerJoin(assignment, eq(assignment.id, practiceEntry.assignmentId)).innerJoin(sheet, eq(sheet.id, assignment.sheetId)) as unknown as T;
}
