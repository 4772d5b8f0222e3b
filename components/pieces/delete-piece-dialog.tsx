"use client";
import { useEffect, useRef, useState } from "react";
import { Button } from "@/components/ui/button";
import type { PieceListRow } from "./piece-keys";

/** Confirmation before a piece is deleted, naming what goes with it. */
export function DeletePieceDialog({
  piece,
  onCancel,
  onConfirm,
}: {
  piece: PieceListRow | null;
  onCancel(): void;
  onConfirm(piece: PieceListRow): Promise<string | null>;
}) {
  const ref = useRef<HTMLDialogElement>(null);
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  useEffect(() => {
    const d = ref.current;
    if (!d) return;
    if (piece && !d.open) d.showModal();
    if (!piece && d.open) d.close();
    setError(null);
  }, [piece]);

  async function confirm() {
    if (!piece) return;
    setBusy(true);
    const message = await onConfirm(piece);
    setBusy(false);
    if (message) setError(message);
  }

  return (
    <dialog
      ref={ref}
      onCancel={(e) => { e.preventDefault(); onCancel(); }}
      aria-labelledby="delete-piece-title"
      className="m-auto w-[min(32rem,calc(100vw-2rem))] rounded-2xl border border-line bg-card p-6 text-ink backdrop:bg-ink/40"
    >
      {piece ? (
        <div className="flex flex-col gap-3">
          <h2 id="delete-piece-title" className="text-xl font-semibold">Delete “{piece.title}”?</h2>
          <p className="text-sm">The piece and its stored file are removed for good.</p>
          <ul className="list-disc pl-5 text-sm">
            <li>
              {piece.knots === 0 ? "It has no knots." : `Its ${piece.knots === 1 ? "knot is" : `${piece.knots} knots are`} removed too.`}
            </li>
            <li>Drill sheets made from its knots stay, with their drills, but no longer point to a knot.</li>
          </ul>
          {error ? <p role="alert" className="text-sm text-madder">{error}</p> : null}
          <div className="mt-2 flex flex-wrap justify-end gap-2">
            <Button variant="secondary" onClick={onCancel} disabled={busy} autoFocus>Keep it</Button>
            <Button onClick={confirm} disabled={busy} className="bg-madder hover:bg-madder/90">
              {busy ? "Deleting…" : "Delete piece"}
            </Button>
          </div>
        </div>
      ) : null}
    </dialog>
  );
}
