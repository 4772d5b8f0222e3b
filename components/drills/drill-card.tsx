"use client";
import type { DrillDto } from "@/lib/knots/dto";
import { DownloadLinks } from "./download-links";
import { DrillEngraving } from "./drill-engraving";
import { DrillFacts } from "./drill-facts";
import { DrillPlayer } from "./drill-player";

/** One generated drill: pick box, engraving, teacher note, span, warnings, playback, downloads. */
export function DrillCard({
  drill,
  familyLabel,
  picked,
  onPick,
  downloadHref,
}: {
  drill: DrillDto;
  familyLabel: string;
  picked: boolean;
  onPick(picked: boolean): void;
  downloadHref(format: "musicxml" | "mxl" | "midi"): string;
}) {
  const id = `pick-${drill.key.replace(/[^\w-]/g, "-")}`;
  return (
    <article
      data-testid="drill-card"
      data-key={drill.key}
      aria-labelledby={`${id}-title`}
      className={`flex flex-col gap-3 rounded-[var(--radius-card)] border bg-card p-4 ${picked ? "border-walnut ring-2 ring-walnut/30" : "border-line"}`}
    >
      <header className="flex items-start justify-between gap-3">
        <div>
          <p className="text-xs font-bold uppercase tracking-wider text-walnut-soft">{familyLabel}</p>
          <h3 id={`${id}-title`} className="text-lg leading-tight font-semibold">
            {drill.title}
          </h3>
        </div>
        <label htmlFor={id} className="flex shrink-0 cursor-pointer items-center gap-2 rounded-full border border-walnut/30 px-3 py-1 text-sm font-bold text-walnut has-[:checked]:bg-walnut has-[:checked]:text-paper">
          <input id={id} type="checkbox" className="size-4 accent-rosin" checked={picked} onChange={(e) => onPick(e.target.checked)} aria-label={`Pick ${drill.title}`} />
          {picked ? "Picked" : "Pick"}
        </label>
      </header>
      <DrillEngraving musicxml={drill.musicxml} label={`${drill.title}: engraved drill`} />
      <p className="text-sm">{drill.teacherNote}</p>
      <DrillFacts
        maxSpan={drill.maxSpan}
        overSpan={drill.overSpan}
        estimatedFingering={drill.estimatedFingering}
        warnings={drill.warnings.map((w) => w.message)}
      />
      <p className="font-mono text-xs text-muted">
        ♩ = {drill.tempo.start} → {drill.tempo.target} · {drill.hands === "both" ? "both hands" : `${drill.hands} hand`}
      </p>
      <DrillPlayer playback={drill.playback} bpm={drill.tempo.start} title={drill.title} />
      <DownloadLinks href={downloadHref} title={drill.title} />
    </article>
  );
}
