import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { KnotList } from "@/components/knots/knot-list";
import { PieceWorkspace } from "@/components/pieces/piece-workspace";
import { PageHeader } from "@/components/ui/card";
import { db } from "@/db";
import { listPassagesForScore } from "@/db/queries/passages";
import { getScore } from "@/db/queries/scores";
import { PROBLEM_TAGS } from "@/lib/drills";
import { requireTeacher } from "@/lib/auth/session";
import { createKnot } from "./actions";
import { pieceWorkspaceData } from "./piece-data";

type Props = { params: Promise<{ pieceId: string }> };

export async function generateMetadata({ params }: Props): Promise<Metadata> {
  const ctx = await requireTeacher();
  const row = await getScore(db, ctx.studioId, (await params).pieceId);
  return { title: row?.title ?? "Piece" };
}

export default async function PiecePage({ params }: Props) {
  const ctx = await requireTeacher();
  const { pieceId } = await params;
  const row = await getScore(db, ctx.studioId, pieceId);
  if (!row) notFound();
  const [knots, data] = await Promise.all([listPassagesForScore(db, ctx.studioId, row.id), Promise.resolve(pieceWorkspaceData(row.musicxml))]);
  return (
    <div className="flex flex-col gap-6">
      <nav aria-label="Breadcrumb" className="text-sm">
        <Link href="/pieces" className="text-walnut underline-offset-2 hover:underline">← Pieces</Link>
      </nav>
      <PageHeader
        title={row.title}
        lead={`${row.composer ?? "Composer not given"} · ${row.bars} bars · select the bars a student stumbles over, choose the hand and tag what goes wrong.`}
      />
      <PieceWorkspace title={row.title} data={data} tags={PROBLEM_TAGS} saveKnot={createKnot.bind(null, row.id)} />
      <section aria-labelledby="piece-knots-title" className="flex flex-col gap-3">
        <h2 id="piece-knots-title" className="text-xl font-semibold">Knots in this piece</h2>
        <KnotList knots={knots} empty={<p className="text-sm text-muted">No knots yet. Select bars above and save one.</p>} />
      </section>
    </div>
  );
}
