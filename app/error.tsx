"use client";
import { useEffect } from "react";
import { Wordmark } from "@/components/logo-mark";
import { Button, ButtonLink } from "@/components/ui/button";

export default function ErrorPage({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  useEffect(() => {
    console.error(error);
  }, [error]);
  return (
    <main className="mx-auto flex min-h-dvh max-w-xl flex-col items-center justify-center gap-4 px-4 text-center">
      <Wordmark />
      <h1 className="text-3xl font-semibold">Something slipped</h1>
      <p className="text-muted">
        Knotwork hit an error while loading this page. Try again, or go back to the start page.
      </p>
      {error.digest ? <p className="font-mono text-xs text-muted">reference {error.digest}</p> : null}
      <div className="flex gap-3">
        <Button onClick={() => reset()}>Try again</Button>
        <ButtonLink href="/" variant="secondary">Start page</ButtonLink>
      </div>
    </main>
  );
}
