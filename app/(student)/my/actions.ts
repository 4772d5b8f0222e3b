"use server";
import { revalidatePath } from "next/cache";
import { db } from "@/db";
import type { ActionResult } from "@/lib/action-result";
import { requireStudent } from "@/lib/auth/session";
import { logPractice } from "./log-practice";

/** The practice form's action: the signed-in student, the same schema as the form, then the store. */
export async function logPracticeAction(raw: unknown): Promise<ActionResult<{ id: string }>> {
  const ctx = await requireStudent();
  const result = await logPractice(db, ctx, raw);
  if (result.ok) {
    revalidatePath("/my/practice");
    revalidatePath("/my/assignments/[assignmentId]", "page");
  }
  return result;
}
