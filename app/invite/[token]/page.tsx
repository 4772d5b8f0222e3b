import type { Metadata } from "next";
import Link from "next/link";
import { Wordmark } from "@/components/logo-mark";
import { AboutFooter } from "@/components/ui/about-footer";
import { Card } from "@/components/ui/card";
import { db } from "@/db";
import { invitationByToken } from "@/db/queries/invitations";
import { JoinForm } from "./join-form";

export const metadata: Metadata = { title: "Join a studio" };
export const dynamic = "force-dynamic";

const PROBLEMS = {
  used: { title: "This invitation has already been used", text: "The link works only once. If you joined already, sign in with your e-mail and password." },
  expired: { title: "This invitation has expired", text: "Invitation links are valid for seven days. Ask your teacher to send you a new one." },
  unknown: { title: "This invitation link is not valid", text: "Check that you opened the whole link from the e-mail, or ask your teacher for a new one." },
} as const;

/** The invitation link: a clear page for used, expired or unknown links; otherwise name + password. */
export default async function InvitePage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const invite = await invitationByToken(db, token);
  return (
    <div className="flex min-h-dvh flex-col">
      <main className="mx-auto flex w-full max-w-md flex-1 flex-col justify-center gap-6 p-4">
        <Link href="/" aria-label="Knotwork, the start page" className="self-center">
          <Wordmark />
        </Link>
        {invite.state === "valid" ? (
          <Card>
            <h1 className="mb-1 text-2xl">Join {invite.studioName}</h1>
            <p className="mb-4 text-sm text-muted">Set your name and a password. Your drill sheets and practice log will be waiting.</p>
            <JoinForm token={token} email={invite.email!} />
          </Card>
        ) : (
          <Card>
            <h1 className="mb-2 text-2xl" data-testid="invite-problem">{PROBLEMS[invite.state].title}</h1>
            <p className="text-sm">{PROBLEMS[invite.state].text}</p>
            <p className="mt-4 text-sm"><Link className="underline" href="/sign-in">Go to sign-in</Link></p>
          </Card>
        )}
      </main>
      <AboutFooter />
    </div>
  );
}
