import { randomBytes } from "node:crypto";
import { and, eq, gt, isNull } from "drizzle-orm";
import { z } from "zod";
import { db as sharedDb, type Db } from "../../db";
import { hashToken } from "../../db/queries/invitations";
import { invitation, membership } from "../../db/schema";
import { fail, fromZodError, ok, type ActionResult } from "../action-result";
import { emailTaken, insertCredentialUser, NameField, PasswordField } from "../auth/teacher-sign-up";

/** How long an invitation link stays valid. */
export const INVITATION_TTL_MS = 7 * 24 * 60 * 60 * 1000;

/** Creates an invitation for a student e-mail; returns the token to put in the link (stored only as a hash). */
export async function createInvitation(
  input: { studioId: string; email: string; invitedBy: string | null; ttlMs?: number; now?: Date },
  database: Db = sharedDb,
): Promise<{ id: string; token: string; expiresAt: Date }> {
  const token = randomBytes(32).toString("base64url");
  const now = input.now ?? new Date();
  const expiresAt = new Date(now.getTime() + (input.ttlMs ?? INVITATION_TTL_MS));
  const id = crypto.randomUUID();
  await database.insert(invitation).values({
    id,
    studioId: input.studioId,
    email: input.email.trim().toLowerCase(),
    tokenHash: hashToken(token),
    expiresAt,
    invitedBy: input.invitedBy,
  });
  return { id, token, expiresAt };
}

export const AcceptInvitationInput = z.object({ name: NameField, password: PasswordField });

/**
 * Accepts an invitation: creates the student user, credential account and student membership in
 * one transaction. A token works once and only before it expires.
 */
export async function acceptInvitation(
  token: string,
  raw: { name: string; password: string },
  database: Db = sharedDb,
  now: Date = new Date(),
): Promise<ActionResult<{ userId: string; studioId: string; membershipId: string; email: string }>> {
  const parsed = AcceptInvitationInput.safeParse(raw);
  if (!parsed.success) return fromZodError(parsed.error);
  const [invite] = await database
    .select()
    .from(invitation)
    .where(eq(invitation.tokenHash, hashToken(token)))
    .limit(1);
  if (!invite) return fail("This invitation link is not valid.");
  if (invite.acceptedAt) return fail("This invitation has already been used. Sign in instead.");
  if (invite.expiresAt.getTime() <= now.getTime()) {
    return fail("This invitation has expired. Ask your teacher for a new one.");
  }
  if (await emailTaken(database, invite.email)) {
    return fail("An account with this e-mail already exists. Sign in instead.");
  }
  const result = await database.transaction(async (tx) => {
    const claimed = await tx
      .update(invitation)
      .set({ acceptedAt: now })
      .where(
        and(eq(invitation.id, invite.id), isNull(invitation.acceptedAt), gt(invitation.expiresAt, now)),
      )
      .returning({ id: invitation.id });
    if (claimed.length !== 1) return null;
    const userId = await insertCredentialUser(tx, { ...parsed.data, email: invite.email });
    const membershipId = crypto.randomUUID();
    await tx
      .insert(membership)
      .values({ id: membershipId, studioId: invite.studioId, userId, role: "student" });
    return { userId, studioId: invite.studioId, membershipId, email: invite.email };
  });
  if (!result) return fail("This invitation has already been used. Sign in instead.");
  return ok(result);
}
