"use server";
import { revalidatePath } from "next/cache";
import { db } from "@/db";
import type { ActionResult } from "@/lib/action-result";
import { readEnv } from "@/lib/env";
import { requireTeacher } from "@/lib/auth/session";
import { inviteStudent, updateHandProfile } from "./student-ops";

export type InviteState = ActionResult<{ email: string; delivered: boolean }> | null;

/** Invite form (progressively enhanced): teacher only, e-mail checked, mail to the outbox or SMTP. */
export async function inviteStudentAction(_prev: InviteState, form: FormData): Promise<InviteState> {
  const ctx = await requireTeacher();
  const result = await inviteStudent(db, ctx, { email: String(form.get("email") ?? "") }, readEnv().BETTER_AUTH_URL);
  if (result.ok) revalidatePath("/students");
  return result;
}

/** Saves one student's hand profile (span in mm or inches, keyboard octave width). */
export async function updateHandProfileAction(raw: unknown): Promise<ActionResult<{ spanMm: number; octaveMm: number }>> {
  const ctx = await requireTeacher();
  const result = await updateHandProfile(db, ctx, raw);
  if (result.ok) revalidatePath("/students");
  return result;
}
