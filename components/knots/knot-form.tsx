"use client";
import { useState, useTransition } from "react";
import { Button } from "@/components/ui/button";
import type { ActionResult } from "@/lib/action-result";


export interface KnotDraft {
  from: number;
  to: number;
  hand: "right" | "left" | "both";
  /** The part the knot is on, when the teacher picked one of several that could be the piano. */
  part?: string;
}

/** Problem tags and a note for the selected bars; saves through the given server action. */
export function KnotForm({
  selection,
  describe,
  tags: allTags,
  save,
  onSaved,
}: {
  selection: KnotDraft | null;
  describe(sel: KnotDraft): string;
  tags: readonly string[];
  save(input: KnotDraft & { tags: string[]; note?: string }): Promise<ActionResult<{ id: string }>>;
  onSaved?(id: string): void;
}) {
  const [tags, setTags] = useState<string[]>([]);
  const [note, setNote] = useState("");
  const [result, setResult] = useState<{ ok: boolean; message: string; fields?: Record<string, string[]> } | null>(null);
  const [pending, start] = useTransition();

  function toggle(tag: string, on: boolean) {
    setTags((cur) => (on ? [...cur, tag] : cur.filter((t) => t !== tag)));
  }

  function submit(e: React.FormEvent) {
    e.preventDefault();
    if (!selection) return setResult({ ok: false, message: "Select the bars of the knot in the score first." });
    if (tags.length === 0) return setResult({ ok: false, message: "Tick at least one problem.", fields: { tags: ["Tick at least one problem."] } });
    start(async () => {
      const res = await save({ ...selection, tags, note: note.trim() || undefined });
      if (res.ok) {
        setResult({ ok: true, message: `Knot saved: ${describe(selection)}.` });
        setTags([]);
        setNote("");
        onSaved?.(res.data.id);
      } else {
        setResult({ ok: false, message: res.message, fields: res.fieldErrors });
      }
    });
  }

  return (
    <form onSubmit={submit} aria-label="Mark a knot" className="flex flex-col gap-4">
      <p className="text-sm" data-testid="knot-selection">
        {selection ? <><span className="font-bold">Selected:</span> {describe(selection)}</> : "Select bars in the score: click, shift-click or drag, or use the arrow keys."}
      </p>
      <fieldset className="flex flex-col gap-2">
        <legend className="mb-1 text-sm font-bold text-walnut">What goes wrong</legend>
        <div className="flex flex-wrap gap-2">
          {allTags.map((tag) => (
            <label key={tag} className="cursor-pointer">
              <input type="checkbox" className="peer sr-only" checked={tags.includes(tag)} onChange={(e) => toggle(tag, e.target.checked)} />
              <span className="inline-block rounded-full border border-line bg-card px-3 py-1 text-sm peer-checked:border-walnut peer-checked:bg-walnut peer-checked:text-paper peer-focus-visible:ring-4 peer-focus-visible:ring-rosin/60">
                {tag}
              </span>
            </label>
          ))}
        </div>
        {result?.fields?.tags ? <p role="alert" className="text-sm text-madder">{result.fields.tags.join(" ")}</p> : null}
      </fieldset>
      <label className="flex flex-col gap-1 text-sm font-bold text-walnut">
        Note for yourself (optional)
        <textarea
          value={note}
          onChange={(e) => setNote(e.target.value)}
          maxLength={500}
          rows={3}
          placeholder="e.g. the thumb lands late after the shift"
          className="rounded-xl border border-line bg-card px-3.5 py-2 text-base font-normal text-ink outline-none focus:border-walnut"
        />
      </label>
      <div aria-live="polite">
        {result && !result.fields?.tags ? (
          <p role={result.ok ? "status" : "alert"} className={`rounded-xl px-3.5 py-2 text-sm ${result.ok ? "bg-sage-soft text-sage" : "bg-madder-soft text-madder"}`}>
            {result.message}
          </p>
        ) : null}
      </div>
      <Button type="submit" disabled={pending || !selection} className="self-start">
        {pending ? "Saving…" : "Save knot"}
      </Button>
    </form>
  );
}
