"use client";
import { useActionState } from "react";
import { Button } from "@/components/ui/button";
import { Field, FormMessage } from "@/components/ui/field";
import { inviteStudentAction, type InviteState } from "./actions";

/** E-mail a student an invitation link. */
export function InviteForm() {
  const [state, action, pending] = useActionState<InviteState, FormData>(inviteStudentAction, null);
  return (
    <form action={action} className="flex flex-col gap-3 sm:flex-row sm:items-end" noValidate aria-label="Invite a student">
      <div className="flex-1">
        <Field label="Student's e-mail" name="email" type="email" autoComplete="off" errors={state && !state.ok ? state.fieldErrors?.email : undefined} required />
      </div>
      <Button type="submit" disabled={pending}>{pending ? "Sending…" : "Send invitation"}</Button>
      <div className="sm:basis-full">
        {state && !state.ok && !state.fieldErrors?.email ? <FormMessage message={state.message} /> : null}
        {state?.ok ? (
          state.data.delivered ? (
            <p role="status" className="text-sm text-sage">Invitation sent to {state.data.email}.</p>
          ) : (
            <p role="alert" className="text-sm text-madder">The invitation to {state.data.email} could not be e-mailed; check the mail settings and send it again.</p>
          )
        ) : null}
      </div>
    </form>
  );
}
