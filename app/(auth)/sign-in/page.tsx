import type { Metadata } from "next";
import Link from "next/link";
import { SignInForm } from "@/components/auth/sign-in-form";

export const metadata: Metadata = { title: "Sign in" };

export default function SignInPage() {
  return (
    <>
      <h1 className="text-2xl font-semibold">Sign in</h1>
      <p className="mt-1 mb-6 text-sm text-muted">Teachers and students sign in here.</p>
      <SignInForm />
      <p className="mt-4 text-center text-sm">
        <Link href="/forgot-password" className="text-walnut underline">Forgot your password?</Link>
      </p>
      <p className="mt-2 text-center text-sm text-muted">
        New teacher?{" "}
        <Link href="/sign-up" className="font-bold text-walnut underline">Create your studio</Link>
      </p>
    </>
  );
}
