"use client";
import { useState } from "react";
import { authRequest } from "@/lib/auth/client";
import { Button } from "../ui/button";
import { Field, FormMessage } from "../ui/field";

export function SignInForm() {
  const [message, setMessage] = useState<string | null>(null);
  const [pending, setPending] = useState(false);

  async function onSubmit(event: React.FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    setPending(true);
    setMessage(null);
    const answer = await authRequest("sign-in/email", {
      email: String(form.get("email") ?? "").trim(),
      password: String(form.get("password") ?? ""),
    });
    if (!answer.ok) {
      setPending(false);
      setMessage(
        answer.status === 429
          ? "Too many attempts. Please wait a minute and try again."
          : answer.status === 401
            ? "That e-mail and password do not match an account."
            : "Signing in did not work just now. Please try again.",
      );
      return;
    }
    window.location.assign("/go");
  }

  return (
    <form onSubmit={onSubmit} className="flex flex-col gap-4">
      <FormMessage message={message} />
      <Field label="E-mail" name="email" type="email" autoComplete="email" required />
      <Field label="Password" name="password" type="password" autoComplete="current-password" required />
      <Button type="submit" disabled={pending} className="mt-2 w-full">
        {pending ? "Signing in…" : "Sign in"}
      </Button>
    </form>
  );
}
