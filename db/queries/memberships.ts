import { asc, eq } from "drizzle-orm";
import type { Db } from "../index";
import { membership, studio } from "../schema";

/** The caller's membership (the oldest, if a user ever has several) with its studio name. */
export async function findMembershipForUser(database: Db, userId: string) {
  const rows = await database
    .select({
      membershipId: membership.id,
      studioId: membership.studioId,
      role: membership.role,
      studioName: studio.name,
    })
    .from(membership)
    .innerJoin(studio, eq(studio.id, membership.studioId))
    .where(eq(membership.userId, userId))
    .orderBy(asc(membership.createdAt))
    .limit(1);
  return rows[0] ?? null;
}
