import { Wordmark } from "@/components/logo-mark";
import { AboutFooter } from "@/components/ui/about-footer";
import { ButtonLink } from "@/components/ui/button";

export default function NotFound() {
  return (
    <div className="flex min-h-dvh flex-col">
      <main className="mx-auto flex w-full max-w-xl flex-1 flex-col items-center justify-center gap-4 px-4 text-center">
        <Wordmark />
        <p className="font-mono text-sm text-rosin">404</p>
        <h1 className="text-3xl font-semibold">This page is not in the score</h1>
        <p className="text-muted">The link may be old, or the piece, knot or sheet may have been removed.</p>
        <ButtonLink href="/">Back to the start</ButtonLink>
      </main>
      <AboutFooter />
    </div>
  );
}
