import type { Metadata } from "next";
import Link from "next/link";
import { PrintHandoutButton } from "@/components/handout/print-handout-button";
import { Card, PageHeader } from "@/components/ui/card";
import { EmptyState } from "@/components/ui/empty-state";
import { db } from "@/db";
import { listAssignmentsForStudio } from "@/db/queries/assignments";
import { getSheet, listSheets } from "@/db/queries/sheets";
import { listStudents } from "@/db/queries/students";
import { requireTeacher } from "@/lib/auth/session";
import { utcDay } from "../../(student)/my/practice-input";
import { AssignForm } from "./assign-form";
import { overSpanByStudent } from "./student-fit";

export const metadata: Metadata = { title: "Assignments" };
export const dynamic = "force-dynamic";

/** Assign a drill sheet (?sheet=<id>) and see what is assigned to whom. */
export default async function AssignmentsPage({ searchParams }: { searchParams: Promise<{ sheet?: string }> }) {
  const ctx = await requireTeacher();
  const { sheet: sheetId } = await searchParams;
  const [sheets, students, assignments] = await Promise.all([
    listSheets(db, ctx.studioId),
    listStudents(db, ctx.studioId),
    listAssignmentsForStudio(db, ctx.studioId),
  ]);
  const chosen = sheetId ? await getSheet(db, ctx.studioId, sheetId) : sheets[0] ? await getSheet(db, ctx.studioId, sheets[0].id) : null;
  return (
    <div className="flex flex-col gap-6">
      <PageHeader title="Assignments" lead="Give a drill sheet to one or more students with a due date and tempo goals. Each gets an e-mail with the link." />
      {chosen ? (
        <Card>
          <div className="mb-3 flex flex-wrap items-center justify-between gap-2">
            <h2 className="text-lg">Assign “{chosen.title}”</h2>
            <PrintHandoutButton sheetId={chosen.id} />
          </div>
          {sheets.length > 1 ? (
            <nav aria-label="Other sheets" className="mb-3 flex flex-wrap gap-2 text-sm">
              {sheets.map((s) => (
                <Link key={s.id} href={`/assignments?sheet=${s.id}`} aria-current={s.id === chosen.id ? "page" : undefined} className="underline">{s.title}</Link>
              ))}
            </nav>
          ) : null}
          <AssignForm
            sheet={{ id: chosen.id, drills: chosen.drills.map((d) => ({ id: d.id, title: d.title, target: d.meta.tempo?.target ?? null })) }}
            students={students.map((s) => ({ membershipId: s.membershipId, name: s.name }))}
            overSpan={overSpanByStudent(chosen.drills, students)}
            today={utcDay()}
          />
        </Card>
      ) : (
        <EmptyState title="No drill sheets yet">Make a drill sheet from a knot first; then assign it here.</EmptyState>
      )}
      <section aria-labelledby="assigned-heading">
        <h2 id="assigned-heading" className="mb-2 text-xl">Assigned</h2>
        {assignments.length === 0 ? (
          <p className="text-sm text-muted">Nothing assigned yet.</p>
        ) : (
          <ul className="divide-y divide-line rounded-xl border border-line bg-card text-sm">
            {assignments.map((a) => (
              <li key={a.id} className="flex flex-wrap items-baseline justify-between gap-2 px-4 py-2">
                <span><span className="font-bold">{a.studentName}</span> · {a.sheetTitle}</span>
                <span className="flex gap-3">
                  <span className="font-mono text-xs text-muted">{a.dueDate ? `due ${a.dueDate}` : ""}</span>
                  <Link className="underline" href={`/progress?assignment=${a.id}`}>Progress</Link>
                </span>
              </li>
            ))}
          </ul>
        )}
      </section>
    </div>
  );
}
