/** The piece page's data, computed on the server from the stored cleaned copy. */
export interface PieceWorkspaceData {
  musicxml: string;
  partId: string;
  staves: number;
  /** One entry per measure index: printed number, the integer a knot stores, start/end in quarter notes. */
  bars: { number: string; printed: number; startQ: number; endQ: number }[];
  heat: { right: number[]; left: number[] };
  hardest: { measure: number; number: string; hand: "right" | "left"; score: number; reasons: string[] }[];
  playback: {
    bpm: number;
    beatsPerBar: number;
    beatUnitQ: number;
    barAnchorQ: number;
    events: { midi: number; onsetQ: number; durationQ: number; velocity: number; staff: number }[];
  };
}
