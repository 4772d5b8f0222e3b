"use server";
import { headers } from "next/headers";
import { redirect } from "next/navigation";
import { db } from "@/db";
import { fail, type ActionResult } from "@/lib/action-result";
import { auth } from "@/lib/auth";
import { clientKey } from "@/lib/auth/rate-limit";
import { createTeacherAccount } from "@/lib/auth/teacher-sign-up";
import { dbRateLimiter } from "@/lib/limits/counter";

// Kept in the database: the limit holds across app servers (lib/limits/counter.ts).
const signUpLimiter = dbRateLimiter("sign-up", 10, 10 * 60 * 1000);

export type SignUpState = (ActionResult<null> & { values?: Record<string, string> }) | null;

/**
 * The public sign-up: a new teacher and their studio. Only name, e-mail, password and studio name
 * are read from the form; the role is always "teacher" and the studio is always new.
 */
export async function signUpTeacher(_prev: SignUpState, form: FormData): Promise<SignUpState> {
  const raw = {
    name: String(form.get("name") ?? ""),
    email: String(form.get("email") ?? ""),
    password: String(form.get("password") ?? ""),
    studioName: String(form.get("studioName") ?? ""),
  };
  const values = { name: raw.name, email: raw.email, studioName: raw.studioName };
  const requestHeaders = await headers();
  if (!(await signUpLimiter.take(clientKey(requestHeaders)))) {
    return { ...fail("Too many sign-up attempts from here. Please wait a few minutes."), values };
  }
  const created = await createTeacherAccount(db, raw);
  if (!created.ok) return { ...created, values };
  try {
    await auth.api.signInEmail({
      body: { email: created.data.email, password: raw.password },
      headers: requestHeaders,
    });
  } catch {
    return { ...fail("Your studio was created, but signing in failed. Please sign in."), values };
  }
  redirect("/home");
}
