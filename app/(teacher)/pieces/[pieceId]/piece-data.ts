import { difficultyMap, hardestBars } from "@/lib/drills";
import { playbackEvents } from "@/lib/playback";
import { pianoCandidates, pianoPart, readScore, toPerformance } from "@/lib/score";
import type { Score } from "@/lib/score";
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
  const piano = pianoPart(score) ?? score.parts[0];
  const parts = engravedParts(score);
  const firstStaff = new Map(parts.map((p) => [p.id, p.firstStaff]));
  // Notes to play with the engraved staff they sit on (counted across parts), so a hand plays only its piano staff.
  const events = toPerformance(score).notes.map((n) => ({
    midi: n.midi, onsetQ: n.startQuarters, durationQ: n.quarters, velocity: n.velocity, staff: (firstStaff.get(n.part) ?? 0) + n.staff,
  }));
  return {
    musicxml,
    partId: piano?.id ?? "P1",
    staves: piano?.staves ?? 1,
    parts,
    bars: score.measures.map((m) => ({
      number: m.number,
      printed: printedBar(m.number, m.index),
      startQ: m.start.valueOf(),
      endQ: m.start.add(m.length).valueOf(),
    })),
    heat,
    hardest: hardestBars(score, 6).map((h) => ({ measure: h.measure, number: h.number, hand: h.hand, score: h.score, reasons: h.reasons })),
    playback: { bpm: playback.initialBpm, beatsPerBar: playback.beatsPerBar, beatUnitQ: playback.beatUnitQ, barAnchorQ: playback.barAnchorQ, events },
  };
}

/** The parts in engraving order with their first engraved staff and whether each could be the piano. */
export function engravedParts(score: Score): PieceWorkspaceData["parts"] {
  const candidates = new Set(pianoCandidates(score).map((c) => c.part.id));
  const only = score.parts.length === 1;
  let staff = 0;
  return score.parts.map((p) => {
    const entry = { id: p.id, name: p.name, staves: p.staves, firstStaff: staff, piano: only || candidates.has(p.id) };
    staff += p.staves;
    return entry;
  });
}

/** The part a knot is marked on: the teacher's pick when it may be the piano, otherwise the piano part. */
export function knotPart(score: Score, requested: string | undefined): string | null {
  const parts = engravedParts(score);
  if (requested !== undefined) return parts.find((p) => p.id === requested && p.piano)?.id ?? null;
  return (pianoPart(score) ?? score.parts[0])?.id ?? null;
}
