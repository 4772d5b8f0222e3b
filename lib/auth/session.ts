import { headers } from "next/headers";
import { forbidden, redirect } from "next/navigation";
import { cache } from "react";
import { db } from "../../db";
import { findMembershipForUser } from "../../db/queries/memberships";
import type { Role } from "../../db/schema";
import { auth, type AuthSession } from "./index";
import { createSessionMemo } from "./session-memo";

const sessions = createSessionMemo<AuthSession>();

export interface StudioContext {
  user: { id: string; name: string; email: string };
  studioId: string;
  studioName: string;
  membershipId: string;
  role: Role;
}

/**
 * better-auth's session for this request, looked up once per request (React cache). With the
 * session cookie cache on (lib/auth.ts) this is usually a signature check, not a database read,
 * and a cookie pair better-auth has just accepted is answered from lib/auth/session-memo.
 */
export const getAuthSession = cache(async (): Promise<AuthSession | null> => {
  const h = await headers();
  return sessions.get(h.get("cookie"), () => auth.api.getSession({ headers: h }));
});

/** The signed-in user with their studio and role, or null when anonymous (or without a studio). */
export const getStudioContext = cache(async (): Promise<StudioContext | null> => {
  const session = await getAuthSession();
  if (!session) return null;
  const member = await findMembershipForUser(db, session.user.id, session.session.id);
  if (!member) return null;
  return {
    user: { id: session.user.id, name: session.user.name, email: session.user.email },
    studioId: member.studioId,
    studioName: member.studioName,
    membershipId: member.membershipId,
    role: member.role,
  };
});

/** Any signed-in member. Anonymous callers go to the sign-in page; a user without a studio gets 403. */
export async function requireUser(): Promise<StudioContext> {
  const ctx = await getStudioContext();
  if (ctx) return ctx;
  if (!(await getAuthSession())) redirect("/sign-in");
  forbidden();
}

/** A teacher of the caller's studio; a student gets 403. */
export async function requireTeacher(): Promise<StudioContext> {
  const ctx = await requireUser();
  if (ctx.role !== "teacher") forbidden();
  return ctx;
}

/** A student of the caller's studio; a teacher gets 403. */
export async function requireStudent(): Promise<StudioContext> {
  const ctx = await requireUser();
  if (ctx.role !== "student") forbidden();
  return ctx;
}

/** Where a member lands after signing in. */
export function homePathFor(role: Role): string {
  return role === "teacher" ? "/home" : "/my";
}
