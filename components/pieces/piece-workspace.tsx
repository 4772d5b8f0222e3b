"use client";
import dynamic from "next/dynamic";
import { useMemo, useState } from "react";
import type { BarSelection } from "@/components/score/bar-selection";
import { KnotForm, type KnotDraft } from "@/components/knots/knot-form";
import type { ActionResult } from "@/lib/action-result";
import { CAUTION } from "@/lib/caution";
import { HardestBars } from "./hardest-bars";
import type { PieceWorkspaceData } from "./piece-workspace-types";

const ScoreView = dynamic(() => import("@/components/score/score-view").then((m) => m.ScoreView), {
  ssr: false,
  loading: () => <div className="min-h-[60vh] animate-pulse rounded-md border border-line bg-card" data-testid="score-loading" />,
});
const Player = dynamic(() => import("@/components/score/player").then((m) => m.Player), {
  ssr: false,
  loading: () => <div className="h-14 animate-pulse rounded-xl bg-card" />,
});

const HAND_WORDS = { right: "right hand", left: "left hand", both: "both hands" } as const;

/** The piece page's interactive part: engraved score with bar selection, difficulty overlay, playback and knot form. */
export function PieceWorkspace({
  title,
  data,
  tags,
  saveKnot,
}: {
  title: string;
  data: PieceWorkspaceData;
  tags: readonly string[];
  saveKnot(input: KnotDraft & { tags: string[]; note?: string }): Promise<ActionResult<{ id: string }>>;
}) {
  const [selection, setSelection] = useState<BarSelection | null>(null);
  const [showHeat, setShowHeat] = useState(false);
  const [cursor, setCursor] = useState<number | null>(null);
  const [partId, setPartId] = useState(data.partId);
  const pianoChoices = data.parts.filter((p) => p.piano);
  const part = data.parts.find((p) => p.id === partId) ?? data.parts[0];
  // Only the chosen piano part's staves are hands: upper = right, lower = left; other parts are shown, greyed.
  const staffHands = useMemo(() => {
    const total = data.parts.reduce((n, p) => n + p.staves, 0);
    const hands: ("right" | "left" | null)[] = Array.from({ length: total }, () => null);
    if (part) {
      hands[part.firstStaff] = "right";
      if (part.staves >= 2) hands[part.firstStaff + 1] = "left";
    }
    return hands;
  }, [data.parts, part]);

  const describe = (s: KnotDraft) => {
    const a = data.bars[s.from]?.number ?? String(s.from + 1);
    const b = data.bars[s.to]?.number ?? String(s.to + 1);
    return `${a === b ? `bar ${a}` : `bars ${a}–${b}`}, ${HAND_WORDS[s.hand]}`;
  };

  const play = useMemo(() => {
    const from = selection ? data.bars[selection.from] : data.bars[0];
    const to = selection ? data.bars[selection.to] : data.bars[data.bars.length - 1];
    const hand = selection?.hand;
    const events = data.playback.events.filter((e) => {
      const h = staffHands[e.staff - 1];
      return !hand || (h != null && (hand === "both" || h === hand));
    });
    return { startQ: from?.startQ ?? 0, endQ: to?.endQ, events };
  }, [selection, data, staffHands]);

  const barMarks = useMemo(() => data.bars.map((b) => ({ number: b.printed, startQ: b.startQ })), [data.bars]);

  return (
    <div className="grid gap-6 xl:grid-cols-[minmax(0,1fr)_20rem]">
      <div className="flex min-w-0 flex-col gap-3">
        <div className="flex flex-wrap items-center gap-4">
          <label className="flex items-center gap-2 text-sm font-bold text-walnut">
            <input type="checkbox" checked={showHeat} onChange={(e) => setShowHeat(e.target.checked)} className="size-4 accent-walnut" />
            Show difficulty
          </label>
          <span className="text-xs text-muted">A quiet overlay: darker bars are harder for the hand, from the fingering model.</span>
        </div>
        <Player
          key={selection ? `${selection.from}-${selection.to}-${selection.hand}` : "all"}
          events={play.events}
          beatsPerBar={data.playback.beatsPerBar}
          beatUnitQ={data.playback.beatUnitQ}
          initialBpm={data.playback.bpm}
          startQ={play.startQ}
          endQ={play.endQ}
          barAnchorQ={selection ? play.startQ : data.playback.barAnchorQ}
          bars={barMarks}
          onCursor={setCursor}
          label={selection ? `Play ${describe(selection)}` : `Play ${title}`}
        />
        {pianoChoices.length > 1 ? (
          <label className="flex items-center gap-2 text-sm font-bold text-walnut">
            Piano part
            <select
              value={partId}
              onChange={(e) => {
                setPartId(e.target.value);
                setSelection(null);
              }}
              className="rounded-md border border-line bg-card px-2 py-1 font-normal text-ink"
              data-testid="piano-part"
            >
              {pianoChoices.map((p) => (
                <option key={p.id} value={p.id}>{p.name || p.id}</option>
              ))}
            </select>
          </label>
        ) : null}
        <ScoreView
          musicxml={data.musicxml}
          staffHands={staffHands}
          selection={selection}
          onSelectionChange={setSelection}
          onConfirm={setSelection}
          heat={showHeat ? data.heat : null}
          cursorTime={cursor}
          label={title}
        />
      </div>
      <aside className="flex flex-col gap-6" aria-label="Knot and difficulty">
        <section aria-labelledby="mark-knot-title" className="rounded-2xl border border-line bg-card p-5">
          <h2 id="mark-knot-title" className="mb-3 text-lg font-semibold">Mark a knot</h2>
          <KnotForm selection={selection} describe={describe} tags={tags} save={(input) => saveKnot({ ...input, part: partId })} />
          <p className="mt-4 border-t border-line pt-3 text-xs text-muted">
            {CAUTION.text}
          </p>
        </section>
        {showHeat ? (
          <HardestBars
            bars={data.hardest}
            onPick={(h) => {
              setSelection({ from: h.measure, to: h.measure, hand: h.hand });
            }}
          />
        ) : null}
      </aside>
      {selection ? (
        <div className="sticky bottom-3 z-10 flex items-center justify-between gap-3 rounded-full border border-line bg-card/95 px-4 py-2 shadow-md xl:hidden">
          <span className="text-sm"><span className="font-bold">Selected:</span> {describe(selection)}</span>
          <a href="#mark-knot-title" className="shrink-0 rounded-full bg-walnut px-3 py-1 text-sm font-bold text-paper">Mark knot</a>
        </div>
      ) : null}
    </div>
  );
}
