import { desc } from "drizzle-orm";
import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { db } from "@/db";
import { outbox } from "@/db/schema";

export const metadata: Metadata = { title: "Outbox (development)" };
export const dynamic = "force-dynamic";

const linkify = (text: string) =>
  text.split(/(https?:\/\/\S+)/g).map((part, i) => (/^https?:\/\//.test(part) ? <a key={i} href={part} className="break-all underline">{part}</a> : part));

/**
 * True where the outbox may be shown: `next dev` and tests, or a production server started with
 * KNOTWORK_DEV_OUTBOX=1 (the browser tests' server). It shows every studio's mail, including
 * invitation and password-reset links, to anyone without signing in.
 */
function outboxOpen(): boolean {
  if (process.env.KNOTWORK_DEV_OUTBOX === "1") return true;
  return process.env.NODE_ENV === "development" || process.env.NODE_ENV === "test";
}

/** Development-only: the mails Knotwork would have sent. 404 in production unless KNOTWORK_DEV_OUTBOX=1. */
export default async function OutboxPage() {
  if (!outboxOpen()) notFound();
  const mails = await db.select().from(outbox).orderBy(desc(outbox.createdAt)).limit(100);
  return (
    <main className="mx-auto flex max-w-3xl flex-col gap-4 p-4">
      <div role="alert" className="rounded-xl border-4 border-red-700 bg-red-50 p-4 text-red-900" data-testid="outbox-warning">
        <p className="text-lg font-bold uppercase tracking-wide">Development outbox — not for a real studio</p>
        <p className="text-sm">
          Anyone who can open this page reads every studio&apos;s mail, invitation and password-reset links included, without
          signing in. It exists for local development and tests; a production server shows it only when started with
          KNOTWORK_DEV_OUTBOX=1. Never set that on a server people use.
        </p>
      </div>
      <h1 className="text-2xl">Outbox</h1>
      <p className="text-sm text-muted">Every e-mail Knotwork sent, newest first.</p>
      {mails.length === 0 ? <p>No mail yet.</p> : null}
      <ul className="flex flex-col gap-3">
        {mails.map((m) => (
          <li key={m.id} className="rounded-xl border border-line bg-card p-4" data-testid="outbox-mail">
            <p className="font-mono text-xs text-muted">{m.createdAt.toISOString()} · to <span data-testid="outbox-to">{m.to}</span>{m.sentAt ? " · sent" : ""}</p>
            <h2 className="text-lg">{m.subject}</h2>
            <p className="whitespace-pre-wrap text-sm">{linkify(m.text)}</p>
          </li>
        ))}
      </ul>
    </main>
  );
}
