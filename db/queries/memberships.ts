import { asc, eq, sql } from "drizzle-orm";
import type { Db } from "../index";
import { membership, studio } from "../schema";
import { preparedFor } from "./prepared";

/** Runs on every signed-in request: built once per database handle. */
const membershipOfUser = preparedFor((database: Db) =>
  database
    .select({
      membershipId: membership.id,
      studioId: membership.studioId,
      role: membership.role,
      studioName: studio.name,
    })
    .from(membership)
    .innerJoin(studio, eq(studio.id, membership.studioId))
    .where(eq(membership.userId, sql.placeholder("userId")))
    .orderBy(asc(membership.createdAt))
    .limit(1)
    .prepare(),
);

/** The caller's membership (the oldest, if a user ever has several) with its studio name. One indexed look-up (membership_user_idx). */
export async function findMembershipForUser(database: Db, userId: string) {
  const rows = await membershipOfUser(database).all({ userId });
  return rows[0] ?? null;
}
