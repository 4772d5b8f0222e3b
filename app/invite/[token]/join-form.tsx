"use client";
import { useActionState } from "react";
import { Button } from "@/components/ui/button";
import { Field, FormMessage } from "@/components/ui/field";
import { joinStudioAction, type JoinState } from "./actions";

export function JoinForm({ token, email }: { token: string; email: string }) {
  const [state, action, pending] = useActionState<JoinState, FormData>(joinStudioAction.bind(null, token), null);
  const errors = state && !state.ok ? state.fieldErrors ?? {} : {};
  return (
    <form action={action} className="flex flex-col gap-4" noValidate>
      <FormMessage message={state && !state.ok ? state.message : null} />
      <p className="text-sm text-muted">Your e-mail: <span className="font-bold text-ink">{email}</span></p>
      <Field label="Your name" name="name" autoComplete="name" defaultValue={state?.name} errors={errors.name} required />
      <Field label="Choose a password" name="password" type="password" autoComplete="new-password" hint="At least 8 characters." errors={errors.password} required />
      <Button type="submit" disabled={pending} className="w-full">{pending ? "Joining…" : "Join the studio"}</Button>
    </form>
  );
}
