"use client";
import Link from "next/link";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Field, FormMessage } from "@/components/ui/field";
import { authRequest } from "@/lib/auth/client";

/** Asks the auth server for a reset link; the answer is the same whether or not the e-mail has an account. */
export function ForgotForm() {
  const [state, setState] = useState<"idle" | "sending" | "sent" | "error">("idle");
  async function submit(e: React.FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const email = String(new FormData(e.currentTarget).get("email") ?? "").trim();
    if (!email) return setState("error");
    setState("sending");
    const answer = await authRequest("request-password-reset", { email, redirectTo: "/reset-password" });
    setState(answer.ok ? "sent" : "error");
  }
  if (state === "sent")
    return (
      <div className="space-y-3 text-sm">
        <p role="status">If an account uses that e-mail, a reset link is on its way. It works for one hour.</p>
        <p>
          <Link href="/sign-in" className="font-bold text-walnut underline">Back to sign-in</Link>
        </p>
      </div>
    );
  return (
    <form onSubmit={submit} className="flex flex-col gap-4" noValidate>
      <FormMessage message={state === "error" ? "Enter the e-mail you sign in with and try again." : null} />
      <Field label="E-mail" name="email" type="email" autoComplete="email" required />
      <Button type="submit" disabled={state === "sending"}>{state === "sending" ? "Sending…" : "Send reset link"}</Button>
    </form>
  );
}
