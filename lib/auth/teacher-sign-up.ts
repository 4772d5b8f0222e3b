import { hashPassword } from "better-auth/crypto";
import { eq } from "drizzle-orm";
import { z } from "zod";
import type { Db } from "../../db";
import { account, membership, studio, user } from "../../db/schema";
import { fail, fromZodError, ok, type ActionResult } from "../action-result";
import { MAX_PASSWORD_LENGTH, MIN_PASSWORD_LENGTH } from "./password-rules";

export const PasswordField = z
  .string({ error: "Password is required." })
  .min(MIN_PASSWORD_LENGTH, { error: `Password must be at least ${MIN_PASSWORD_LENGTH} characters.` })
  .max(MAX_PASSWORD_LENGTH, { error: `Password must be at most ${MAX_PASSWORD_LENGTH} characters.` });

export const NameField = z
  .string({ error: "Name is required." })
  .trim()
  .min(1, { error: "Name is required." })
  .max(120, { error: "Name must be at most 120 characters." });

/**
 * The public sign-up form. Only these four fields are read: anything else in the body
 * (a `role`, a `studioId`) is dropped, because the role is decided here, on the server.
 */
export const TeacherSignUpInput = z.object({
  name: NameField,
  email: z
    .email({ error: "E-mail must be a valid address, like name@example.com." })
    .trim()
    .toLowerCase(),
  password: PasswordField,
  studioName: z
    .string({ error: "Studio name is required." })
    .trim()
    .min(1, { error: "Studio name is required." })
    .max(120, { error: "Studio name must be at most 120 characters." }),
});
export type TeacherSignUpInput = z.infer<typeof TeacherSignUpInput>;

/** Whether an account already uses this e-mail (compared in lower case, as better-auth stores it). */
export async function emailTaken(database: Db, email: string): Promise<boolean> {
  const rows = await database
    .select({ id: user.id })
    .from(user)
    .where(eq(user.email, email.trim().toLowerCase()))
    .limit(1);
  return rows.length > 0;
}

/** Inserts a user with a better-auth credential account (scrypt hash). Call inside a transaction. */
export async function insertCredentialUser(
  tx: Pick<Db, "insert">,
  input: { name: string; email: string; password: string },
): Promise<string> {
  const userId = crypto.randomUUID();
  const now = new Date();
  await tx.insert(user).values({
    id: userId,
    name: input.name,
    email: input.email.toLowerCase(),
    emailVerified: false,
    createdAt: now,
    updatedAt: now,
  });
  await tx.insert(account).values({
    id: crypto.randomUUID(),
    accountId: userId,
    providerId: "credential",
    userId,
    password: await hashPassword(input.password),
    createdAt: now,
    updatedAt: now,
  });
  return userId;
}

/**
 * Creates a teacher, their credential account, their studio and the teacher membership in one
 * transaction. Returns field errors (and stores nothing) for bad or duplicate input.
 */
export async function createTeacherAccount(
  database: Db,
  raw: unknown,
): Promise<ActionResult<{ userId: string; studioId: string; email: string }>> {
  const parsed = TeacherSignUpInput.safeParse(raw);
  if (!parsed.success) return fromZodError(parsed.error);
  const input = parsed.data;
  if (await emailTaken(database, input.email)) {
    return fail("Please check the highlighted fields.", {
      email: ["An account with this e-mail already exists. Sign in instead."],
    });
  }
  try {
    const ids = await database.transaction(async (tx) => {
      const userId = await insertCredentialUser(tx, input);
      const studioId = crypto.randomUUID();
      await tx.insert(studio).values({ id: studioId, name: input.studioName });
      await tx.insert(membership).values({ studioId, userId, role: "teacher" });
      return { userId, studioId };
    });
    return ok({ ...ids, email: input.email });
  } catch (err) {
    if (err instanceof Error && /UNIQUE constraint failed: user\.email/.test(err.message)) {
      return fail("Please check the highlighted fields.", {
        email: ["An account with this e-mail already exists. Sign in instead."],
      });
    }
    throw err;
  }
}
