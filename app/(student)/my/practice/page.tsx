import type { Metadata } from "next";
import Link from "next/link";
import { Card, PageHeader } from "@/components/ui/card";
import { EmptyState } from "@/components/ui/empty-state";
import { db } from "@/db";
import { listPracticeForStudent } from "@/db/queries/practice";
import { requireStudent } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Practice log" };

export default async function PracticeLog() {
  const ctx = await requireStudent();
  const entries = await listPracticeForStudent(db, ctx.studioId, ctx.membershipId);
  return (
    <div>
      <PageHeader title="Practice log" lead="A short note after each practice: how long, how fast, how it felt. Your teacher reads it before the next lesson." />
      {entries.length === 0 ? (
        <EmptyState title="No practice logged yet">Open one of your drill sheets after practising and add an entry: minutes, the tempo you reached, and how easy it felt.</EmptyState>
      ) : (
        <Card>
          <ul className="divide-y divide-line">
            {entries.map((e) => (
              <li key={e.id} className="flex flex-col gap-0.5 py-2.5">
                <span className="flex flex-wrap items-baseline justify-between gap-2">
                  <Link href={`/my/assignments/${e.assignmentId}`} className="font-bold underline decoration-rosin">{e.sheetTitle}</Link>
                  <span className="font-mono text-xs text-muted">{e.practisedOn} · {e.minutes} min · ease {e.ease}/5</span>
                </span>
                {Object.keys(e.tempos).length > 0 ? (
                  <span className="text-sm">
                    Tempo reached: up to ♩ {Math.max(...Object.values(e.tempos))} ({Object.keys(e.tempos).length === 1 ? "1 drill" : `${Object.keys(e.tempos).length} drills`})
                  </span>
                ) : null}
                {e.comment ? <span className="text-sm text-muted">{e.comment}</span> : null}
              </li>
            ))}
          </ul>
        </Card>
      )}
    </div>
  );
}
