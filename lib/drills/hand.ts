/**
 * Keyboard geometry and the student's hand: where every key sits, how far apart two notes are,
 * and whether a stretch fits a hand profile.
 *
 * Key model (FACTS.md §1): white keys are evenly spaced at octave / 7 (23.59 mm on the standard
 * 165.1 mm octave, Steingraeber's "6.5 inches = 165.1 mm"); each black key is centred halfway
 * between its two white neighbours ("black keys between", as in the issue; the real black keys of
 * a grand sit slightly off-centre, which this model ignores — the error is under 2 mm).
 */
import type { HandProfile, SpanReport } from "./types";

/** Standard octave width in mm: 6.5 in (FACTS.md §1, Steingraeber). */
export const STANDARD_OCTAVE_MM = 165.1;

/** Millimetres per inch. */
export const MM_PER_INCH = 25.4;

/** A keyboard size a teacher can pick in the hand-profile form. */
export interface OctaveWidth {
  readonly id: string;
  readonly label: string;
  readonly inches: number;
  readonly mm: number;
}

/**
 * Keyboard octave widths: the standard 6.5 in and the reduced DS sizes 6.0, 5.5 and 5.1 in
 * (FACTS.md §1: Steingraeber; PASK "How many sizes?"). Millimetres are inches × 25.4.
 *
 * @example
 * OCTAVE_WIDTHS[0].mm // 165.1
 */
export const OCTAVE_WIDTHS: readonly OctaveWidth[] = [
  { id: "standard", label: "Standard keyboard (6.5 in octave)", inches: 6.5, mm: 165.1 },
  { id: "ds6.0", label: "Narrow keyboard DS 6.0 (15/16 size)", inches: 6.0, mm: 152.4 },
  { id: "ds5.5", label: "Narrow keyboard DS 5.5 (7/8 size)", inches: 5.5, mm: 139.7 },
  { id: "ds5.1", label: "Narrow keyboard DS 5.1", inches: 5.1, mm: 129.54 },
];

/**
 * Allowance between the comfortable and the practical stretch, in mm: one standard white-key
 * pitch (165.1 / 7 ≈ 23.6 mm, FACTS.md §1), i.e. "one key further than comfortable".
 * Calibration (FACTS.md §4): PASK's benchmark is that a 1–5 span of 8.5 in (215.9 mm, measured flat,
 * tip to tip, at full stretch) is needed to play a tenth, and the tenth C–E measures 212.3 mm centre to
 * centre — so the measured full span is taken as the practical centre-to-centre reach, and the
 * comfortable span is one white key less.
 */
export const PRACTICAL_ALLOWANCE_MM = STANDARD_OCTAVE_MM / 7;

/** Step index of the white keys C D E F G A B within an octave. */
const WHITE_INDEX = [0, 0.5, 1, 1.5, 2, 3, 3.5, 4, 4.5, 5, 5.5, 6] as const;

/**
 * True when the MIDI note is a black key.
 *
 * @example
 * isBlackKey(61) // true (C♯4)
 */
export function isBlackKey(midi: number): boolean {
  return !Number.isInteger(WHITE_INDEX[((midi % 12) + 12) % 12]!);
}

/**
 * Position of a key's centre along the keyboard in white-key steps from MIDI 0 (C−1).
 * Black keys sit halfway between their white neighbours.
 *
 * @example
 * keyPosition(60) // 35 (C4 is the 35th white step above C−1)
 */
export function keyPosition(midi: number): number {
  const octave = Math.floor(midi / 12);
  return octave * 7 + WHITE_INDEX[midi - octave * 12]!;
}

/**
 * Centre-to-centre distance of two keys in millimetres.
 *
 * @example
 * keyDistanceMm(60, 76) // 212.3 (a tenth, C4–E5)
 * keyDistanceMm(60, 72) // 165.1 (an octave)
 */
export function keyDistanceMm(midiA: number, midiB: number, octaveMm = STANDARD_OCTAVE_MM): number {
  return (Math.abs(keyPosition(midiB) - keyPosition(midiA)) * octaveMm) / 7;
}

/**
 * A hand profile from a 1–5 span measured in inches (flat hand, full stretch, tip to tip — the
 * protocol of the hand-span studies in FACTS.md §4). The stored `spanMm` is the comfortable span:
 * the measured span less `PRACTICAL_ALLOWANCE_MM`.
 *
 * @example
 * profileFromInches(8.5).spanMm // 215.9 − 23.59 ≈ 192.3
 */
