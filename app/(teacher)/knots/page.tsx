import type { Metadata } from "next";
import { Badge, Card, PageHeader } from "@/components/ui/card";
import { EmptyState } from "@/components/ui/empty-state";
import { db } from "@/db";
import { listPassages } from "@/db/queries/passages";
import { requireTeacher } from "@/lib/session";

export const metadata: Metadata = { title: "Knots" };

export default async function KnotsPage() {
  const ctx = await requireTeacher();
  const knots = await listPassages(db, ctx.studioId);
  return (
    <div>
      <PageHeader title="Knots" lead="Bars a student stumbles over, with the hand and what goes wrong. Each knot can become a drill sheet." />
      {knots.length === 0 ? (
        <EmptyState title="No knots marked">Open a piece, select the bars that trip a student up, pick the hand and tag the problem.</EmptyState>
      ) : (
        <ul className="grid gap-4 sm:grid-cols-2">
          {knots.map((k) => (
            <li key={k.id}>
              <Card>
                <h2 className="text-lg font-semibold">{k.scoreTitle}</h2>
                <p className="font-mono text-xs text-muted">bars {k.fromBar}–{k.toBar} · {k.hand} hand</p>
                <div className="mt-2 flex flex-wrap gap-1.5">{k.tags.map((tag) => <Badge key={tag}>{tag}</Badge>)}</div>
                {k.note ? <p className="mt-2 text-sm">{k.note}</p> : null}
              </Card>
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
