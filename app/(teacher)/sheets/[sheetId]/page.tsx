import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { Caution } from "@/components/drills/caution";
import { DownloadLinks } from "@/components/drills/download-links";
import { DrillEngraving } from "@/components/drills/drill-engraving";
import { DrillFacts } from "@/components/drills/drill-facts";
import { DrillPlayer } from "@/components/drills/drill-player";
import { PrintHandoutButton } from "@/components/handout/print-handout-button";
import { db } from "@/db";
import { getKnotHeading } from "@/db/queries/knot-drills";
import { getSheet } from "@/db/queries/sheets";
import { playbackOf } from "@/lib/knots/dto";
import { readScore } from "@/lib/score";
import { requireTeacher } from "@/lib/auth/session";

export const dynamic = "force-dynamic";
export const metadata: Metadata = { title: "Drill sheet" };

export default async function SheetPage({ params }: { params: Promise<{ sheetId: string }> }) {
  const ctx = await requireTeacher();
  const { sheetId } = await params;
  const sheet = await getSheet(db, ctx.studioId, sheetId);
  if (!sheet) notFound();
  const knot = sheet.passageId ? await getKnotHeading(db, ctx.studioId, sheet.passageId) : null;
  const bars = knot ? (knot.fromBar === knot.toBar ? `bar ${knot.fromBar}` : `bars ${knot.fromBar}–${knot.toBar}`) : "";
  return (
    <div className="flex flex-col gap-6">
      <header className="flex flex-col gap-3 sm:flex-row sm:items-end sm:justify-between">
        <div className="flex flex-col gap-1">
          <nav aria-label="Breadcrumb" className="text-sm">
            <ol className="flex flex-wrap items-center gap-x-1.5 gap-y-0.5 text-muted">
              <li><Link href="/sheets" className="underline hover:text-walnut">Drill sheets</Link></li>
              {knot && (
                <>
                  <li aria-hidden="true">/</li>
                  <li><Link href={`/pieces/${knot.scoreId}`} className="font-bold text-walnut underline" data-testid="sheet-piece-link">{knot.scoreTitle}</Link></li>
                  <li aria-hidden="true">/</li>
                  <li><Link href={`/knots/${knot.id}`} className="font-bold text-walnut underline" data-testid="sheet-knot-link">Knot, {bars}</Link></li>
                </>
              )}
            </ol>
          </nav>
          <h1 className="text-3xl font-semibold sm:text-4xl">{sheet.title}</h1>
          <p className="font-mono text-sm text-muted">
            {sheet.drills.length} drills{knot ? ` from ${knot.scoreTitle}, ${bars}` : ""}
          </p>
        </div>
        <div className="flex flex-col gap-2 sm:items-end">
          <div className="flex flex-wrap items-center gap-2">
            <Link
              href={`/assignments?sheet=${sheet.id}`}
              className="inline-flex items-center justify-center rounded-full bg-sage px-4 py-2 text-sm font-bold text-paper hover:opacity-90"
              data-testid="assign-sheet-link"
            >
              Assign to students
            </Link>
            <PrintHandoutButton sheetId={sheet.id} />
          </div>
          <a href={`/api/sheets/${sheet.id}/zip`} download className="text-sm font-bold text-walnut underline">
            Download all drills (zip: MusicXML, .mxl, MIDI)
          </a>
        </div>
      </header>
      <Caution />
      <ol className="flex flex-col gap-5" aria-label="Drills in order">
        {sheet.drills.map((d, i) => {
          let playback: ReturnType<typeof playbackOf> | null = null;
          try {
            playback = playbackOf(readScore(d.musicxml).score);
          } catch {
            playback = null;
          }
          const tempo = d.meta.tempo ?? { start: 60, target: 80 };
          return (
            <li key={d.id} data-testid="sheet-drill" className="grid gap-4 rounded-[var(--radius-card)] border border-line bg-card p-4 lg:grid-cols-[minmax(0,1.6fr)_minmax(0,1fr)]">
              <div className="flex flex-col gap-3">
                <h2 className="text-xl font-semibold">
                  <span className="font-mono text-base text-muted">{i + 1}. </span>
                  <span data-testid="sheet-drill-title">{d.title}</span>
                </h2>
                <DrillEngraving musicxml={d.musicxml} label={`${d.title}: engraved drill`} />
                {playback ? (
                  <DrillPlayer playback={playback} bpm={tempo.start} title={d.title} />
                ) : (
                  <p role="alert" data-testid="drill-unreadable" className="rounded-xl bg-madder-soft px-3 py-2 text-sm text-madder">
                    This drill&apos;s stored notation could not be read, so it cannot be played here. Download its MusicXML or generate the sheet again.
                  </p>
                )}
              </div>
              <div className="flex flex-col gap-3">
                <p className="rounded-xl bg-sage-soft px-3 py-2 font-mono text-sm text-ink" data-testid="tempo-goal">
                  Tempo: start ♩ = {tempo.start}, goal ♩ = {tempo.target}
                </p>
                {d.studentNote && (
                  <div>
                    <h3 className="text-xs font-bold uppercase tracking-wider text-muted">For the student</h3>
                    <p>{d.studentNote}</p>
                  </div>
                )}
                {d.teacherNote && (
                  <div>
                    <h3 className="text-xs font-bold uppercase tracking-wider text-muted">Why</h3>
                    <p className="text-sm">{d.teacherNote}</p>
                  </div>
                )}
                <DrillFacts
                  maxSpan={d.meta.maxSpan}
                  overSpan={Boolean(d.meta.maxSpan?.right?.overComfortable || d.meta.maxSpan?.left?.overComfortable)}
                  estimatedFingering={(d.meta.fingeringSource?.estimated ?? 0) > 0}
                  warnings={d.meta.warnings ?? []}
                />
                <DownloadLinks href={(format) => `/api/drills/${d.id}/${format}`} title={d.title} />
              </div>
            </li>
          );
        })}
      </ol>
    </div>
  );
}
