import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { Caution } from "@/components/drills/caution";
import { PrintHandoutButton } from "@/components/handout/print-handout-button";
import { Card, PageHeader } from "@/components/ui/card";
import { db } from "@/db";
import { listPracticeEntries } from "@/db/queries/practice";
import { requireStudent } from "@/lib/auth/session";
import { utcDay } from "../../practice-input";
import { drillPlayback } from "./drill-playback";
import { PracticeForm } from "./practice-form";
import { SheetDrills, type StudentDrill } from "./sheet-drills";
import { loadStudentSheet } from "./student-sheet-data";

export const metadata: Metadata = { title: "Drill sheet" };
export const dynamic = "force-dynamic";

/** A student's assigned drill sheet: drills, goals, caution, downloads, the practice form and history. */
export default async function StudentSheetPage({ params }: { params: Promise<{ assignmentId: string }> }) {
  const ctx = await requireStudent();
  const { assignmentId } = await params;
  const data = await loadStudentSheet(db, ctx.studioId, assignmentId, ctx.membershipId);
  if (!data) notFound();
  const a = data.assignment;
  const drills: StudentDrill[] = data.drills.map((d) => ({ ...d, playback: drillPlayback(d.musicxml) }));
  const entries = (await listPracticeEntries(db, ctx.studioId, { studentMembershipId: ctx.membershipId, assignmentId })).reverse();
  const sheetId = a.assignment.sheetId;
  return (
    <div className="flex flex-col gap-6">
      <PageHeader
        title={a.sheetTitle}
        lead={[a.pieceTitle, a.assignment.dueDate ? `due ${a.assignment.dueDate}` : null].filter(Boolean).join(" · ")}
      />
      {a.assignment.note || a.sheetNotes ? (
        <Card><p className="text-sm">{a.assignment.note ?? a.sheetNotes}</p></Card>
      ) : null}
      <nav aria-label="Downloads" className="flex flex-wrap gap-2">
        <PrintHandoutButton sheetId={sheetId} />
        <a className="rounded-full border border-walnut/30 bg-card px-4 py-2 text-sm font-bold text-walnut" href={`/api/sheets/${sheetId}/zip`}>
          MusicXML, .mxl and MIDI (zip)
        </a>
      </nav>
      <section aria-labelledby="drills-heading" className="flex flex-col gap-3">
        <h2 id="drills-heading" className="text-xl">Drills</h2>
        <Caution />
        <SheetDrills drills={drills} />
      </section>
      <section aria-labelledby="log-heading">
        <Card>
          <h2 id="log-heading" className="mb-3 text-xl">Log today&apos;s practice</h2>
          <PracticeForm assignmentId={assignmentId} drills={a.drills.map((d) => ({ id: d.id, title: d.title }))} today={utcDay()} />
        </Card>
      </section>
      <section aria-labelledby="history-heading" className="flex flex-col gap-2">
        <h2 id="history-heading" className="text-xl">My history</h2>
        {entries.length === 0 ? (
          <p className="text-sm text-muted">No practice logged for this sheet yet.</p>
        ) : (
          <ul className="divide-y divide-line rounded-xl border border-line bg-card" data-testid="history">
            {entries.map((e) => (
              <li key={e.id} className="flex flex-col gap-1 px-4 py-2 text-sm">
                <span className="font-mono text-xs text-muted">{e.practisedOn} · {e.minutes} min · ease {e.ease}/5</span>
                <span>
                  {a.drills.filter((d) => e.tempos[d.id]).map((d) => `${d.title}: ♩ ${e.tempos[d.id]}`).join(" · ") || "no tempos"}
                </span>
                {e.comment ? <span className="text-muted">{e.comment}</span> : null}
              </li>
            ))}
          </ul>
        )}
      </section>
    </div>
  );
}
