"use client";
import Link from "next/link";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Field, FormMessage } from "@/components/ui/field";
import { authRequest } from "@/lib/auth/client";
import { MAX_PASSWORD_LENGTH, MIN_PASSWORD_LENGTH } from "@/lib/auth/password-rules";

/** Sets a new password with the token from the reset e-mail. */
export function ResetForm({ token }: { token: string }) {
  const [state, setState] = useState<{ status: "idle" | "saving" | "done"; error?: string }>({ status: "idle" });
  async function submit(e: React.FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const newPassword = String(new FormData(e.currentTarget).get("password") ?? "");
    if (newPassword.length < MIN_PASSWORD_LENGTH) return setState({ status: "idle", error: `At least ${MIN_PASSWORD_LENGTH} characters, please.` });
    if (newPassword.length > MAX_PASSWORD_LENGTH) return setState({ status: "idle", error: `At most ${MAX_PASSWORD_LENGTH} characters, please.` });
    setState({ status: "saving" });
    const answer = await authRequest("reset-password", { newPassword, token });
    setState(!answer.ok ? { status: "idle", error: "This reset link is no longer valid. Ask for a new one." } : { status: "done" });
  }
  if (state.status === "done") {
    return <p role="status" className="text-sm">Your password is changed. <Link className="underline" href="/sign-in">Sign in</Link></p>;
  }
  return (
    <form onSubmit={submit} className="flex flex-col gap-4" noValidate>
      <FormMessage message={state.error} />
      <Field label="New password" name="password" type="password" autoComplete="new-password" hint={`At least ${MIN_PASSWORD_LENGTH} characters.`} required />
      <Button type="submit" disabled={state.status === "saving"}>Save new password</Button>
    </form>
  );
}
