/**
 * Standard scale fingerings for all 24 major and minor keys (harmonic, melodic and natural minor),
 * both hands, one or two octaves, as the scale books print them.
 *
 * Source: common practice — the fingerings printed alike in the usual scale manuals (the "thumb on the
 * white keys, groups of three and four fingers" system of the 19th- and 20th-century scale books).
 * Every row below is written FROM MEMORY; no single book is quoted. Rows marked `derived` (melodic-minor
 * forms whose notes differ from the harmonic form) apply the books' own rule — thumb only on white keys,
 * the harmonic form's grouping kept where it fits — and are from memory of that rule, not of a page.
 *
 * A row stores the one-octave ascending fingering (8 fingers, tonic to tonic). Longer scales repeat the
 * seven-note pattern: the right hand ends on its top finger (5 where the pattern has the thumb) and takes
 * its starting finger on inner tonics (unless the row names another); the left hand starts on its bottom
 * finger (5 where the pattern has the thumb) and takes its top finger on inner tonics. Descending uses the same fingers
 * in reverse, except melodic minor, which comes down as natural minor with its own row.
 * Enharmonic keys share a row (F♯/G♭, C♯/D♭, B/C♭, D♯/E♭ minor, A♯/B♭ minor, G♯/A♭ minor): the
 * black-and-white pattern of the keys is the same.
 */
import { Note, Scale } from "tonal";
import type { Hand } from "../score/types";

export type ScaleForm = "major" | "harmonic minor" | "melodic minor" | "natural minor";

/** One scale-book row: one octave ascending, tonic to tonic, both hands. */
export interface ScaleRow {
  /** Tonic as the row is usually printed (enharmonic twins share the row). */
  readonly tonic: string;
  readonly form: "major" | "harmonic minor" | "melodic minor";
  readonly right: readonly number[];
  readonly left: readonly number[];
  /** Melodic minor only: the descending (natural minor) fingering, written ascending. */
  readonly rightDown?: readonly number[];
  readonly leftDown?: readonly number[];
  /** Right hand: the finger on an inner tonic when it is not the starting finger (B♭ minor starts on 2, passes the tonic with 4). */
  readonly rightTonic?: number;
  /** Where the row comes from. */
  readonly source: "common practice, from memory" | "derived (thumb on white keys), from memory";
}

const f = (s: string): number[] => [...s].map(Number);
const MEMORY = "common practice, from memory" as const;
const DERIVED = "derived (thumb on white keys), from memory" as const;
const RH_C = f("12312345");
const LH_C = f("54321321");

/**
 * The table: 12 majors, 12 harmonic minors, 12 melodic minors (with their natural-minor descent).
 *
 * @example
 * SCALE_ROWS.find((r) => r.tonic === "Eb" && r.form === "major")?.right // [3, 1, 2, 3, 4, 1, 2, 3]
 */
export const SCALE_ROWS: readonly ScaleRow[] = [
  // Majors. White-key tonics C–B: RH 123 1234 5; LH 54321 321 (B major LH 4321 4321).
  { tonic: "C", form: "major", right: RH_C, left: LH_C, source: MEMORY },
  { tonic: "G", form: "major", right: RH_C, left: LH_C, source: MEMORY },
  { tonic: "D", form: "major", right: RH_C, left: LH_C, source: MEMORY },
  { tonic: "A", form: "major", right: RH_C, left: LH_C, source: MEMORY },
  { tonic: "E", form: "major", right: RH_C, left: LH_C, source: MEMORY },
  { tonic: "B", form: "major", right: RH_C, left: f("43214321"), source: MEMORY },
  // Black-key majors: thumbs on the white keys.
  { tonic: "F#", form: "major", right: f("23412312"), left: f("43213214"), source: MEMORY },
  { tonic: "Db", form: "major", right: f("23123412"), left: f("32143213"), source: MEMORY },
  { tonic: "Ab", form: "major", right: f("34123123"), left: f("32143213"), source: MEMORY },
  { tonic: "Eb", form: "major", right: f("31234123"), left: f("32143213"), source: MEMORY },
  { tonic: "Bb", form: "major", right: f("41231234"), left: f("32143213"), source: MEMORY },
  { tonic: "F", form: "major", right: f("12341234"), left: LH_C, source: MEMORY },
  // Harmonic minors.
  { tonic: "A", form: "harmonic minor", right: RH_C, left: LH_C, source: MEMORY },
  { tonic: "E", form: "harmonic minor", right: RH_C, left: LH_C, source: MEMORY },
  { tonic: "B", form: "harmonic minor", right: RH_C, left: f("43214321"), source: MEMORY },
  { tonic: "F#", form: "harmonic minor", right: f("34123123"), left: f("43213214"), source: MEMORY },
  { tonic: "C#", form: "harmonic minor", right: f("34123123"), left: f("32143213"), source: MEMORY },
  { tonic: "G#", form: "harmonic minor", right: f("34123123"), left: f("32143213"), source: MEMORY },
  { tonic: "Eb", form: "harmonic minor", right: f("31234123"), left: f("21432132"), source: MEMORY },
  { tonic: "Bb", form: "harmonic minor", right: f("21231234"), rightTonic: 4, left: f("21321432"), source: MEMORY },
  { tonic: "F", form: "harmonic minor", right: f("12341234"), left: LH_C, source: MEMORY },
  { tonic: "C", form: "harmonic minor", right: RH_C, left: LH_C, source: MEMORY },
  { tonic: "G", form: "harmonic minor", right: RH_C, left: LH_C, source: MEMORY },
  { tonic: "D", form: "harmonic minor", right: RH_C, left: LH_C, source: MEMORY },
  // Melodic minors: up melodic, down natural.
  { tonic: "A", form: "melodic minor", right: RH_C, left: LH_C, source: MEMORY },
  { tonic: "E", form: "melodic minor", right: RH_C, left: LH_C, source: MEMORY },
  { tonic: "B", form: "melodic minor", right: RH_C, left: f("43214321"), source: MEMORY },
  { tonic: "F#", form: "melodic minor", right: f("23123412"), left: f("43213214"), rightDown: f("23412312"), source: DERIVED },
  { tonic: "C#", form: "melodic minor", right: f("23123412"), left: f("32143213"), source: DERIVED },
  { tonic: "G#", form: "melodic minor", right: f("34123123"), left: f("32143213"), rightDown: f("34123123"), leftDown: f("32132143"), source: DERIVED },
  { tonic: "Eb", form: "melodic minor", right: f("31234123"), left: f("21432132"), source: MEMORY },
  { tonic: "Bb", form: "melodic minor", right: f("21231234"), rightTonic: 4, left: f("21321432"), source: MEMORY },
  { tonic: "F", form: "melodic minor", right: f("12341234"), left: LH_C, source: MEMORY },
  { tonic: "C", form: "melodic minor", right: RH_C, left: LH_C, source: MEMORY },
  { tonic: "G", form: "melodic minor", right: RH_C, left: LH_C, source: MEMORY },
  { tonic: "D", form: "melodic minor", right: RH_C, left: LH_C, source: MEMORY },
];

