"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { OCTAVE_WIDTHS } from "@/lib/drills/hand";
import { updateHandProfileAction } from "./actions";

/** Inline editor of one student's hand profile: span in mm or inches, and the keyboard they play on. */
export function HandProfileEditor({ membershipId, name, spanMm, octaveMm }: { membershipId: string; name: string; spanMm: number | null; octaveMm: number | null }) {
  const router = useRouter();
  const [unit, setUnit] = useState<"mm" | "in">("mm");
  const [span, setSpan] = useState(spanMm ? String(spanMm) : "");
  const [octave, setOctave] = useState(OCTAVE_WIDTHS.find((o) => o.mm === octaveMm)?.id ?? "standard");
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  const [busy, setBusy] = useState(false);
  const id = `hp-${membershipId}`;
  async function save(e: React.FormEvent) {
    e.preventDefault();
    setBusy(true);
    const r = await updateHandProfileAction({ membershipId, unit, span: span === "" ? Number.NaN : Number(span), octave });
    setBusy(false);
    if (r.ok) {
      setMessage({ ok: true, text: `Saved: ${r.data.spanMm} mm span.` });
      router.refresh();
    } else setMessage({ ok: false, text: [r.message, ...Object.values(r.fieldErrors ?? {}).flat()].join(" ") });
  }
  return (
    <form onSubmit={save} className="flex flex-wrap items-center gap-1.5 text-sm" aria-label={`Hand profile of ${name}`}>
      <label htmlFor={`${id}-span`} className="sr-only">1–5 span of {name}</label>
      <input id={`${id}-span`} value={span} onChange={(e) => setSpan(e.target.value)} inputMode="decimal" className="w-20 rounded-lg border border-line bg-card px-2 py-1" />
      <label htmlFor={`${id}-unit`} className="sr-only">Unit</label>
      <select id={`${id}-unit`} value={unit} onChange={(e) => setUnit(e.target.value as "mm" | "in")} className="rounded-lg border border-line bg-card px-1 py-1">
        <option value="mm">mm</option>
        <option value="in">inches</option>
      </select>
      <label htmlFor={`${id}-octave`} className="sr-only">Keyboard of {name}</label>
      <select id={`${id}-octave`} value={octave} onChange={(e) => setOctave(e.target.value)} className="min-w-0 max-w-full flex-1 rounded-lg border border-line bg-card px-1 py-1 sm:max-w-48 sm:flex-none">
        {OCTAVE_WIDTHS.map((o) => <option key={o.id} value={o.id}>{o.label}</option>)}
      </select>
      <button type="submit" disabled={busy} className="rounded-full border border-walnut/30 px-3 py-1 font-bold text-walnut">Save</button>
      <span className="basis-full text-xs text-muted">mm: comfortable thumb-to-little-finger span · inches: the measured full span</span>
      {message ? <span role={message.ok ? "status" : "alert"} className={message.ok ? "text-sage" : "text-madder"}>{message.text}</span> : null}
    </form>
  );
}
