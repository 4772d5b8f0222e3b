import Link from "next/link";
import type { Metadata } from "next";
import { Card } from "@/components/ui/card";
import { EmptyState } from "@/components/ui/empty-state";
import { db } from "@/db";
import { listPassages } from "@/db/queries/passages";
import { listScores } from "@/db/queries/scores";
import { listSheets } from "@/db/queries/sheets";
import { listStudents } from "@/db/queries/students";
import { requireTeacher } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Studio home" };

function Section({ title, href, count, children }: { title: string; href: string; count: number; children: React.ReactNode }) {
  return (
    <Card className="flex flex-col gap-4">
      <div className="flex items-baseline justify-between gap-2">
        <h2 className="text-xl font-semibold">
          <Link href={href} className="hover:underline">{title}</Link>
        </h2>
        <span className="font-mono text-sm text-muted">{count}</span>
      </div>
      {children}
    </Card>
  );
}

export default async function TeacherHome() {
  const ctx = await requireTeacher();
  const [pieces, knots, sheets, students] = await Promise.all([
    listScores(db, ctx.studioId),
    listPassages(db, ctx.studioId),
    listSheets(db, ctx.studioId),
    listStudents(db, ctx.studioId),
  ]);
  const firstName = ctx.user.name.split(" ")[0];
  return (
    <div>
      <header className="mb-8">
        <p className="text-sm font-bold uppercase tracking-widest text-rosin">{ctx.studioName}</p>
        <h1 className="mt-1 text-3xl font-semibold sm:text-4xl">Good to see you, {firstName}.</h1>
        <p className="mt-2 max-w-2xl text-muted">
          Upload a piece, mark the bars where a student stumbles, and turn that knot into a drill sheet.
        </p>
      </header>
      <div className="grid gap-5 md:grid-cols-2">
        <Section title="Pieces" href="/pieces" count={pieces.length}>
          {pieces.length === 0 ? (
            <EmptyState title="No pieces yet">Upload a MusicXML file (.musicxml, .xml or .mxl) to start marking knots in it.</EmptyState>
          ) : (
            <ul className="divide-y divide-line">
              {pieces.slice(0, 4).map((p) => (
                <li key={p.id} className="flex items-baseline justify-between gap-3 py-2">
                  <Link href={`/pieces/${p.id}`} className="font-bold hover:underline">{p.title}</Link>
                  <span className="shrink-0 font-mono text-xs text-muted">{p.bars} bars</span>
                </li>
              ))}
            </ul>
          )}
        </Section>
        <Section title="Knots" href="/knots" count={knots.length}>
          {knots.length === 0 ? (
            <EmptyState title="No knots marked">
              {pieces.length === 0
                ? "Once a piece is uploaded, open it and select the bars a student trips over."
                : "Open a piece and select the bars a student trips over, then choose the hand and what goes wrong."}
            </EmptyState>
          ) : (
            <ul className="divide-y divide-line">
              {knots.slice(0, 4).map((k) => (
                <li key={k.id} className="py-2">
                  <Link href={`/knots/${k.id}`} className="hover:underline">
                    <span className="font-bold">{k.scoreTitle}</span>{" "}
                    <span className="font-mono text-xs text-muted">bars {k.fromBar}–{k.toBar} · {k.hand}</span>
                  </Link>
                  {k.tags.length > 0 ? <span className="block text-xs text-muted">{k.tags.join(", ")}</span> : null}
                </li>
              ))}
            </ul>
          )}
        </Section>
        <Section title="Drill sheets" href="/sheets" count={sheets.length}>
          {sheets.length === 0 ? (
            <EmptyState title="No drill sheets yet">Pick drills generated from a knot, put them in order and add your notes — that makes a sheet.</EmptyState>
          ) : (
            <ul className="divide-y divide-line">
              {sheets.slice(0, 4).map((s) => (
                <li key={s.id} className="flex items-baseline justify-between gap-3 py-2">
                  <Link href={`/sheets/${s.id}`} className="font-bold hover:underline">{s.title}</Link>
                  <span className="font-mono text-xs text-muted">{s.drills} drills</span>
                </li>
              ))}
            </ul>
          )}
        </Section>
        <Section title="Students" href="/students" count={students.length}>
          {students.length === 0 ? (
            <EmptyState title="No students yet">Invite a student by e-mail; they join your studio and see the sheets you assign.</EmptyState>
          ) : (
            <ul className="divide-y divide-line">
              {students.slice(0, 4).map((s) => (
                <li key={s.membershipId} className="flex items-baseline justify-between gap-3 py-2">
                  <span className="font-bold">{s.name}</span>
                  <span className="font-mono text-xs text-muted">{s.spanMm ? `span ${s.spanMm} mm` : "no hand profile"}</span>
                </li>
              ))}
            </ul>
          )}
        </Section>
      </div>
    </div>
  );
}
