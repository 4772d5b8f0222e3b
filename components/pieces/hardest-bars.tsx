"use client";
import type { PieceWorkspaceData } from "./piece-workspace-types";

type Hard = PieceWorkspaceData["hardest"][number];

/** The hardest bars by the fingering model, each a button that selects that bar and hand. */
export function HardestBars({ bars, onPick }: { bars: Hard[]; onPick(h: Hard): void }) {
  return (
    <section aria-labelledby="hardest-title" className="rounded-2xl border border-line bg-card p-5">
      <h2 id="hardest-title" className="mb-1 text-lg font-semibold">Hardest bars</h2>
      <p className="mb-3 text-xs text-muted">From the fingering and stretch model; pick one to select it.</p>
      {bars.length === 0 ? (
        <p className="text-sm text-muted">Nothing stands out in this piece.</p>
      ) : (
        <ol className="flex flex-col gap-2">
          {bars.map((h) => (
            <li key={`${h.measure}-${h.hand}`}>
              <button
                type="button"
                onClick={() => onPick(h)}
                className="w-full rounded-xl border border-line px-3 py-2 text-left hover:border-walnut/50 focus-visible:ring-4 focus-visible:ring-rosin/60 focus-visible:outline-none"
              >
                <span className="flex items-baseline justify-between gap-2">
                  <span className="font-bold text-walnut">Bar {h.number}, {h.hand} hand</span>
                  <span className="font-mono text-xs text-muted">{Math.round(h.score * 100)}</span>
                </span>
                <span className="block text-sm">{h.reasons.join("; ")}</span>
              </button>
            </li>
          ))}
        </ol>
      )}
    </section>
  );
}
