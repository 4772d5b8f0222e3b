import type { Metadata } from "next";
import Link from "next/link";
import { Card, PageHeader } from "@/components/ui/card";
import { EmptyState } from "@/components/ui/empty-state";
import { db } from "@/db";
import { listSheets } from "@/db/queries/sheets";
import { requireTeacher } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Drill sheets" };

export default async function SheetsPage() {
  const ctx = await requireTeacher();
  const sheets = await listSheets(db, ctx.studioId);
  return (
    <div>
      <PageHeader title="Drill sheets" lead="Your ordered picks of drills, with notes and tempo goals, ready to print as a handout or assign." />
      {sheets.length === 0 ? (
        <EmptyState title="No drill sheets yet">Mark a knot in a piece first; Knotwork then suggests drills for it, and the ones you keep make a sheet.</EmptyState>
      ) : (
        <ul className="grid gap-4 sm:grid-cols-2">
          {sheets.map((s) => (
            <li key={s.id}>
              <Card>
                <h2 className="text-lg font-semibold">
                  <Link href={`/sheets/${s.id}`} className="hover:underline">{s.title}</Link>
                </h2>
                <p className="font-mono text-xs text-muted">{s.drills} drills</p>
              </Card>
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
