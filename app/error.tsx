"use client";
import { useEffect } from "react";
import { Wordmark } from "@/components/logo-mark";
import { AboutFooter } from "@/components/ui/about-footer";
import { Button, ButtonLink } from "@/components/ui/button";

export default function ErrorPage({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  useEffect(() => {
    console.error(error);
  }, [error]);
  return (
    <div className="flex min-h-dvh flex-col">
      <main className="mx-auto flex w-full max-w-xl flex-1 flex-col items-center justify-center gap-4 px-4 text-center">
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
      <AboutFooter />
    </div>
  );
}