export function profileFromInches(inches: number, octaveMm = STANDARD_OCTAVE_MM): HandProfile {
  return { spanMm: inches * MM_PER_INCH - PRACTICAL_ALLOWANCE_MM, octaveMm };
}

/**
 * The measured full 1–5 span (inches) a profile stands for: the inverse of `profileFromInches`.
 *
 * @example
 * profileInches(profileFromInches(7.9)) // 7.9
 */
export function profileInches(profile: HandProfile): number {
  return (profile.spanMm + PRACTICAL_ALLOWANCE_MM) / MM_PER_INCH;
}

/**
 * Default profile: a conservative hand. FACTS.md §4 gives the female adult pianists' mean 1–5
 * span as 7.9 in (200.7 mm; Boyle, Boyle & Booker 2015) and says about 87% of adult women are below
 * the 8.5-in tenth benchmark. Taking the female mean — below most men and half of women — means the
 * default hand reaches a ninth at full stretch (188.7 mm ≤ 200.7) but not a tenth (212.3 mm), and
 * an octave (165.1 mm) is comfortable (≤ 177.1 mm).
 *
 * @example
 * DEFAULT_PROFILE.octaveMm // 165.1
 */
export const DEFAULT_PROFILE: HandProfile = profileFromInches(7.9);

/** Comfortable and practical limits (mm) of a profile; `pairScale` shrinks them for inner finger pairs. */
export function spanLimits(profile: HandProfile, pairScale = 1): { comfortable: number; practical: number } {
  return {
    comfortable: profile.spanMm * pairScale,
    practical: (profile.spanMm + PRACTICAL_ALLOWANCE_MM) * pairScale,
  };
}

/**
 * Share of the full 1–5 reach that a finger pair has: the pair's MaxPrac over the 1–5 MaxPrac
 * (15 semitones) in the Parncutt et al. 1997 span table (FACTS.md §5).
 */
const PAIR_REACH: Readonly<Record<string, number>> = {
  "1-2": 10 / 15, "1-3": 12 / 15, "1-4": 14 / 15, "1-5": 1,
  "2-3": 5 / 15, "2-4": 7 / 15, "2-5": 10 / 15,
  "3-4": 4 / 15, "3-5": 7 / 15, "4-5": 5 / 15,
};

/**
 * Share of the 1–5 reach available to two fingers (1 when unknown or the same finger).
 *
 * @example
 * pairReach(1, 5) // 1
 * pairReach(2, 3) // 1/3
 */
export function pairReach(a: number | null | undefined, b: number | null | undefined): number {
  if (a == null || b == null || a === b) return 1;
  const lo = Math.min(a, b);
  const hi = Math.max(a, b);
  return PAIR_REACH[`${lo}-${hi}`] ?? 1;
}

type SpanNote = { readonly midi: number } | { readonly pitch: { readonly midi: number } | null };

function midiOf(note: SpanNote): number | null {
  if ("midi" in note) return note.midi;
  return note.pitch ? note.pitch.midi : null;
}

/**
 * The stretch of notes held in one hand position, lowest to highest, against a profile.
 * When a fingering is given and both outer notes have a finger, the limits shrink to that finger
 * pair's share of the 1–5 reach (e.g. 2–3 reach a third of what 1–5 reach).
 *
 * @example
 * spanOf([{ midi: 60 }, { midi: 76 }], null, profileFromInches(8.5)).overPractical // false
 */
export function spanOf(
  notes: readonly SpanNote[],
  fingering: readonly (number | null)[] | null,
  profile: HandProfile,
): SpanReport {
  let lo = -1;
  let hi = -1;
  notes.forEach((note, i) => {
    const midi = midiOf(note);
    if (midi === null) return;
    if (lo < 0 || midi < midiOf(notes[lo]!)!) lo = i;
    if (hi < 0 || midi > midiOf(notes[hi]!)!) hi = i;
  });
  if (lo < 0) return { semitones: 0, mm: 0, overComfortable: false, overPractical: false };
  const low = midiOf(notes[lo]!)!;
  const high = midiOf(notes[hi]!)!;
  const mm = keyDistanceMm(low, high, profile.octaveMm);
  const scale = fingering ? pairReach(fingering[lo], fingering[hi]) : 1;
  const limits = spanLimits(profile, scale);
  const eps = 1e-9;
  return {
    semitones: high - low,
    mm: Math.round(mm * 10) / 10,
    overComfortable: mm > limits.comfortable + eps,
    overPractical: mm > limits.practical + eps,
  };
}
