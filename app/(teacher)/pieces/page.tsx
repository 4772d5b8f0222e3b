import type { Metadata } from "next";
import { Card, PageHeader } from "@/components/ui/card";
import { EmptyState } from "@/components/ui/empty-state";
import { db } from "@/db";
import { listScores } from "@/db/queries/scores";
import { requireTeacher } from "@/lib/session";

export const metadata: Metadata = { title: "Pieces" };

export default async function PiecesPage() {
  const ctx = await requireTeacher();
  const pieces = await listScores(db, ctx.studioId);
  return (
    <div>
      <PageHeader title="Pieces" lead="The scores in your studio. Knotwork keeps a cleaned copy of each file you upload." />
      {pieces.length === 0 ? (
        <EmptyState title="No pieces yet">Upload a MusicXML file (.musicxml, .xml or .mxl) exported from your notation program.</EmptyState>
      ) : (
        <ul className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
          {pieces.map((p) => (
            <li key={p.id}>
              <Card>
                <h2 className="text-lg font-semibold">{p.title}</h2>
                <p className="text-sm text-muted">{p.composer ?? "Composer not given"}</p>
                <p className="mt-3 font-mono text-xs text-muted">{p.bars} bars</p>
              </Card>
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
