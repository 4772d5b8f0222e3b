"use client";
import Link from "next/link";
import { useId, useRef, useState } from "react";
import { useRouter } from "next/navigation";
import { Button } from "@/components/ui/button";
import { sendPiece } from "./upload-request";

const MAX_BYTES = 5 * 1024 * 1024;
const ACCEPT = ".musicxml,.xml,.mxl";

type State =
  | { kind: "idle" }
  | { kind: "sending"; progress: number }
  | { kind: "done"; id: string; title: string; warnings: number }
  | { kind: "failed"; message: string };

/** Upload of a MusicXML piece: drop zone or file picker, rights confirmation, progress and plain-word errors. */
export function UploadForm() {
  const router = useRouter();
  const input = useRef<HTMLInputElement>(null);
  const [file, setFile] = useState<File | null>(null);
  const [confirmed, setConfirmed] = useState(false);
  const [confirmError, setConfirmError] = useState(false);
  const [dragging, setDragging] = useState(false);
  const [state, setState] = useState<State>({ kind: "idle" });
  const ids = { input: useId(), hint: useId(), confirm: useId(), status: useId() };

  function choose(f: File | null) {
    setFile(f);
    setState(f && f.size > MAX_BYTES ? { kind: "failed", message: `"${f.name}" is ${(f.size / 1048576).toFixed(1)} MB; pieces can be up to 5 MB.` } : { kind: "idle" });
  }

  async function submit(e: React.FormEvent) {
    e.preventDefault();
    if (!file) return setState({ kind: "failed", message: "Choose a MusicXML file first." });
    if (!confirmed) return setConfirmError(true);
    setState({ kind: "sending", progress: 0 });
    const answer = await sendPiece(file, confirmed, (p) => setState({ kind: "sending", progress: p }));
    if (answer.status === 201 && answer.body.id) {
      setState({ kind: "done", id: answer.body.id, title: answer.body.title ?? file.name, warnings: answer.body.warnings ?? 0 });
      setFile(null);
      setConfirmed(false);
      if (input.current) input.current.value = "";
      // The page renders the list again with the new piece; the interactive table takes it from there.
      router.refresh();
    } else {
      setState({ kind: "failed", message: answer.body.error ?? "The upload failed." });
    }
  }

  const sending = state.kind === "sending";
  return (
    <form onSubmit={submit} className="flex flex-col gap-4" aria-label="Upload a piece" noValidate>
      <label
        htmlFor={ids.input}
        onDragOver={(e) => { e.preventDefault(); setDragging(true); }}
        onDragLeave={() => setDragging(false)}
        onDrop={(e) => { e.preventDefault(); setDragging(false); choose(e.dataTransfer.files[0] ?? null); }}
        className={`flex cursor-pointer flex-col items-center gap-1 rounded-2xl border-2 border-dashed px-4 py-6 text-center transition-colors focus-within:ring-4 focus-within:ring-rosin/60 ${dragging ? "border-rosin bg-rosin-soft/60" : "border-line bg-paper hover:border-walnut/40"}`}
      >
        <span className="font-bold text-walnut">{file ? file.name : "Drop a MusicXML file here, or choose one"}</span>
        <span id={ids.hint} className="text-sm text-muted">
          .musicxml, .xml or .mxl — up to 5 MB
        </span>
        <input
          ref={input}
          id={ids.input}
          name="file"
          type="file"
          accept={ACCEPT}
          aria-describedby={ids.hint}
          className="sr-only"
          onChange={(e) => choose(e.target.files?.[0] ?? null)}
        />
      </label>
      <div className="flex flex-col gap-1">
        <label className="flex items-start gap-2 text-sm">
          <input
            id={ids.confirm}
            type="checkbox"
            name="confirm"
            checked={confirmed}
            required
            aria-invalid={confirmError || undefined}
            onChange={(e) => { setConfirmed(e.target.checked); setConfirmError(false); }}
            className="mt-1 size-4 accent-walnut"
          />
          <span>This piece is in the public domain or my own work.</span>
        </label>
        {confirmError ? <p role="alert" className="text-sm text-madder">Please confirm the piece is public domain or your own work.</p> : null}
      </div>
      {sending ? (
        <div className="flex items-center gap-3">
          <progress className="h-2 w-full accent-walnut" max={1} value={state.progress} aria-label="Upload progress" />
          <span className="font-mono text-xs text-muted">{Math.round(state.progress * 100)} %</span>
        </div>
      ) : null}
      <div id={ids.status} aria-live="polite">
        {state.kind === "failed" ? <p role="alert" className="rounded-xl bg-madder-soft px-3.5 py-2.5 text-sm text-madder">{state.message}</p> : null}
        {state.kind === "done" ? (
          <p className="rounded-xl bg-sage-soft px-3.5 py-2.5 text-sm text-sage">
            Uploaded <Link href={`/pieces/${state.id}`} className="font-bold underline">{state.title}</Link>
            {state.warnings > 0 ? ` (${state.warnings} small oddities in the file were tidied up)` : ""}.
          </p>
        ) : null}
      </div>
      <Button type="submit" disabled={sending || !file} className="self-start">
        {sending ? "Uploading…" : "Upload piece"}
      </Button>
    </form>
  );
}
