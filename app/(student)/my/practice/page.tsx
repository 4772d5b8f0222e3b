import type { Metadata } from "next";
import { Card, PageHeader } from "@/components/ui/card";
import { EmptyState } from "@/components/ui/empty-state";
import { db } from "@/db";
import { listPracticeForStudent } from "@/db/queries/assignments";
import { requireStudent } from "@/lib/session";

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
              <li key={e.id} className="flex flex-wrap items-baseline justify-between gap-2 py-2">
                <span className="font-bold">{e.sheetTitle}</span>
                <span className="font-mono text-xs text-muted">{e.practisedOn} · {e.minutes} min · ease {e.ease}/5</span>
              </li>
            ))}
          </ul>
        </Card>
      )}
    </div>
  );
}
