/**
 * Pitch arithmetic for MusicXML spelled pitches: octave 4 starts at middle C (MIDI 60).
 */
import type { Pitch } from "./types";

/** Semitones above C for each step letter. */
export const STEP_SEMITONES: Readonly<Record<Pitch["step"], number>> = {
  C: 0, D: 2, E: 4, F: 5, G: 7, A: 9, B: 11,
};

const STEPS = new Set(Object.keys(STEP_SEMITONES));

/**
 * True when `s` is one of the seven MusicXML step letters.
 *
 * @example
 * isStep("F"); // true
 */
export function isStep(s: string): s is Pitch["step"] {
  return STEPS.has(s);
}

/**
 * MIDI number of a written pitch: (octave + 1) · 12 + step + alter, plus any sounding shift.
 *
 * @example
 * midiOf("C", 0, 4); // 60
 * midiOf("A", 0, 0); // 21
 */
export function midiOf(step: Pitch["step"], alter: number, octave: number, shift = 0): number {
  return (octave + 1) * 12 + STEP_SEMITONES[step] + Math.round(alter) + shift;
}

/**
 * Build a `Pitch`; `shift` is a sounding offset in semitones (a transposing part's `<transpose>`).
 *
 * @example
 * makePitch("C", 0, 4, -2).midi; // 58 — a B♭ instrument's written C
 */
export function makePitch(step: Pitch["step"], alter: number, octave: number, shift = 0): Pitch {
  return { step, alter, octave, midi: midiOf(step, alter, octave, shift) };
}

/**
 * Display offset of an `<octave-shift>` line: `type="down"` (an 8va line, notes drawn lower than
 * their pitch data) is +12. The reader does not apply it: MusicXML's `<pitch>` is already the true pitch;
 * a writer uses it to draw notes under a line. Size 8 = one octave, 15 = two, 22 = three.
 *
 * @example
 * octaveShiftSemitones("down", 8); // 12
 * octaveShiftSemitones("up", 15); // -24
 */
export function octaveShiftSemitones(type: string, size: number): number {
  const octaves = Math.max(1, Math.round((size - 1) / 7));
  if (type === "down") return 12 * octaves;
  if (type === "up") return -12 * octaves;
  return 0;
}

/**
 * A readable name such as "C#4" or "Bb3" for messages and drill titles.
 *
 * @example
 * pitchName({ step: "B", alter: -1, octave: 3, midi: 58 }); // "Bb3"
 */
export function pitchName(p: Pitch): string {
  const acc = p.alter > 0 ? "#".repeat(p.alter) : "b".repeat(-p.alter);
  return `${p.step}${acc}${p.octave}`;
}
