import type { Metadata } from "next";
import Link from "next/link";
import { SignUpForm } from "./sign-up-form";

export const metadata: Metadata = { title: "Create your studio" };

export default function SignUpPage() {
  return (
    <>
      <h1 className="text-2xl font-semibold">Create your studio</h1>
      <p className="mt-1 mb-6 text-sm text-muted">
        For teachers. Students join through an invitation from their teacher.
      </p>
      <SignUpForm />
      <p className="mt-6 text-center text-sm text-muted">
        Already have an account?{" "}
        <Link href="/sign-in" className="font-bold text-walnut underline">Sign in</Link>
      </p>
    </>
  );
}
