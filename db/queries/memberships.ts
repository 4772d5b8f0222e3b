import { and, asc, eq, sql } from "drizzle-orm";
import type { Db } from "../index";
import { session } from "../auth-schema";
import { membership, studio } from "../schema";
import { preparedFor } from "./prepared";

/** What a signed-in request needs to know of its member: the membership, role and studio. */
const memberColumns = {
  membershipId: membership.id,
  studioId: membership.studioId,
  role: membership.role,
  studioName: studio.name,
};

/** Runs on every signed-in request: built once per database handle. */
const membershipOfUser = preparedFor((database: Db) =>
  database
    .select(memberColumns)
    .from(membership)
    .innerJoin(studio, eq(studio.id, membership.studioId))
    .where(eq(membership.userId, sql.placeholder("userId")))
    .orderBy(asc(membership.createdAt))
    .limit(1)
    .prepare(),
);

/** The same, only while the session row still exists (revoked sessions lose their studio at once). */
const membershipOfSession = preparedFor((database: Db) =>
  database
    .select(memberColumns)
    .from(membership)
    .innerJoin(studio, eq(studio.id, membership.studioId))
    .innerJoin(session, and(eq(session.id, sql.placeholder("sessionId")), eq(session.userId, membership.userId)))
    .where(eq(membership.userId, sql.placeholder("userId")))
    .orderBy(asc(membership.createdAt))
    .limit(1)
    .prepare(),
);

/**
 * The caller's membership (the oldest, if a user ever has several) with its studio name. One indexed
 * look-up (membership_user_idx). With `sessionId`, null as soon as that session row is gone: a session
 * revoked on the server (password reset, sign-out elsewhere) loses access at once, even while the
 * browser still holds better-auth's signed cookie copy of it.
 */
export async function findMembershipForUser(database: Db, userId: string, sessionId?: string) {
  const rows = sessionId === undefined ? await membershipOfUser(database).all({ userId }) : await membershipOfSession(database).all({ userId, sessionId });
  return rows[0] ?? null;
}
