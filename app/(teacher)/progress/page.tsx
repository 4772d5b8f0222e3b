import type { Metadata } from "next";
import Link from "next/link";
import { Card, PageHeader } from "@/components/ui/card";
import { EmptyState } from "@/components/ui/empty-state";
import { db } from "@/db";
import { getAssignment, listAssignmentsForStudio } from "@/db/queries/assignments";
import { listPracticeEntries } from "@/db/queries/practice";
import { listStudents } from "@/db/queries/students";
import { requireTeacher } from "@/lib/auth/session";
import { ProgressChart } from "./chart-loader";

export const metadata: Metadata = { title: "Progress" };
export const dynamic = "force-dynamic";

const chip =
  "rounded-full border border-line bg-card px-3 py-1.5 font-bold text-walnut hover:border-walnut/50 aria-[current=page]:border-walnut aria-[current=page]:bg-walnut aria-[current=page]:text-paper";

/** Practice entries per student (?student=) or per assignment (?assignment=), with a tempo chart. */
export default async function ProgressPage({ searchParams }: { searchParams: Promise<{ student?: string; assignment?: string }> }) {
  const ctx = await requireTeacher();
  const { student, assignment } = await searchParams;
  const [students, assignments] = await Promise.all([listStudents(db, ctx.studioId), listAssignmentsForStudio(db, ctx.studioId)]);
  const chosenAssignment = assignment ? await getAssignment(db, ctx.studioId, assignment, null) : null;
  const studentId = chosenAssignment?.assignment.studentMembershipId ?? (students.some((s) => s.membershipId === student) ? student : undefined);
  const entries = await listPracticeEntries(db, ctx.studioId, { studentMembershipId: studentId, assignmentId: chosenAssignment?.assignment.id });
  const drillTitles = new Map<string, string>();
  for (const a of chosenAssignment ? [chosenAssignment] : []) for (const d of a.drills) drillTitles.set(d.id, d.title);
  if (!chosenAssignment) {
    for (const a of assignments.filter((x) => entries.some((e) => e.assignmentId === x.id))) {
      const full = await getAssignment(db, ctx.studioId, a.id, null);
      for (const d of full?.drills ?? []) drillTitles.set(d.id, `${a.sheetTitle}: ${d.title}`);
    }
  }
  const series = [...drillTitles].filter(([id]) => entries.some((e) => e.tempos[id])).map(([key, label]) => ({ key, label }));
  const data = entries.map((e) => ({ day: e.practisedOn, ...Object.fromEntries(series.map((s) => [s.key, e.tempos[s.key] ?? null])) }));
  const heading = chosenAssignment ? `${chosenAssignment.studentName} · ${chosenAssignment.sheetTitle}` : studentId ? students.find((s) => s.membershipId === studentId)?.name : "All students";
  return (
    <div className="flex flex-col gap-6">
      <PageHeader title="Progress" lead="What your students practised, for how long, and how fast they got." />
      <nav aria-label="Students" className="flex flex-wrap gap-2 text-sm">
        <Link href="/progress" className={chip} aria-current={!studentId ? "page" : undefined}>All students</Link>
        {students.map((s) => (
          <Link key={s.membershipId} href={`/progress?student=${s.membershipId}`} className={chip} aria-current={s.membershipId === studentId ? "page" : undefined}>{s.name}</Link>
        ))}
      </nav>
      <h2 className="text-xl">{heading}</h2>
      {entries.length === 0 ? (
        <EmptyState title="No practice logged yet">Entries appear here as soon as a student logs practice on an assigned sheet.</EmptyState>
      ) : (
        <>
          {series.length > 0 ? (
            <Card><ProgressChart data={data} series={series} /></Card>
          ) : null}
          <div className="overflow-x-auto rounded-xl border border-line bg-card">
            <table className="w-full min-w-[44rem] text-left text-sm" data-testid="progress-table">
              <caption className="sr-only">Practice entries</caption>
              <thead className="border-b border-line bg-paper">
                <tr>{["Date", "Student", "Sheet", "Minutes", "Tempo reached", "Ease", "Comment"].map((h) => <th key={h} scope="col" className="px-3 py-2 font-bold text-walnut">{h}</th>)}</tr>
              </thead>
              <tbody>
                {[...entries].reverse().map((e) => (
                  <tr key={e.id} className="border-b border-line align-top last:border-0">
                    <td className="whitespace-nowrap px-3 py-2 font-mono text-xs">{e.practisedOn}</td>
                    <td className="px-3 py-2">{e.studentName}</td>
                    <td className="px-3 py-2">{e.sheetTitle}</td>
                    <td className="px-3 py-2">{e.minutes}</td>
                    <td className="px-3 py-2">{Object.entries(e.tempos).map(([id, bpm]) => `${drillTitles.get(id)?.split(": ").at(-1) ?? "drill"} ♩ ${bpm}`).join(" · ") || "—"}</td>
                    <td className="px-3 py-2">{e.ease}/5</td>
                    <td className="px-3 py-2 text-muted">{e.comment ?? ""}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        </>
      )}
    </div>
  );
}