/** Row lookup: form and pitch class of the tonic (so G♭ finds F♯, A♯ minor finds B♭ minor). */
function findRow(tonic: string, form: ScaleRow["form"]): ScaleRow | undefined {
  const chroma = Note.chroma(tonic);
  if (chroma === undefined || Number.isNaN(chroma)) return undefined;
  return SCALE_ROWS.find((r) => r.form === form && Note.chroma(r.tonic) === chroma);
}

/** `octaves` octaves ascending from one octave's fingering (see the opening comment). */
function extend(one: readonly number[], hand: Hand, octaves: number, rightTonic?: number): number[] {
  const inner = one.slice(1, 7);
  if (hand === "right") {
    // Inner tonics take the pattern's tonic finger; the top note keeps the row's top finger.
    const tonic = rightTonic ?? one[0]!;
    return [one[0]!, ...inner, ...Array.from({ length: octaves - 1 }, () => [tonic, ...inner]).flat(), one[7]!];
  }
  // Left hand: the bottom note keeps the row's first finger; later tonics take the top finger (one[7]).
  return [one[0]!, ...Array.from({ length: octaves }, () => [...inner, one[7]!]).flat()];
}

/** Standard fingering of a scale, ascending and descending, in playing order. */
export interface ScaleFingers {
  /** Fingers for the ascending notes, lowest first (7 × octaves + 1). */
  readonly up: readonly number[];
  /** Fingers for the descending notes, highest first (7 × octaves + 1). */
  readonly down: readonly number[];
  readonly source: ScaleRow["source"];
}

/**
 * The standard fingering of a scale for one hand, or null when the tonic is not a note name.
 * Natural minor uses the melodic minor's descending row both ways.
 *
 * @example
 * scaleFingers("Eb", "major", "right", 1)?.up // [3, 1, 2, 3, 4, 1, 2, 3]
 * scaleFingers("C", "major", "left", 2)?.up   // [5, 4, 3, 2, 1, 3, 2, 1, 4, 3, 2, 1, 3, 2, 1]
 */
export function scaleFingers(tonic: string, form: ScaleForm, hand: Hand, octaves: number = 2): ScaleFingers | null {
  const row = findRow(tonic, form === "natural minor" ? "melodic minor" : form);
  if (!row || octaves < 1) return null;
  const upOne = form === "natural minor" ? (hand === "right" ? row.rightDown ?? row.right : row.leftDown ?? row.left) : hand === "right" ? row.right : row.left;
  const downOne = hand === "right" ? row.rightDown ?? upOne : row.leftDown ?? upOne;
  const down = form === "natural minor" ? upOne : downOne;
  return { up: extend(upOne, hand, octaves, row.rightTonic), down: extend(down, hand, octaves, row.rightTonic).reverse(), source: row.source };
}

/** tonal's scale name for a form. */
function tonalName(tonic: string, form: ScaleForm): string {
  return `${tonic} ${form === "natural minor" ? "minor" : form}`;
}

/**
 * A scale up and back down with its standard fingering: note names as tonal spells them (melodic minor
 * comes down as natural minor), fingers beside them. Null for an unknown tonic.
 *
 * @example
 * fingeredScale("C", "major", "right", 1, 4)?.notes.slice(0, 3) // ["C4", "D4", "E4"]
 */
export function fingeredScale(tonic: string, form: ScaleForm, hand: Hand, octaves: number, startOctave: number): { notes: string[]; fingers: number[] } | null {
  const fingers = scaleFingers(tonic, form, hand, octaves);
  if (!fingers) return null;
  const from = `${tonic}${startOctave}`;
  const to = `${tonic}${startOctave + octaves}`;
  const up = Scale.rangeOf(tonalName(tonic, form))(from, to) as string[];
  const downForm: ScaleForm = form === "melodic minor" ? "natural minor" : form;
  const down = Scale.rangeOf(tonalName(tonic, downForm))(to, from) as string[];
  if (up.length !== fingers.up.length || down.length !== fingers.down.length) return null;
  return { notes: [...up, ...down.slice(1)], fingers: [...fingers.up, ...fingers.down.slice(1)] };
}
