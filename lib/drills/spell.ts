/**
 * Pitch spelling for drills, on top of tonal: MIDI numbers spelled in a key, transposition by
 * interval, and chromatic steps spelled the key's way — the key's own notes first, then flats in
 * flat keys and sharps in sharp keys (a key has one spelling direction); in C major and A minor,
 * sharps going up and flats going down (common practice).
 */
import { Note, Scale } from "tonal";
import type { KeySignature, Pitch } from "../score/types";

const STEPS = ["C", "D", "E", "F", "G", "A", "B"] as const;

/**
 * A model pitch from a tonal note name with octave ("F#4", "Bb2", "B#3").
 *
 * @example
 * pitchFromName("F#4"); // { step: "F", alter: 1, octave: 4, midi: 66 }
 */
export function pitchFromName(name: string): Pitch {
  const n = Note.get(name);
  if (n.empty || n.oct === undefined || n.midi === null || n.midi === undefined) {
    throw new RangeError(`not a note with octave: ${name}`);
  }
  const step = n.letter as Pitch["step"];
  if (!STEPS.includes(step)) throw new RangeError(`not a note letter: ${name}`);
  return { step, alter: n.alt, octave: n.oct, midi: n.midi };
}

/**
 * The tonal name of a pitch ("F#4").
 *
 * @example
 * pitchName({ step: "B", alter: -1, octave: 3, midi: 58 }); // "Bb3"
 */
export function pitchName(p: Pitch): string {
  const acc = p.alter > 0 ? "#".repeat(p.alter) : "b".repeat(-p.alter);
  return `${p.step}${acc}${p.octave}`;
}

/**
 * The tonic of a key signature: major keys from C, minor keys from A, along the circle of fifths.
 *
 * @example
 * keyTonic({ fifths: 2, mode: "major" }); // "D"
 * keyTonic({ fifths: -1, mode: "minor" }); // "D"
 */
export function keyTonic(key: KeySignature): string {
  return Note.transposeFifths(key.mode === "minor" ? "A" : "C", key.fifths);
}

/**
 * The tonal scale name of a key ("D major", "B minor").
 *
 * @example
 * keyScaleName({ fifths: 3, mode: "major" }); // "A major"
 */
export function keyScaleName(key: KeySignature): string {
  return `${keyTonic(key)} ${key.mode === "minor" ? "minor" : "major"}`;
}

/**
 * Pitch classes treated as "in the key": the scale, plus the raised 6th and 7th in minor unless
 * they need a double sharp (C𝄪 in D♯ minor: a plain D is spelled D).
 */
function keyPitchClasses(key: KeySignature): string[] {
  const tonic = keyTonic(key);
  if (key.mode !== "minor") return Scale.get(`${tonic} major`).notes;
  const natural = Scale.get(`${tonic} minor`).notes;
  const melodic = Scale.get(`${tonic} melodic minor`).notes.filter((n) => !/##|bb/.test(n));
  return [...new Set([...natural, ...melodic])];
}

/** Spell a MIDI number with a given pitch class (same chroma), choosing the octave that fits. */
function withPitchClass(pc: string, midi: number): Pitch | null {
  const base = Math.floor(midi / 12) - 1;
  for (const oct of [base, base - 1, base + 1]) {
    const n = Note.get(`${pc}${oct}`);
    if (n.midi === midi) return pitchFromName(n.name);
  }
  return null;
}

/**
 * Spell a MIDI number: the key's own spelling when the pitch class belongs to the key; otherwise
 * the key's side — flats in flat keys, sharps in sharp keys — and, in a key with no sharps or
 * flats, sharps going up and flats going down (common practice; sharps with no direction).
 *
 * @example
 * spellMidi(66, { fifths: -1, mode: "major" }); // Gb4 (F major has no F#)
 * spellMidi(66, { fifths: 2, mode: "major" }); // F#4 (in D major)
 * spellMidi(61, { fifths: 0, mode: "major" }, "down"); // Db4
 * spellMidi(68, { fifths: -3, mode: "major" }, "up"); // Ab4 (E♭ major: G, A♭, A, B♭ going up)
 */
export function spellMidi(
  midi: number,
  key: KeySignature,
  direction: "up" | "down" | "none" = "none",
): Pitch {
  for (const pc of keyPitchClasses(key)) {
    if (Note.chroma(pc) === ((midi % 12) + 12) % 12) {
      const p = withPitchClass(pc, midi);
      if (p) return p;
    }
  }
  const sharps = key.fifths > 0 || (key.fifths === 0 && direction !== "down");
  return pitchFromName(sharps ? Note.fromMidiSharps(midi) : Note.fromMidi(midi));
}

/**
 * One chromatic step up or down. With a key, spelled the key's way (`spellMidi`: its own notes,
 * then flats in flat keys and sharps in sharp keys); without one, a sharp or natural going up and
 * a flat or natural going down.
 *
 * @example
 * chromaticStep(pitchFromName("C4"), 1); // C#4
 * chromaticStep(pitchFromName("D4"), -1); // Db4
 * chromaticStep(pitchFromName("G4"), 1, { fifths: -3, mode: "major" }); // Ab4
 */
export function chromaticStep(p: Pitch, dir: 1 | -1, key?: KeySignature): Pitch {
  const midi = p.midi + dir;
  if (key) return spellMidi(midi, key, dir > 0 ? "up" : "down");
  return pitchFromName(dir > 0 ? Note.fromMidiSharps(midi) : Note.fromMidi(midi));
}

/**
 * Transpose by an interval name with tonal's `Note.transpose` ("3M", "-2m", "8P").
 *
 * @example
 * transposePitch(pitchFromName("C4"), "3M"); // E4
 */
export function transposePitch(p: Pitch, interval: string): Pitch {
  const name = Note.transpose(pitchName(p), interval);
  if (!name) throw new RangeError(`cannot transpose ${pitchName(p)} by ${interval}`);
  return pitchFromName(name);
}

/**
 * The same pitch class moved by whole octaves (spelling kept).
 *
 * @example
 * shiftOctave(pitchFromName("G3"), 1); // G4
 */
export function shiftOctave(p: Pitch, octaves: number): Pitch {
  return { ...p, octave: p.octave + octaves, midi: p.midi + 12 * octaves };
}
