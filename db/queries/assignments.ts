import { and, asc, desc, eq, inArray } from "drizzle-orm";
import { inStudio } from "../scope";
import { joinMemberUser, studentColumns } from "./joins";
import type { Db } from "../index";
import { assignment, membership, passage, score, sheet, sheetDrill, user } from "../schema";

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

/** Every assignment of the studio with its student and sheet, newest first (the teacher's list). */
export async function listAssignmentsForStudio(database: Db, studioId: string) {
  const query = database
    .select({
      id: assignment.id,
      sheetId: assignment.sheetId,
      sheetTitle: sheet.title,
      studentMembershipId: assignment.studentMembershipId,
      studentName: user.name,
      dueDate: assignment.dueDate,
      createdAt: assignment.createdAt,
    })
    .from(assignment)
    .innerJoin(sheet, eq(sheet.id, assignment.sheetId))
    .$dynamic();
  return joinMemberUser(query, assignment.studentMembershipId).where(inStudio(assignment, studioId)).orderBy(desc(assignment.createdAt));
}

/**
 * One assignment with its sheet, piece and drills: for the student only their own (pass their
 * membership id), for a teacher any of the studio (pass null). Null when out of reach.
 */
export async function getAssignment(database: Db, studioId: string, assignmentId: string, studentMembershipId: string | null) {
  const where = inStudio(
    assignment,
    studioId,
    eq(assignment.id, assignmentId),
    studentMembershipId ? eq(assignment.studentMembershipId, studentMembershipId) : undefined,
  );
  const query = database
    .select({
      assignment,
      sheetTitle: sheet.title,
      sheetNotes: sheet.notes,
      pieceTitle: score.title,
      fromBar: passage.fromBar,
      toBar: passage.toBar,
      hand: passage.hand,
      studentName: user.name,
    })
    .from(assignment)
    .innerJoin(sheet, eq(sheet.id, assignment.sheetId))
    .leftJoin(passage, eq(passage.id, sheet.passageId))
    .leftJoin(score, eq(score.id, passage.scoreId))
    .$dynamic();
  const [row] = await joinMemberUser(query, assignment.studentMembershipId).where(where).limit(1);
  if (!row) return null;
  const drills = await database
    .select()
    .from(sheetDrill)
    .where(eq(sheetDrill.sheetId, row.assignment.sheetId))
    .orderBy(asc(sheetDrill.position));
  return { ...row, drills };
}

/** True when this student has the sheet assigned (in this studio). */
export async function studentHasSheet(database: Db, studioId: string, membershipId: string, sheetId: string) {
  const [row] = await database
    .select({ id: assignment.id })
    .from(assignment)
    .where(inStudio(assignment, studioId, eq(assignment.sheetId, sheetId), eq(assignment.studentMembershipId, membershipId)))
    .limit(1);
  return Boolean(row);
}

export interface NewAssignments {
  studioId: string;
  sheetId: string;
  studentMembershipIds: readonly string[];
  dueDate: string | null;
  tempoGoals: Record<string, number>;
  note: string | null;
  createdBy: string;
}

/** Creates one assignment per student in one transaction; returns the new ids in the students' order. */
export async function createAssignments(database: Db, input: NewAssignments): Promise<string[]> {
  return database.transaction(async (tx) => {
    const ids: string[] = [];
    for (const studentMembershipId of input.studentMembershipIds) {
      const id = crypto.randomUUID();
      await tx.insert(assignment).values({
        id,
        studioId: input.studioId,
        sheetId: input.sheetId,
        studentMembershipId,
        dueDate: input.dueDate,
        tempoGoals: input.tempoGoals,
        note: input.note,
        createdBy: input.createdBy,
      });
      ids.push(id);
    }
    return ids;
  });
}

/** The studio's students among `membershipIds`, with name and e-mail (unknown or foreign ids drop out). */
export async function studentsById(database: Db, studioId: string, membershipIds: readonly string[]) {
  if (membershipIds.length === 0) return [];
  return database
    .select(studentColumns)
    .from(membership)
    .innerJoin(user, eq(user.id, membership.userId))
    .where(and(eq(membership.studioId, studioId), eq(membership.role, "student"), inArray(membership.id, [...membershipIds])));
}

/** The piece title and bars a sheet was made from (via its knot), or nulls when the knot is gone. */
export async function sheetSource(database: Db, studioId: string, passageId: string | null) {
  if (!passageId) return null;
  const [row] = await database
    .select({ pieceTitle: score.title, fromBar: passage.fromBar, toBar: passage.toBar, hand: passage.hand })
    .from(passage)
    .innerJoin(score, eq(score.id, passage.scoreId))
    .where(inStudio(passage, studioId, eq(passage.id, passageId)))
    .limit(1);
  return row ?? null;
}

/** The newest assignment of a sheet to one student (for their tempo goals on a handout), or null. */
export async function latestAssignmentOfSheet(database: Db, studioId: string, sheetId: string, studentMembershipId: string) {
  const [row] = await database
    .select({ id: assignment.id, tempoGoals: assignment.tempoGoals, dueDate: assignment.dueDate })
    .from(assignment)
    .where(inStudio(assignment, studioId, eq(assignment.sheetId, sheetId), eq(assignment.studentMembershipId, studentMembershipId)))
    .orderBy(desc(assignment.createdAt))
    .limit(1);
  return row ?? null;
}
