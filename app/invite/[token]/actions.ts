"use server";
import { headers } from "next/headers";
import { redirect } from "next/navigation";
import { db } from "@/db";
import { fail, type ActionResult } from "@/lib/action-result";
import { auth } from "@/lib/auth";
import { acceptInvitation } from "@/lib/students/invitations";

export type JoinState = (ActionResult<null> & { name?: string }) | null;

/** Accepts the invitation (one transaction), signs the new student in and opens their home. */
export async function joinStudioAction(token: string, _prev: JoinState, form: FormData): Promise<JoinState> {
  const name = String(form.get("name") ?? "");
  const password = String(form.get("password") ?? "");
  const result = await acceptInvitation(token, { name, password }, db);
  if (!result.ok) return { ...result, name };
  try {
    await auth.api.signInEmail({ body: { email: result.data.email, password }, headers: await headers() });
  } catch {
    return { ...fail("Your account is ready, but signing in failed. Please sign in."), name };
  }
  redirect("/my");
}
