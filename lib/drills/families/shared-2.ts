/**
 * Pitch and key arithmetic for the families that move notes (sequence, octave-shift, thumb-pairs):
 * the key's scale, diatonic and chromatic moves, mirrors. Built on `../spell` and tonal, so
 * spelling follows the key.
 */
import { Interval, Note, Scale } from "tonal";
import type { KeySignature, Pitch } from "../../score/types";
import { scaleNameOf, type MinorForm } from "../key-mode";
import { keyTonic, pitchFromName as namePitch, pitchName, transposePitch } from "../spell";

/** Lowest and highest piano keys as MIDI numbers: A0 = 21, C8 = 108 (FACTS.md §1). */
export const PIANO_LOW = 21;
export const PIANO_HIGH = 108;

/** Tonal's scale name of a key signature with the minor form used for moves in minor keys. */
function scaleName(key: KeySignature, form: MinorForm): string {
  return scaleNameOf({ tonic: keyTonic(key), mode: key.mode === "minor" ? "minor" : "major", fifths: key.fifths }, form);
}

/**
 * The pitch classes of the key's scale, as tonal's `Scale.get(...).notes` spells them; a minor
 * key in the given form (harmonic by default, so the leading tone is a scale note).
 * @example keyScale({ fifths: 0, mode: "major" }) // ["C", "D", "E", "F", "G", "A", "B"]
 * @example keyScale({ fifths: 0, mode: "minor" }) // ["A", "B", "C", "D", "E", "F", "G#"]
 */
export function keyScale(key: KeySignature, form: MinorForm = "harmonic"): string[] {
  const name = scaleName(key, form);
  let notes = SCALES.get(name);
  if (!notes) SCALES.set(name, (notes = Scale.get(name).notes));
  return [...notes];
}

/** Scale notes by scale name (at most thirty keys, so kept). */
const SCALES = new Map<string, readonly string[]>();

/** Shifted pitches by pitch, steps and key (a pure function; cleared when large). */
const SHIFTS = new Map<string, Pitch>();

/** Where a pitch sits in the key's scale: degree index 0…6 and the chromatic offset from that degree. */
function scalePosition(p: Pitch, scale: readonly string[]): { degree: number; octave: number; alter: number } {
  const letters = scale.map((n) => n[0]);
  const degree = letters.indexOf(p.step);
  const base = Note.get(scale[degree]);
  // Octave of the scale degree counted from the tonic (tonic's octave starts each scale octave).
  const tonicLetterIndex = "CDEFGAB".indexOf(scale[0][0]);
  const letterIndex = "CDEFGAB".indexOf(p.step);
  const octave = p.octave - (letterIndex < tonicLetterIndex ? 1 : 0);
  return { degree, octave, alter: p.alter - base.alt };
}

/**
 * Moves a pitch by `steps` degrees of the key's scale (minor keys: harmonic minor); a note outside
 * the scale keeps its chromatic offset from its degree unless that would need a double sharp or
 * flat, when it takes the plain scale note (a diatonic move keeps the key's spelling). Uses
 * tonal's `Scale.degrees` for the scale notes.
 * @example diatonicShift(pitchFromName("E4"), 1, { fifths: 0, mode: "major" }) // F4
 * @example diatonicShift(pitchFromName("G#4"), 1, { fifths: 0, mode: "minor" }) // A4 (G♯ is A minor's leading tone)
 */
export function diatonicShift(p: Pitch, steps: number, key: KeySignature, form: MinorForm = "harmonic"): Pitch {
  const memo = `${p.step}${p.alter}${p.octave}|${steps}|${key.fifths}${key.mode}|${form}`;
  let found = SHIFTS.get(memo);
  if (!found) {
    found = shiftBySteps(p, steps, key, form);
    if (SHIFTS.size > 8192) SHIFTS.clear();
    SHIFTS.set(memo, found);
  }
  return { ...found };
}

function shiftBySteps(p: Pitch, steps: number, key: KeySignature, form: MinorForm): Pitch {
  const scale = keyScale(key, form);
  const pos = scalePosition(p, scale);
  const tonic = `${scale[0]}${pos.octave}`;
  const name = scaleName(key, form);
  const degreeOf = Scale.degrees(`${tonic} ${name.slice(name.indexOf(" ") + 1)}`);
  const k = pos.degree + steps;
  const target = namePitch(degreeOf(k >= 0 ? k + 1 : k));
  let out = target;
  for (let i = 0; i < Math.abs(pos.alter); i++) out = transposePitch(out, pos.alter > 0 ? "1A" : "-1A");
  return Math.abs(out.alter) >= 2 ? target : out;
}

/**
 * The interval tonal names from `a` to `b` (negative when descending).
 * @example intervalBetween(pitchFromName("C4"), pitchFromName("A3")) // "-3m"
 */
export function intervalBetween(a: Pitch, b: Pitch): string {
  return Interval.distance(pitchName(a), pitchName(b));
}

/**
 * The same interval in the opposite direction ("3M" ↔ "-3M").
 * @example negateInterval("-3m") // "3m"
 */
export function negateInterval(iv: string): string {
  return iv.startsWith("-") ? iv.slice(1) : iv === "1P" ? iv : `-${iv}`;
}

/**
 * Mirrors `p` around `axis` chromatically, with `target` as the mirrored axis: the interval axis→p
 * is applied to `target` in the opposite direction (tonal's `Interval.distance` / `Note.transpose`).
 * @example mirrorChromatic(pitchFromName("C4"), pitchFromName("E4"), pitchFromName("C3")) // Ab2
 */
export function mirrorChromatic(axis: Pitch, p: Pitch, target: Pitch): Pitch {
  return transposePitch(target, negateInterval(intervalBetween(axis, p)));
}

/**
 * Mirrors `p` around `axis` by scale degrees of the key: k degrees above the axis becomes
 * k degrees below `target`.
 * @example mirrorDiatonic(pitchFromName("C4"), pitchFromName("E4"), pitchFromName("C3"), { fifths: 0, mode: "major" }) // A2
 */
export function mirrorDiatonic(axis: Pitch, p: Pitch, target: Pitch, key: KeySignature, form: MinorForm = "harmonic"): Pitch {
  return diatonicShift(target, -degreeDistance(axis, p, key), key, form);
}

/**
 * Number of scale degrees from `a` up to `b` (negative when `b` is lower), counted by letter names.
 * @example degreeDistance(pitchFromName("C4"), pitchFromName("G4"), { fifths: 0, mode: "major" }) // 4
 */
export function degreeDistance(a: Pitch, b: Pitch, _key: KeySignature): number {
  const idx = (p: Pitch) => p.octave * 7 + "CDEFGAB".indexOf(p.step);
  return idx(b) - idx(a);
}

/**
 * True when every pitch lies on the piano, A0 (21) … C8 (108) (FACTS.md §1).
 * @example onPiano([pitchFromName("A0"), pitchFromName("C8")]) // true
 */
export function onPiano(pitches: readonly Pitch[]): boolean {
  return pitches.every((p) => p.midi >= PIANO_LOW && p.midi <= PIANO_HIGH);
}
