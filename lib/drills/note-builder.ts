/**
 * Small hand-built notes for tests, benchmarks and demo drills: note names such as "C4", "F#3", "Bb5"
 * turned into `NoteEvent`s with exact rational time.
 */
import Fraction from "fraction.js";
import type { NoteEvent, Pitch } from "../score/types";

const STEP_SEMITONE: Readonly<Record<Pitch["step"], number>> = { C: 0, D: 2, E: 4, F: 5, G: 7, A: 9, B: 11 };

/**
 * Parse a note name (step, optional #/b/x/bb, octave; MusicXML octave 4 starts at middle C, FACTS.md §2).
 *
 * @example
 * parseNoteName("C#4").midi // 61
 */
export function parseNoteName(name: string): Pitch {
  const m = /^([A-G])(#|b|x|bb|##)?(-?\d)$/.exec(name.trim());
  if (!m) throw new Error(`not a note name: ${name}`);
  const step = m[1] as Pitch["step"];
  const alter = ({ "#": 1, "##": 2, x: 2, b: -1, bb: -2 } as Record<string, number>)[m[2] ?? ""] ?? 0;
  const octave = Number(m[3]);
  return { step, alter, octave, midi: (octave + 1) * 12 + STEP_SEMITONE[step] + alter };
}

export interface BuildOptions {
  /** Staff number (1 = right hand, 2 = left hand). */
  readonly staff?: number;
  /** Duration of each entry in quarter notes (default 1/2, eighth notes). */
  readonly step?: Fraction;
  /** Notes per measure (default 8). */
  readonly perBar?: number;
  /** First onset (default 0). */
  readonly start?: Fraction;
  /** Id prefix. */
  readonly id?: string;
}

/**
 * Build one hand's events. Each entry is a note name, a chord ("C4+E4+G4"), "r" for a rest, and may
 * carry a written finger after a slash ("E4/3").
 *
 * @example
 * buildNotes(["C4", "D4/2", "r", "C4+E4"]).length // 5
 */
export function buildNotes(entries: readonly string[], options: BuildOptions = {}): NoteEvent[] {
  const step = options.step ?? new Fraction(1, 2);
  const perBar = options.perBar ?? 8;
  const start = options.start ?? new Fraction(0);
  const prefix = options.id ?? "n";
  const out: NoteEvent[] = [];
  entries.forEach((entry, k) => {
    const onset = start.add(step.mul(k));
    const measure = Math.floor(k / perBar);
    const base = {
      part: "P1", staff: options.staff ?? 1, voice: "1", measure, onset, duration: step,
      written: { type: "eighth", dots: 0, tuplet: null }, tie: "none" as const,
    };
    if (entry === "r") {
      out.push({ ...base, id: `${prefix}${out.length}`, pitch: null, chord: false });
      return;
    }
    entry.split("+").forEach((token, j) => {
      const [name, finger] = token.split("/");
      const written = finger ? { fingering: [{ finger: Number(finger) }], fingeringSource: "score" as const } : {};
      out.push({ ...base, ...written, id: `${prefix}${out.length}`, pitch: parseNoteName(name!), chord: j > 0 });
    });
  });
  return out;
}
