import { Wordmark } from "@/components/logo-mark";
import { ButtonLink } from "@/components/ui/button";

export default function Forbidden() {
  return (
    <main className="mx-auto flex min-h-dvh max-w-xl flex-col items-center justify-center gap-4 px-4 text-center">
      <Wordmark />
      <p className="font-mono text-sm text-rosin">403</p>
      <h1 className="text-3xl font-semibold">This page is not for your role</h1>
      <p className="text-muted">Teachers and students each have their own pages. Yours are one click away.</p>
      <ButtonLink href="/go">Go to my home</ButtonLink>
    </main>
  );
}
