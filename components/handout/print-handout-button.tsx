"use client";
import { useState } from "react";

/**
 * "Print / Download PDF" for a drill sheet: opens the handout PDF (A4 or Letter) in a new tab to
 * print, or downloads it. `assignmentId` prints a student's copy with their tempo goals.
 */
export function PrintHandoutButton({ sheetId, assignmentId, defaultPaper = "a4" }: { sheetId: string; assignmentId?: string; defaultPaper?: "a4" | "letter" }) {
  const [paper, setPaper] = useState(defaultPaper);
  const query = (download: boolean) =>
    `/api/sheets/${sheetId}/handout?paper=${paper}${assignmentId ? `&assignment=${assignmentId}` : ""}${download ? "&download=1" : ""}`;
  return (
    <div className="inline-flex flex-wrap items-center gap-2" role="group" aria-label="Handout PDF">
      <a className="rounded-full bg-walnut px-4 py-2 text-sm font-bold text-paper hover:bg-walnut-soft" href={query(false)} target="_blank" rel="noopener">
        Print / Download PDF
      </a>
      <a className="text-sm font-bold text-walnut underline" href={query(true)} download>
        Save PDF
      </a>
      <label className="text-sm text-muted">
        <span className="sr-only">Paper size</span>
        <select value={paper} onChange={(e) => setPaper(e.target.value as "a4" | "letter")} className="rounded-lg border border-line bg-card px-2 py-1">
          <option value="a4">A4</option>
          <option value="letter">Letter</option>
        </select>
      </label>
    </div>
  );
}
