import { desc } from "drizzle-orm";
import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { db } from "@/db";
import { outbox } from "@/db/schema";

export const metadata: Metadata = { title: "Outbox (development)" };
export const dynamic = "force-dynamic";

const linkify = (text: string) =>
  text.split(/(https?:\/\/\S+)/g).map((part, i) => (/^https?:\/\//.test(part) ? <a key={i} href={part} className="break-all underline">{part}</a> : part));

/** Development-only: the mails Knotwork would have sent. Hidden in production unless KNOTWORK_DEV_OUTBOX=1. */
export default async function OutboxPage() {
  if (process.env.NODE_ENV === "production" && process.env.KNOTWORK_DEV_OUTBOX !== "1") notFound();
  const mails = await db.select().from(outbox).orderBy(desc(outbox.createdAt)).limit(100);
  return (
    <main className="mx-auto flex max-w-3xl flex-col gap-4 p-4">
      <h1 className="text-2xl">Outbox</h1>
      <p className="text-sm text-muted">Development only: every e-mail Knotwork sent, newest first.</p>
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
