import Link from "next/link";
import type { ReactNode } from "react";
import { CAUTION } from "@/lib/caution";
import type { StudioContext } from "@/lib/auth/session";
import { Wordmark } from "../logo-mark";
import { NAV_BY_ROLE } from "./nav-items";
import { NavLinks } from "./nav-links";
import { SignOutButton } from "./sign-out-button";

/** The signed-in frame: wordmark, studio, navigation for the caller's role, sign-out. */
export function AppShell({ ctx, children }: { ctx: StudioContext; children: ReactNode }) {
  const home = ctx.role === "teacher" ? "/home" : "/my";
  return (
    <div className="flex min-h-dvh flex-col">
      <header className="border-b border-line bg-card/80 backdrop-blur">
        <div className="mx-auto flex max-w-6xl flex-col gap-3 px-4 py-3 sm:px-6">
          <div className="flex items-center justify-between gap-3">
            <Link href={home} aria-label="Knotwork home">
              <Wordmark />
            </Link>
            <div className="flex items-center gap-3">
              <div className="hidden text-right text-sm leading-tight sm:block">
                <p className="font-bold text-walnut">{ctx.user.name}</p>
                <p className="text-muted">
                  {ctx.studioName} · {ctx.role === "teacher" ? "Teacher" : "Student"}
                </p>
              </div>
              <SignOutButton />
            </div>
          </div>
          <NavLinks items={NAV_BY_ROLE[ctx.role]} />
        </div>
      </header>
      <main id="main" className="mx-auto w-full max-w-6xl flex-1 px-4 py-8 sm:px-6">
        {children}
      </main>
      <footer className="border-t border-line px-4 py-5 text-center text-xs text-muted">
        {CAUTION.text}
        {" · "}<Link href="/about" className="underline">About and credits</Link>
      </footer>
    </div>
  );
}
