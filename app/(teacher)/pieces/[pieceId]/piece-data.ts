import { difficultyMap, hardestBars } from "@/lib/drills";
import { playbackEvents } from "@/lib/playback";
import { readScore } from "@/lib/score";
import type { PieceWorkspaceData } from "@/components/pieces/piece-workspace-types";

/** Printed bar number of a measure as an integer (the number a knot stores); index + 1 when not numeric. */
export function printedBar(number: string, index: number): number {
  const n = Number.parseInt(number, 10);
  return Number.isFinite(n) ? n : index + 1;
}

/** Everything the piece page's client part needs, computed on the server from the cleaned copy. */
export function pieceWorkspaceData(musicxml: string): PieceWorkspaceData {
  const { score } = readScore(musicxml);
  const playback = playbackEvents(score);
  const heat = difficultyMap(score);
  return {
    musicxml,
    partId: score.parts[0]?.id ?? "P1",
    staves: score.parts[0]?.staves ?? 1,
    bars: score.measures.map((m) => ({
      number: m.number,
      printed: printedBar(m.number, m.index),
      startQ: m.start.valueOf(),
      endQ: m.start.add(m.length).valueOf(),
    })),
    heat,
    hardest: hardestBars(score, 6).map((h) => ({ measure: h.measure, number: h.number, hand: h.hand, score: h.score, reasons: h.reasons })),
    playback: { bpm: playback.initialBpm, beatsPerBar: playback.beatsPerBar, beatUnitQ: playback.beatUnitQ, barAnchorQ: playback.barAnchorQ, events: playback.events },
  };
}
