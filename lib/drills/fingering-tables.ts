/**
 * Standard scale, arpeggio and five-finger fingerings, one octave, both hands, major and minor.
 *
 * Source: common practice — the fingerings printed alike in the usual scale-and-arpeggio manuals and
 * piano methods (from memory; no single book is quoted). Only entries whose fingering is the same in
 * all of them are listed (e.g. the flat-key scales, whose starting finger differs between books, are
 * left out). Minor scales are harmonic minor. Arpeggios are root position, one octave. This short table
 * checks the estimator on its own; the full scale table of all 24 keys, both hands, one or two octaves,
 * is scale-fingerings.ts.
 */
import type { Hand } from "../score/types";

export interface StandardFingering {
  readonly name: string;
  readonly hand: Hand;
  readonly kind: "scale" | "arpeggio" | "five-finger";
  /** Note names in playing order (MusicXML octave numbers). */
  readonly notes: readonly string[];
  readonly fingers: readonly number[];
}

const RH_SCALE = [1, 2, 3, 1, 2, 3, 4, 5];
const LH_SCALE = [5, 4, 3, 2, 1, 3, 2, 1];

const up = (tonic: string, hand: Hand, kind: StandardFingering["kind"], name: string, notes: string[], fingers: number[]): StandardFingering =>
  ({ name: `${tonic} ${name}, ${hand} hand`, hand, kind, notes, fingers });

const rh = (names: string): string[] => names.split(" ");

/**
 * The table: 28 entries (scales ascending and descending, arpeggios, five-finger positions).
 *
 * @example
 * STANDARD_FINGERINGS.find((f) => f.name === "C major scale, right hand")?.fingers // [1,2,3,1,2,3,4,5]
 */
export const STANDARD_FINGERINGS: readonly StandardFingering[] = [
  // Sharp-key majors: RH 1-2-3-1-2-3-4-5, LH 5-4-3-2-1-3-2-1 (B major LH is 4-3-2-1-4-3-2-1).
  up("C", "right", "scale", "major scale", rh("C4 D4 E4 F4 G4 A4 B4 C5"), RH_SCALE),
  up("G", "right", "scale", "major scale", rh("G4 A4 B4 C5 D5 E5 F#5 G5"), RH_SCALE),
  up("D", "right", "scale", "major scale", rh("D4 E4 F#4 G4 A4 B4 C#5 D5"), RH_SCALE),
  up("A", "right", "scale", "major scale", rh("A4 B4 C#5 D5 E5 F#5 G#5 A5"), RH_SCALE),
  up("E", "right", "scale", "major scale", rh("E4 F#4 G#4 A4 B4 C#5 D#5 E5"), RH_SCALE),
  up("B", "right", "scale", "major scale", rh("B3 C#4 D#4 E4 F#4 G#4 A#4 B4"), RH_SCALE),
  up("C", "left", "scale", "major scale", rh("C3 D3 E3 F3 G3 A3 B3 C4"), LH_SCALE),
  up("G", "left", "scale", "major scale", rh("G2 A2 B2 C3 D3 E3 F#3 G3"), LH_SCALE),
  up("D", "left", "scale", "major scale", rh("D3 E3 F#3 G3 A3 B3 C#4 D4"), LH_SCALE),
  up("A", "left", "scale", "major scale", rh("A2 B2 C#3 D3 E3 F#3 G#3 A3"), LH_SCALE),
  up("E", "left", "scale", "major scale", rh("E3 F#3 G#3 A3 B3 C#4 D#4 E4"), LH_SCALE),
  up("B", "left", "scale", "major scale", rh("B2 C#3 D#3 E3 F#3 G#3 A#3 B3"), [4, 3, 2, 1, 4, 3, 2, 1]),
  // F major: RH 1-2-3-4-1-2-3-4, LH as C.
  up("F", "right", "scale", "major scale", rh("F4 G4 A4 Bb4 C5 D5 E5 F5"), [1, 2, 3, 4, 1, 2, 3, 4]),
  up("F", "left", "scale", "major scale", rh("F3 G3 A3 Bb3 C4 D4 E4 F4"), LH_SCALE),
  // Harmonic minors fingered like their tonic majors.
  up("A", "right", "scale", "harmonic minor scale", rh("A4 B4 C5 D5 E5 F5 G#5 A5"), RH_SCALE),
  up("A", "left", "scale", "harmonic minor scale", rh("A2 B2 C3 D3 E3 F3 G#3 A3"), LH_SCALE),
  up("E", "right", "scale", "harmonic minor scale", rh("E4 F#4 G4 A4 B4 C5 D#5 E5"), RH_SCALE),
  up("E", "left", "scale", "harmonic minor scale", rh("E3 F#3 G3 A3 B3 C4 D#4 E4"), LH_SCALE),
  up("D", "right", "scale", "harmonic minor scale", rh("D4 E4 F4 G4 A4 Bb4 C#5 D5"), RH_SCALE),
  up("D", "left", "scale", "harmonic minor scale", rh("D3 E3 F3 G3 A3 Bb3 C#4 D4"), LH_SCALE),
  // Descending: the ascending fingering reversed.
  up("C", "right", "scale", "major scale descending", rh("C5 B4 A4 G4 F4 E4 D4 C4"), [...RH_SCALE].reverse()),
  up("C", "left", "scale", "major scale descending", rh("C4 B3 A3 G3 F3 E3 D3 C3"), [...LH_SCALE].reverse()),
  // Root-position arpeggios on white-key triads: RH 1-2-3-5, LH 5-4-2-1.
  up("C", "right", "arpeggio", "major arpeggio", rh("C4 E4 G4 C5"), [1, 2, 3, 5]),
  up("G", "right", "arpeggio", "major arpeggio", rh("G4 B4 D5 G5"), [1, 2, 3, 5]),
  up("A", "right", "arpeggio", "minor arpeggio", rh("A4 C5 E5 A5"), [1, 2, 3, 5]),
  up("C", "left", "arpeggio", "major arpeggio", rh("C3 E3 G3 C4"), [5, 4, 2, 1]),
  // Five-finger positions.
  up("C", "right", "five-finger", "five-finger position", rh("C4 D4 E4 F4 G4"), [1, 2, 3, 4, 5]),
  up("C", "left", "five-finger", "five-finger position", rh("C3 D3 E3 F3 G3"), [5, 4, 3, 2, 1]),
];
