import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { z } from "zod";
import { Badge } from "@/components/ui/card";
import { Caution } from "@/components/drills/caution";
import { DrillEngraving } from "@/components/drills/drill-engraving";
import type { FamilyInfo, JsonSchema } from "@/components/drills/family-options";
import { GenerateWorkspace } from "@/components/drills/generate-workspace";
import { QueryProvider } from "@/components/providers";
import { db } from "@/db";
import { getKnotSource, listHandProfiles } from "@/db/queries/knot-drills";
import { DEFAULT_PROFILE, families, suggestFamilies, type ProblemTag } from "@/lib/drills";
import { knotExcerpt } from "@/lib/knots/generate";
import { requireTeacher } from "@/lib/auth/session";

export const dynamic = "force-dynamic";
export const metadata: Metadata = { title: "Generate drills" };

export default async function KnotGeneratePage({ params }: { params: Promise<{ knotId: string }> }) {
  const ctx = await requireTeacher();
  const { knotId } = await params;
  const knot = await getKnotSource(db, ctx.studioId, knotId);
  if (!knot) notFound();
  const hands = await listHandProfiles(db, ctx.studioId);
  const infos: FamilyInfo[] = Object.values(families).map((f) => ({
    id: f.id,
    label: f.label,
    describe: f.describe,
    // A JSON round trip leaves plain objects only, as props of a client component must be.
    schema: JSON.parse(JSON.stringify(z.toJSONSchema(f.options, { io: "input", unrepresentable: "any" }))) as JsonSchema,
  }));
  const suggested = suggestFamilies(knot.tags as ProblemTag[]).filter((id) => families[id]);
  let excerpt: string | null = null;
  try {
    excerpt = knotExcerpt(knot);
  } catch {
    excerpt = null;
  }
  const bars = knot.fromBar === knot.toBar ? `bar ${knot.fromBar}` : `bars ${knot.fromBar}–${knot.toBar}`;
  return (
    <div className="flex flex-col gap-6">
      <header className="grid gap-4 lg:grid-cols-[minmax(0,1fr)_minmax(0,1.2fr)] lg:items-start">
        <div className="flex flex-col gap-2">
          <p className="text-sm font-bold uppercase tracking-widest text-walnut-soft">Knot · generate drills</p>
          <h1 className="text-3xl font-semibold">{knot.scoreTitle}</h1>
          <p className="font-mono text-sm text-muted">
            {bars} · {knot.hand === "both" ? "both hands" : `${knot.hand} hand`}
          </p>
          {knot.tags.length > 0 && (
            <ul className="flex flex-wrap gap-1.5" aria-label="Problem tags">
              {knot.tags.map((t) => <li key={t}><Badge>{t}</Badge></li>)}
            </ul>
          )}
          {knot.note && <p className="max-w-prose">{knot.note}</p>}
        </div>
        <div>
          {excerpt ? <DrillEngraving musicxml={excerpt} label={`${knot.scoreTitle}, ${bars}`} zoom={0.8} /> : <p className="text-sm text-madder">These bars could not be engraved.</p>}
        </div>
      </header>
      <Caution />
      <QueryProvider>
        <GenerateWorkspace knotId={knot.id} families={infos} suggested={suggested} hands={hands} defaultSpanMm={Math.round(DEFAULT_PROFILE.spanMm)} />
      </QueryProvider>
    </div>
  );
}
