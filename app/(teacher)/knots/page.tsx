import type { Metadata } from "next";
import { KnotList } from "@/components/knots/knot-list";
import { PageHeader } from "@/components/ui/card";
import { EmptyState } from "@/components/ui/empty-state";
import { db } from "@/db";
import { listPassages } from "@/db/queries/passages";
import { requireTeacher } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Knots" };

export default async function KnotsPage() {
  const ctx = await requireTeacher();
  const knots = await listPassages(db, ctx.studioId);
  return (
    <div>
      <PageHeader title="Knots" lead="Bars a student stumbles over, with the hand and what goes wrong. Each knot can become a drill sheet." />
      <KnotList
        knots={knots}
        showPiece
        empty={<EmptyState title="No knots marked">Open a piece, select the bars that trip a student up, pick the hand and tag the problem.</EmptyState>}
      />
    </div>
  );
}
