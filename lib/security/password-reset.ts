/**
 * What a password reset takes with it. better-auth's `revokeSessionsOnPasswordReset` (set in
 * lib/auth.ts) deletes every session of the user; this hook also deletes every other reset token the
 * user still holds, so a second link from an earlier mail (perhaps read by someone else) stops
 * working once one link has been used.
 * (OWASP Forgot Password Cheat Sheet: tokens are single use and invalidated after use; "ensure that
 * all existing sessions are invalidated" after a reset — better-auth docs, emailAndPassword
 * `revokeSessionsOnPasswordReset` and `onPasswordReset`.)
 */
import { and, eq, like } from "drizzle-orm";
import { db } from "../../db";
import { verification } from "../../db/auth-schema";

/** better-auth stores a reset token as a verification row `reset-password:<token>` whose value is the user id. */
export const RESET_IDENTIFIER_PREFIX = "reset-password:";

/** Deletes every outstanding reset token of the user; returns how many there were. */
export async function revokeResetTokens(userId: string): Promise<number> {
  const gone = await db
    .delete(verification)
    .where(and(eq(verification.value, userId), like(verification.identifier, `${RESET_IDENTIFIER_PREFIX}%`)))
    .returning({ id: verification.id });
  return gone.length;
}

/** better-auth `emailAndPassword.onPasswordReset`: runs after the new password is saved and the sessions revoked. */
export async function afterPasswordReset({ user }: { user: { id: string } }): Promise<void> {
  await revokeResetTokens(user.id);
}
