"use client";
import dynamic from "next/dynamic";
import type { PlaybackData } from "@/lib/knots/dto";
import type { StudentDrillData } from "./student-sheet-data";

const DrillPreview = dynamic(() => import("@/components/score/drill-preview").then((m) => m.DrillPreview), {
  ssr: false,
  loading: () => <div className="h-32 animate-pulse rounded-xl bg-paper" />,
});
const Player = dynamic(() => import("@/components/score/player").then((m) => m.Player), { ssr: false });

/** A drill as the student sees it, with the notes its player plays. */
export type StudentDrill = StudentDrillData & { playback: PlaybackData | null };

/** The drills of an assigned sheet: engraving, note, tempo goal and a player for each. */
export function SheetDrills({ drills }: { drills: StudentDrill[] }) {
  return (
    <ol className="flex flex-col gap-5">
      {drills.map((d, i) => (
        <li key={d.id} className="rounded-[var(--radius-card)] border border-line bg-card p-4" data-testid="student-drill">
          <div className="flex flex-wrap items-baseline justify-between gap-2">
            <h3 className="text-lg font-semibold">{i + 1}. {d.title}</h3>
            {d.goal ? <p className="font-mono text-sm text-sage">start ♩ = {d.start ?? "…"} → goal ♩ = {d.goal}</p> : null}
          </div>
          <DrillPreview musicxml={d.musicxml} label={d.title} className="mt-3" />
          {d.studentNote ? <p className="mt-3 text-sm">{d.studentNote}</p> : null}
          {d.spanWarnings.length > 0 ? (
            <div role="alert" data-testid="span-warning" className="mt-3 rounded-xl border border-madder/50 bg-madder-soft px-3 py-2 text-sm text-madder">
              <strong>Too wide for your hand.</strong>
              <ul className="mt-1 list-disc pl-5">
                {d.spanWarnings.map((w) => <li key={w}>{w}</li>)}
              </ul>
            </div>
          ) : null}
          {d.warnings.map((w) => <p key={w} className="mt-2 text-sm text-madder">{w}</p>)}
          {d.playback ? (
            <Player
              className="mt-3"
              events={d.playback.events}
              beatsPerBar={d.playback.beatsPerBar}
              beatUnitQ={d.playback.beatUnitQ}
              initialBpm={d.start ?? d.goal ?? 60}
              label={`Play ${d.title}`}
            />
          ) : null}
        </li>
      ))}
    </ol>
  );
}
