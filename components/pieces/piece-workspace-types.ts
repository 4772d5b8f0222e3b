/** The piece page's data, computed on the server from the stored cleaned copy. */
export interface PieceWorkspaceData {
  musicxml: string;
  /** The piano part (found by staves and name) that knots use unless the teacher picks another. */
  partId: string;
  staves: number;
  /** Every part in engraving order: its first engraved staff (0-based), staves, and whether it may be the piano. */
  parts: { id: string; name: string; staves: number; firstStaff: number; piano: boolean }[];
  /** One entry per measure index: printed number, the integer a knot stores, start/end in quarter notes. */
  bars: { number: string; printed: number; startQ: number; endQ: number }[];
  heat: { right: number[]; left: number[] };
  hardest: { measure: number; number: string; hand: "right" | "left"; score: number; reasons: string[] }[];
  playback: {
    bpm: number;
    beatsPerBar: number;
    beatUnitQ: number;
    barAnchorQ: number;
    /** `staff` is the engraved staff counted across all parts, 1-based. */
    events: { midi: number; onsetQ: number; durationQ: number; velocity: number; staff: number }[];
  };
}
