"use client";
import dynamic from "next/dynamic";
import { useMemo, useState } from "react";
import type { BarSelection } from "@/components/score/bar-selection";
import type { BarMark, PlaybackEvent } from "@/components/score/playback-timeline";

const ScoreView = dynamic(() => import("@/components/score/score-view").then((m) => m.ScoreView), {
  ssr: false,
  loading: () => <div className="min-h-[60vh] animate-pulse rounded-md bg-card" />,
});
const Player = dynamic(() => import("@/components/score/player").then((m) => m.Player), { ssr: false });
const DrillPreview = dynamic(() => import("@/components/score/drill-preview").then((m) => m.DrillPreview), {
  ssr: false,
});

export interface LabPiece {
  name: string;
  musicxml: string;
  bpm: number;
  beatsPerBar: number;
  beatUnitQ: number;
  barAnchorQ: number;
  bars: BarMark[];
  events: PlaybackEvent[];
}

/** An invented difficulty curve, so the overlay has something to show. */
function labHeat(count: number) {
  const wave = (i: number, k: number) => Math.max(0, Math.sin((i + k) * 0.9)) ** 2;
  return {
    right: Array.from({ length: count }, (_, i) => wave(i, 0)),
    left: Array.from({ length: count }, (_, i) => wave(i, 2) * 0.7),
  };
}

export function LabScore({ piece, drillXml }: { piece: LabPiece; drillXml: string }) {
  const [selection, setSelection] = useState<BarSelection | null>(null);
  const [confirmed, setConfirmed] = useState<BarSelection | null>(null);
  const [showHeat, setShowHeat] = useState(false);
  const [cursor, setCursor] = useState<number | null>(null);
  const heat = useMemo(() => labHeat(piece.bars.length), [piece.bars.length]);
  return (
    <div className="flex flex-col gap-6">
      <section className="flex flex-col gap-3" aria-label="Piece">
        <label className="flex items-center gap-2 text-sm">
          <input type="checkbox" checked={showHeat} onChange={(e) => setShowHeat(e.target.checked)} />
          Show difficulty
        </label>
        <Player
          events={piece.events}
          beatsPerBar={piece.beatsPerBar}
          beatUnitQ={piece.beatUnitQ}
          initialBpm={piece.bpm}
          barAnchorQ={piece.barAnchorQ}
          bars={piece.bars}
          onCursor={setCursor}
          label={`Play ${piece.name}`}
        />
        <ScoreView
          musicxml={piece.musicxml}
          selection={selection}
          onSelectionChange={setSelection}
          onConfirm={setConfirmed}
          heat={showHeat ? heat : null}
          cursorTime={cursor}
          label={piece.name}
        />
        <dl className="grid grid-cols-[auto_1fr] gap-x-4 text-sm" data-testid="lab-state">
          <dt>Selection</dt>
          <dd data-testid="lab-selection">{selection ? `${selection.from}-${selection.to} ${selection.hand}` : "none"}</dd>
          <dt>Confirmed</dt>
          <dd data-testid="lab-confirmed">{confirmed ? `${confirmed.from}-${confirmed.to} ${confirmed.hand}` : "none"}</dd>
          <dt>Cursor</dt>
          <dd data-testid="lab-cursor">{cursor == null ? "none" : cursor.toFixed(2)}</dd>
        </dl>
      </section>
      <section aria-label="Drill previews" className="grid grid-cols-1 gap-4 sm:grid-cols-2 lg:grid-cols-3">
        {Array.from({ length: 15 }, (_, i) => (
          <DrillPreview key={i} musicxml={drillXml} label={`Lab drill ${i + 1}`} />
        ))}
      </section>
    </div>
  );
}
