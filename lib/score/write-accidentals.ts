/**
 * `<accidental>` marks for one bar of one part, as engraving practice requires them: a note shows an
 * accidental when its alteration differs from what the key signature and the bar's earlier notes of
 * the same step and octave on the same staff imply (common practice; MusicXML 4.0 leaves this to the
 * writer: `<alter>` is the sound, `<accidental>` the sign). A note tied over from an earlier note
 * shows none, and later notes of its bar restate their sign. The first note of a step and octave after a barline, when the previous bar altered it
 * away from the key, gets a courtesy sign (`cautionary="yes"`).
 */
import type { KeySignature, Measure } from "./types";
import type { Piece } from "./write-pieces";

/** MusicXML accidental values by alteration in semitones. */
const SIGN: Record<number, string> = { [-2]: "flat-flat", [-1]: "flat", 0: "natural", 1: "sharp", 2: "double-sharp" };

const SHARP_ORDER = ["F", "C", "G", "D", "A", "E", "B"];

/**
 * Alteration the key signature gives a step (circle-of-fifths position → sharps or flats).
 * @example
 *   keyAlter({ fifths: 2, mode: "major" }, "C"); // 1 (D major: F♯ and C♯)
 */
export function keyAlter(key: KeySignature, step: string): number {
  const i = SHARP_ORDER.indexOf(step);
  if (key.fifths > 0) return i < key.fifths ? 1 : 0;
  if (key.fifths < 0) return 6 - i < -key.fifths ? -1 : 0;
  return 0;
}

/** What an accidental a note needs: the sign and whether it is a courtesy. */
export interface AccidentalMark {
  readonly value: string;
  readonly cautionary: boolean;
}

/** Alterations in force at the end of a bar, per staff and written step+octave. */
export type AccidentalState = Map<string, number>;

/**
 * The accidental of every piece of one bar that needs one. `carried` holds the alterations the
 * previous bar left different from its key (for courtesy signs); the returned state is this bar's.
 * @example
 *   const { marks, state } = barAccidentals(measure, pieces, new Map());
 *   marks.get(piece)?.value; // "sharp"
 */
export function barAccidentals(
  m: Measure, pieces: readonly Piece[], carried: AccidentalState,
): { marks: Map<Piece, AccidentalMark>; state: AccidentalState } {
  const marks = new Map<Piece, AccidentalMark>();
  const state: AccidentalState = new Map();
  const keyChanges = m.changes.filter((c) => c.key).sort((a, b) => a.offset.compare(b.offset));
  const keyAt = (piece: Piece): KeySignature => {
    let key = m.key;
    for (const c of keyChanges) if (c.offset.lte(piece.onset.sub(m.start))) key = c.key!;
    return key;
  };
  const ordered = [...pieces]
    .filter((p) => p.event.pitch)
    .sort((a, b) => a.onset.compare(b.onset) || Number(!a.duration.equals(0)) - Number(!b.duration.equals(0)) || a.order - b.order);
  for (const p of ordered) {
    const pitch = p.event.pitch!;
    const octave = writtenOctave(p);
    const slot = `${p.event.staff}|${pitch.step}${octave}`;
    const fromKey = keyAlter(keyAt(p), pitch.step);
    const inForce = state.get(slot) ?? fromKey;
    if (p.tieStop) {
      // A tied-over note shows no sign, and the sign it carries over the barline does not hold for
      // later notes of the bar: they show their own (common practice; from memory: Gould, Behind Bars).
      continue;
    }
    const sign = SIGN[pitch.alter];
    if (pitch.alter !== inForce && sign) marks.set(p, { value: sign, cautionary: false });
    else if (!state.has(slot) && sign && carried.has(slot) && carried.get(slot) !== pitch.alter) {
      marks.set(p, { value: sign, cautionary: true });
    }
    state.set(slot, pitch.alter);
  }
  const left: AccidentalState = new Map();
  for (const [slot, alter] of state) {
    const step = slot.slice(slot.indexOf("|") + 1, slot.indexOf("|") + 2);
    if (alter !== keyAlter(m.changes.filter((c) => c.key).at(-1)?.key ?? m.key, step)) left.set(slot, alter);
  }
  return { marks, state: left };
}

/** The octave the writer writes for a piece (the sounding one; see write-notes). */
function writtenOctave(p: Piece): number {
  const pitch = p.event.pitch!;
  const base = { C: 0, D: 2, E: 4, F: 5, G: 7, A: 9, B: 11 }[pitch.step];
  const written = (pitch.octave + 1) * 12 + base + pitch.alter;
  const diff = pitch.midi - written;
  return diff !== 0 && diff % 12 === 0 ? pitch.octave + diff / 12 : pitch.octave;
}
