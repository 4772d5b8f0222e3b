"use client";
import { useRouter } from "next/navigation";
import { useEffect, useMemo, useState } from "react";
import type { GenerateRequestInput } from "@/lib/knots/generate-request";
import { DrillCard } from "./drill-card";
import type { FamilyInfo } from "./family-options";
import { FamilySwitches } from "./family-switches";
import { SheetBuilder } from "./sheet-builder";
import type { PickedDrill } from "./sheet-item";
import { RequestProblem, useKnotDrills } from "./use-knot-drills";

export interface HandChoice {
  membershipId: string;
  name: string;
  spanMm: number;
}

/** The generate screen's working area: families and options → previews → the sheet being built. */
export function GenerateWorkspace({
  knotId,
  families,
  suggested,
  hands,
  defaultSpanMm,
}: {
  knotId: string;
  families: FamilyInfo[];
  suggested: string[];
  hands: HandChoice[];
  defaultSpanMm: number;
}) {
  const router = useRouter();
  const [enabled, setEnabled] = useState<string[]>(suggested.length ? suggested : families.slice(0, 1).map((f) => f.id));
  const [options, setOptions] = useState<Record<string, Record<string, unknown>>>({});
  const [profile, setProfile] = useState("");
  const [live, setLive] = useState(false);
  const draft = useMemo<GenerateRequestInput>(() => {
    const ids = families.map((f) => f.id).filter((id) => enabled.includes(id));
    const opts = Object.fromEntries(ids.filter((id) => options[id]).map((id) => [id, options[id]]));
    return { families: ids, options: opts, ...(profile ? { profile } : {}) };
  }, [families, enabled, options, profile]);
  const [request, setRequest] = useState<GenerateRequestInput | null>(null);
  useEffect(() => {
    if (!live || draft.families.length === 0) return;
    const t = setTimeout(() => setRequest(draft), 300);
    return () => clearTimeout(t);
  }, [draft, live]);
  const query = useKnotDrills(knotId, request);
  const [picks, setPicks] = useState<PickedDrill[]>([]);
  const [saving, setSaving] = useState(false);
  const [saveProblems, setSaveProblems] = useState<string[]>([]);

  // Picks follow regenerated drills by key; a pick whose drill is gone drops out.
  const drills = query.data?.drills;
  useEffect(() => {
    if (!drills) return;
    setPicks((old) => old.flatMap((p) => {
      const d = drills.find((x) => x.key === p.key);
      return d ? [{ ...p, drill: d }] : [];
    }));
  }, [drills]);

  const labelOf = (id: string) => families.find((f) => f.id === id)?.label ?? id;
  const pick = (key: string, on: boolean) => {
    const d = drills?.find((x) => x.key === key);
    if (!d) return;
    setPicks((old) => (on ? [...old.filter((p) => p.key !== key), { key, drill: d, studentNote: d.studentNote, tempo: { ...d.tempo } }] : old.filter((p) => p.key !== key)));
  };
  const href = (key: string) => (format: string) =>
    `/api/drills/preview?${new URLSearchParams({ knot: knotId, key, format, request: JSON.stringify(request ?? draft) })}`;

  async function save(title: string) {
    setSaving(true);
    setSaveProblems([]);
    const res = await fetch("/api/sheets", {
      method: "POST",
      headers: { "Content-Type": "application/json" },
      body: JSON.stringify({ knotId, title, request, drills: picks.map((p) => ({ key: p.key, studentNote: p.studentNote, tempo: p.tempo })) }),
    });
    const body = await res.json().catch(() => ({}));
    if (res.ok && body.id) {
      router.push(`/sheets/${body.id}`);
      return;
    }
    setSaving(false);
    setSaveProblems(body.problems?.length ? body.problems : [body.message ?? `Saving failed (${res.status}).`]);
  }

  const error = query.error instanceof RequestProblem ? query.error : query.error ? new RequestProblem(String(query.error.message), []) : null;
  return (
    <div className="grid gap-6 lg:grid-cols-[16rem_minmax(0,1fr)_18rem] lg:items-start lg:gap-5">
      {/* On wide screens the families scroll inside their own panel, so the Generate button below them covers nothing. */}
      <aside aria-label="Drill families" className="flex flex-col gap-3 lg:sticky lg:top-4 lg:max-h-[calc(100dvh-2rem)]">
        <div className="flex flex-col gap-4 lg:min-h-0 lg:overflow-y-auto lg:pr-1" data-testid="family-panel">
          <div className="flex flex-col gap-1">
            <label htmlFor="hand-profile" className="text-sm font-bold text-walnut">Measure spans for</label>
            <select id="hand-profile" value={profile} onChange={(e) => setProfile(e.target.value)}
              className="rounded-xl border border-line bg-card px-3 py-2 text-sm focus:border-walnut focus:outline-none">
              <option value="">Default hand ({defaultSpanMm} mm)</option>
              {hands.map((h) => <option key={h.membershipId} value={h.membershipId}>{h.name} ({h.spanMm} mm)</option>)}
            </select>
          </div>
          <FamilySwitches
            families={families}
            suggested={suggested}
            enabled={enabled}
            options={options}
            onToggle={(id, on) => setEnabled((old) => (on ? [...old, id] : old.filter((x) => x !== id)))}
            onOptions={(id, next) => setOptions((old) => ({ ...old, [id]: next }))}
          />
        </div>
        <button type="button" disabled={draft.families.length === 0}
          onClick={() => { setLive(true); setRequest(draft); }}
          className="shrink-0 rounded-full bg-walnut px-5 py-3 font-bold text-paper shadow-md hover:bg-walnut-soft disabled:opacity-60">
          {query.isFetching ? "Generating…" : "Generate"}
        </button>
      </aside>
      <div className="flex min-w-0 flex-col gap-5">
        <div aria-live="polite" className="flex flex-col gap-2">
          {!request && <p className="rounded-xl border border-dashed border-line p-6 text-center text-muted">The families suggested for this knot are switched on. Add or remove families, adjust their options, then press Generate.</p>}
          {error && (
            <div role="alert" className="rounded-xl border border-madder/40 bg-madder-soft p-3 text-sm text-madder">
              <p className="font-bold">{error.message}</p>
              {error.problems.length > 0 && <ul className="list-disc pl-5">{error.problems.map((p, i) => <li key={i}>{p}</li>)}</ul>}
            </div>
          )}
          {query.data && (
            <p className="text-sm text-muted" data-testid="generate-summary">
              {query.data.drills.length} drills{query.isFetching ? " — updating…" : ""}
              {picks.length > 0 && <span className="lg:hidden"> · <a href="#sheet-builder" className="font-bold text-walnut underline">{picks.length} picked</a></span>}
            </p>
          )}
          {query.data && query.data.skipped.length > 0 && (
            <ul className="flex flex-col gap-1 text-sm" aria-label="Skipped families" data-testid="skipped">
              {query.data.skipped.map((s) => (
                <li key={s.family} className="rounded-lg bg-stone-100 px-3 py-1.5"><strong>{labelOf(s.family)}</strong> skipped: {s.reason}</li>
              ))}
            </ul>
          )}
        </div>
        {drills && (
          <section aria-label="Drill previews" className="grid gap-4">
            {drills.map((d) => (
              <DrillCard key={d.key} drill={d} familyLabel={labelOf(d.family)} picked={picks.some((p) => p.key === d.key)}
                onPick={(on) => pick(d.key, on)} downloadHref={href(d.key)} />
            ))}
          </section>
        )}
      </div>
      <SheetBuilder items={picks} onItems={setPicks} onSave={save} saving={saving} problems={saveProblems} />
    </div>
  );
}
