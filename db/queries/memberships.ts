import { asc, eq, sql } from "drizzle-orm";
import type { Db } from "../index";
import { membership, studio } from "../schema";

/** The query, built once per database handle: it runs on every signed-in request. */
const prepared = new WeakMap<Db, ReturnType<typeof prepare>>();

function prepare(database: Db) {
  return database
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
    .prepare();
}

/** The caller's membership (the oldest, if a user ever has several) with its studio name. One indexed look-up (membership_user_idx). */
export async function findMembershipForUser(database: Db, userId: string) {
  let query = prepared.get(database);
  if (!query) prepared.set(database, (query = prepare(database)));
  const rows = await query.all({ userId });
  return rows[0] ?? null;
}
