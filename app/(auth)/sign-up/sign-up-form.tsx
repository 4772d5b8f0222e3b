"use client";
import { useActionState } from "react";
import { signUpTeacher, type SignUpState } from "./actions";
import { Button } from "@/components/ui/button";
import { Field, FormMessage } from "@/components/ui/field";

export function SignUpForm() {
  const [state, action, pending] = useActionState<SignUpState, FormData>(signUpTeacher, null);
  const errors = state && !state.ok ? state.fieldErrors ?? {} : {};
  const values = state?.values ?? {};
  return (
    <form action={action} className="flex flex-col gap-4" noValidate>
      <FormMessage message={state && !state.ok ? state.message : null} />
      <Field label="Your name" name="name" autoComplete="name" defaultValue={values.name} errors={errors.name} required />
      <Field label="E-mail" name="email" type="email" autoComplete="email" defaultValue={values.email} errors={errors.email} required />
      <Field
        label="Password"
        name="password"
        type="password"
        autoComplete="new-password"
        hint="At least 8 characters."
        errors={errors.password}
        required
      />
      <Field
        label="Studio name"
        name="studioName"
        placeholder="e.g. Quince Row Piano Studio"
        defaultValue={values.studioName}
        errors={errors.studioName}
        required
      />
      <Button type="submit" disabled={pending} className="mt-2 w-full">
        {pending ? "Creating your studio…" : "Create studio"}
      </Button>
    </form>
  );
}
