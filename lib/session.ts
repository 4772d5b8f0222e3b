import { headers } from "next/headers";
import { forbidden, redirect } from "next/navigation";
import { cache } from "react";
import { db } from "../db";
import { findMembershipForUser } from "../db/queries/memberships";
import type { Role } from "../db/schema";
import { auth } from "./auth";

export interface StudioContext {
  user: { id: string; name: string; email: string };
  studioId: string;
  studioName: string;
  membershipId: string;
  role: Role;
}

/** The signed-in user with their studio and role, or null when anonymous (or without a studio). */
export const getStudioContext = cache(async (): Promise<StudioContext | null> => {
  const session = await auth.api.getSession({ headers: await headers() });
  if (!session) return null;
  const member = await findMembershipForUser(db, session.user.id);
  if (!member) return null;
  return {
    user: { id: session.user.id, name: session.user.name, email: session.user.email },
    studioId: member.studioId,
    studioName: member.studioName,
    membershipId: member.membershipId,
    role: member.role,
  };
});

/** Any signed-in member. Anonymous callers go to the sign-in page. */
export async function requireUser(): Promise<StudioContext> {
  const session = await auth.api.getSession({ headers: await headers() });
  if (!session) redirect("/sign-in");
  const ctx = await getStudioContext();
  if (!ctx) forbidden();
  return ctx;
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
