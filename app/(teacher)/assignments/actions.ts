"use server";
import { revalidatePath } from "next/cache";
import { db } from "@/db";
import type { ActionResult } from "@/lib/action-result";
import { readEnv } from "@/lib/env";
import { requireTeacher } from "@/lib/auth/session";
import { assignSheet } from "./assign-sheet";
import { assignmentFromForm } from "./assignment-form-data";

/** Assign a sheet: teacher only, the form's schema again on the server, one transaction, then mail. */
export async function assignSheetAction(raw: unknown): Promise<ActionResult<{ ids: string[]; undelivered: string[] }>> {
  const ctx = await requireTeacher();
  const result = await assignSheet(db, ctx, raw, readEnv().BETTER_AUTH_URL);
  if (result.ok) {
    revalidatePath("/assignments");
    revalidatePath("/students");
  }
  return result;
}

/** The assign form's action: its fields read into the same input, checked by the same schema. */
export async function assignSheetFormAction(_previous: ActionResult<{ ids: string[]; undelivered: string[] }> | null, form: FormData): Promise<ActionResult<{ ids: string[]; undelivered: string[] }>> {
  // Anything but form data goes to the schema as it is (and is refused there, after the role check).
  return assignSheetAction(form instanceof FormData ? assignmentFromForm(form) : form);
}
