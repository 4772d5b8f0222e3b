import { Wordmark } from "@/components/logo-mark";
import { AboutFooter } from "@/components/ui/about-footer";
import { ButtonLink } from "@/components/ui/button";

export default function Forbidden() {
  return (
    <div className="flex min-h-dvh flex-col">
      <main className="mx-auto flex w-full max-w-xl flex-1 flex-col items-center justify-center gap-4 px-4 text-center">
        <Wordmark />
        <p className="font-mono text-sm text-rosin">403</p>
        <h1 className="text-3xl font-semibold">This page is not for your role</h1>
        <p className="text-muted">Teachers and students each have their own pages. Yours are one click away.</p>
        <ButtonLink href="/go">Go to my home</ButtonLink>
      </main>
      <AboutFooter />
    </div>
  );
}
