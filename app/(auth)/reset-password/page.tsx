import type { Metadata } from "next";
import Link from "next/link";
import { ResetForm } from "./reset-form";

export const metadata: Metadata = { title: "Choose a new password" };

export default async function ResetPasswordPage({ searchParams }: { searchParams: Promise<{ token?: string; error?: string }> }) {
  const { token, error } = await searchParams;
  return (
    <>
      <h1 className="text-2xl font-semibold">Choose a new password</h1>
      {token && !error ? (
        <div className="mt-6"><ResetForm token={token} /></div>
      ) : (
        <p className="mt-4 text-sm">This reset link is not valid or has expired. <Link className="underline" href="/forgot-password">Ask for a new one</Link>.</p>
      )}
    </>
  );
}
