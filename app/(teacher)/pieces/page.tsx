import type { Metadata } from "next";
import { Card, PageHeader } from "@/components/ui/card";
import { PiecesList } from "@/components/pieces/pieces-list";
import { PiecesPlainTable } from "@/components/pieces/pieces-plain-table";
import { UploadForm } from "@/components/pieces/upload-form";
import { db } from "@/db";
import { listScoresWithKnots } from "@/db/queries/scores";
import { requireTeacher } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Pieces" };

export default async function PiecesPage() {
  const ctx = await requireTeacher();
  const rows = await listScoresWithKnots(db, ctx.studioId);
  const pieces = rows.map((r) => ({ ...r, createdAt: r.createdAt.toISOString() }));
  return (
    <div className="flex flex-col gap-6">
      <PageHeader title="Pieces" lead="The scores in your studio. Knotwork keeps a cleaned copy of each file you upload." />
      <div className="grid grid-cols-[minmax(0,1fr)] gap-6 lg:grid-cols-[20rem_minmax(0,1fr)] lg:items-start">
        <Card>
          <h2 className="mb-3 text-lg font-semibold">Upload a piece</h2>
          <UploadForm />
        </Card>
        <section aria-labelledby="pieces-list-title" className="min-w-0">
          <h2 id="pieces-list-title" className="sr-only">Your pieces</h2>
          <PiecesList initial={pieces}>
            <PiecesPlainTable pieces={pieces} />
          </PiecesList>
        </section>
      </div>
    </div>
  );
}
