import { asc, eq } from "drizzle-orm";
import { inStudio } from "../scope";
import { studentColumns } from "./joins";
import type { Db } from "../index";
import { handProfile, membership, user } from "../schema";

/** The studio's students with their hand profile (if the teacher has recorded one). */
export async function listStudents(database: Db, studioId: string) {
  return database
    .select({
      ...studentColumns,
      spanMm: handProfile.spanMm,
      octaveMm: handProfile.octaveMm,
    })
    .from(membership)
    .innerJoin(user, eq(user.id, membership.userId))
    .leftJoin(handProfile, eq(handProfile.membershipId, membership.id))
    .where(inStudio(membership, studioId, eq(membership.role, "student")))
    .orderBy(asc(user.name));
}

/** True when the membership is a student of this studio. */
export async function isStudentOf(database: Db, studioId: string, membershipId: string): Promise<boolean> {
  const [row] = await database
    .select({ id: membership.id })
    .from(membership)
    .where(inStudio(membership, studioId, eq(membership.id, membershipId), eq(membership.role, "student")))
    .limit(1);
  return Boolean(row);
}

/** Creates or replaces a student's hand profile (span and octave width in mm). */
export async function saveHandProfile(database: Db, membershipId: string, values: { spanMm: number; octaveMm: number }) {
  await database
    .insert(handProfile)
    .values({ membershipId, ...values })
    .onConflictDoUpdate({ target: handProfile.membershipId, set: { ...values, updatedAt: new Date() } });
}
