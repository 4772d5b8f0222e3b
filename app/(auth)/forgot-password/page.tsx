import type { Metadata } from "next";
import { ForgotForm } from "./forgot-form";

export const metadata: Metadata = { title: "Forgot password" };

export default function ForgotPasswordPage() {
  return (
    <>
      <h1 className="text-2xl font-semibold">Forgot your password?</h1>
      <p className="mt-1 mb-6 text-sm text-muted">We will e-mail you a link to choose a new one.</p>
      <ForgotForm />
    </>
  );
}
