import { asc, eq } from "drizzle-orm";
import { inStudio } from "../../lib/studio-scope";
import type { Db } from "../index";
import { handProfile, membership, user } from "../schema";

/** The studio's students with their hand profile (if the teacher has recorded one). */
export async function listStudents(database: Db, studioId: string) {
  return database
    .select({
      membershipId: membership.id,
      name: user.name,
      email: user.email,
      spanMm: handProfile.spanMm,
      octaveMm: handProfile.octaveMm,
    })
    .from(membership)
    .innerJoin(user, eq(user.id, membership.userId))
    .leftJoin(handProfile, eq(handProfile.membershipId, membership.id))
    .where(inStudio(membership, studioId, eq(membership.role, "student")))
    .orderBy(asc(user.name));
}
