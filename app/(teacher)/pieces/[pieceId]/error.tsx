"use client";
import Link from "next/link";
import { Button } from "@/components/ui/button";

export default function PieceError({ reset }: { error: Error & { digest?: string }; reset(): void }) {
  return (
    <div role="alert" className="flex flex-col items-start gap-3 rounded-2xl border border-line bg-card p-6">
      <h1 className="text-2xl font-semibold">This piece could not be opened</h1>
      <p className="text-muted">Something went wrong while preparing the score. Try again, or go back to your pieces.</p>
      <div className="flex gap-2">
        <Button onClick={reset}>Try again</Button>
        <Link href="/pieces" className="rounded-full px-5 py-2.5 text-sm font-bold text-walnut hover:underline">Back to pieces</Link>
      </div>
    </div>
  );
}
