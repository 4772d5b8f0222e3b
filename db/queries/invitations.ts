import { createHash } from "node:crypto";
import { and, desc, eq, isNull } from "drizzle-orm";
import { inStudio } from "../scope";
import type { Db } from "../index";
import { invitation, studio } from "../schema";

/** Invitation tokens are stored only as their SHA-256 hash; look-ups hash the token from the link. */
export function hashToken(token: string): string {
  return createHash("sha256").update(token).digest("hex");
}

export type InvitationState = "valid" | "used" | "expired" | "unknown";

/** What an invitation link points at, without changing anything. */
export async function invitationByToken(database: Db, token: string, now: Date = new Date()) {
  const [row] = await database
    .select({ email: invitation.email, expiresAt: invitation.expiresAt, acceptedAt: invitation.acceptedAt, studioName: studio.name })
    .from(invitation)
    .innerJoin(studio, eq(studio.id, invitation.studioId))
    .where(eq(invitation.tokenHash, hashToken(token)))
    .limit(1);
  if (!row) return { state: "unknown" as InvitationState, email: null, studioName: null };
  const state: InvitationState = row.acceptedAt ? "used" : row.expiresAt.getTime() <= now.getTime() ? "expired" : "valid";
  return { state, email: row.email, studioName: row.studioName };
}

/** Invitations of the studio not yet accepted, newest first. */
export async function listOpenInvitations(database: Db, studioId: string) {
  return database
    .select({ id: invitation.id, email: invitation.email, expiresAt: invitation.expiresAt, createdAt: invitation.createdAt })
    .from(invitation)
    .where(and(inStudio(invitation, studioId), isNull(invitation.acceptedAt)))
    .orderBy(desc(invitation.createdAt));
}
