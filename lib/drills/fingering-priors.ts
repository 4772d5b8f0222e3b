/**
 * Priors for the fingering search: the finger a scale book gives each note of a scale-wise run
 * (scale-fingerings.ts), so a run in E♭ major is fingered as E♭ major is practised.
 */
import { Note } from "tonal";
import type { Hand, KeySignature } from "../score/types";
import type { Slice } from "./fingering-slices";
import { fingeredScale, type ScaleForm } from "./scale-fingerings";
import { keyTonic } from "./spell";

/**
 * Shortest scale-wise run that gets the prior: five notes (a five-finger group) — common practice.
 *
 * @example
 * MIN_RUN // 5
 */
export const MIN_RUN = 5;

type FingerByChroma = ReadonlyMap<number, number>;
interface Table {
  readonly up: FingerByChroma;
  readonly down: FingerByChroma;
  readonly chromas: ReadonlySet<number>;
  readonly tonic: number;
  /** The book's finger on the lowest and the highest tonic of the scale. */
  readonly bottom: number;
  readonly top: number;
}
const tableCache = new Map<string, Table | null>();

/** Inner fingers of a two-octave scale per pitch class, plus the book's fingers on the outer tonics. */
function table(tonic: string, form: ScaleForm, hand: Hand): Table | null {
  const key = `${tonic}|${form}|${hand}`;
  if (tableCache.has(key)) return tableCache.get(key)!;
  const s = fingeredScale(tonic, form, hand, 2, 4);
  let out: Table | null = null;
  if (s) {
    const up = new Map<number, number>();
    const down = new Map<number, number>();
    const n = 15;
    for (let i = 1; i < n - 1; i++) up.set(Note.chroma(s.notes[i]!)!, s.fingers[i]!);
    for (let i = n; i < s.notes.length - 1; i++) down.set(Note.chroma(s.notes[i]!)!, s.fingers[i]!);
    out = { up, down, chromas: new Set([...up.keys()]), tonic: Note.chroma(tonic)!, bottom: s.fingers[0]!, top: s.fingers[n - 1]! };
  }
  tableCache.set(key, out);
  return out;
}

/** Scale forms to try for a key: major, or the three minor forms. */
const formsOf = (key: KeySignature): ScaleForm[] => (key.mode === "minor" ? ["harmonic minor", "melodic minor", "natural minor"] : ["major"]);

const TONICS = ["C", "G", "D", "A", "E", "B", "F#", "Db", "Ab", "Eb", "Bb", "F"];
const ALL_FORMS: ScaleForm[] = ["major", "harmonic minor", "melodic minor", "natural minor"];

/**
 * Preferred finger per slice from the scale table, null where there is none: runs of at least
 * `MIN_RUN` single notes moving by step (1–2 semitones, or the augmented second of harmonic minor at most
 * once in six steps) in one direction without a rest, whose pitch
 * classes all belong to one form of the key in force. The run's first and last notes get no prior
 * (a run may start or turn on any finger).
 *
 * @example
 * scalePriors(slices, "right", () => ({ fifths: -3, mode: "major" }))[2] // the E♭-major finger of note 3
 */
export function scalePriors(slices: readonly Slice[], hand: Hand, keyOf?: (measure: number) => KeySignature | undefined): (number | null)[] {
  const out: (number | null)[] = slices.map(() => null);
  const step = (x: Slice, y: Slice): number => {
    if (x.midis.length !== 1 || y.midis.length !== 1 || y.lift) return 0;
    const d = y.midis[0]! - x.midis[0]!;
    // Steps of a scale: semitone, tone, and the augmented second of harmonic minor.
    return Math.abs(d) >= 1 && Math.abs(d) <= 3 ? Math.sign(d) : 0;
  };
  const runs: { a: number; b: number; dir: number }[] = [];
  let s0 = 0;
  let dir = 0;
  for (let s = 1; s <= slices.length; s++) {
    const d = s < slices.length ? step(slices[s - 1]!, slices[s]!) : 0;
    if (d !== 0 && (dir === 0 || d === dir)) { dir = d; continue; }
    // The run s0 … s-1 has ended.
    if (dir !== 0) runs.push({ a: s0, b: s - 1, dir });
    if (d !== 0) { s0 = s - 1; dir = d; } else { s0 = s; dir = 0; }
  }
  /** A scale has at most one augmented second per octave: more thirds make an arpeggio, not a run. */
  const scalewise = (r: { a: number; b: number }): boolean => {
    let thirds = 0;
    for (let s = r.a + 1; s <= r.b; s++) if (Math.abs(slices[s]!.midis[0]! - slices[s - 1]!.midis[0]!) === 3) thirds++;
    return thirds * 6 <= r.b - r.a;
  };
  runs.forEach((r, i) => {
    if (r.b - r.a + 1 < MIN_RUN || !scalewise(r)) return;
    const turnBefore = i > 0 && runs[i - 1]!.b === r.a;
    const turnAfter = i + 1 < runs.length && runs[i + 1]!.a === r.b;
    applyRun(slices, r.a, r.b, r.dir, hand, keyOf, out, turnBefore, turnAfter);
  });
  return out;
}

const chromaOf = (m: number): number => ((m % 12) + 12) % 12;

/** The book's fingers for the notes of run a … b (null where the book does not decide). */
function runFingers(slices: readonly Slice[], a: number, b: number, dir: number, t: Table, turnBefore: boolean, turnAfter: boolean): (number | null)[] {
  const map = dir > 0 ? t.up : t.down;
  const midis = slices.slice(a, b + 1).map((s) => s.midis[0]!);
  const lo = Math.min(...midis);
  const hi = Math.max(...midis);
  return midis.map((m, k) => {
    const end = k === 0 || k === midis.length - 1;
    if (!end) return map.get(chromaOf(m)) ?? null;
    if (chromaOf(m) === t.tonic && (m === lo || m === hi)) return m === lo ? t.bottom : t.top;
    const turn = k === 0 ? turnBefore : turnAfter;
    return turn ? t.up.get(chromaOf(m)) ?? null : null;
  });
}

function applyRun(slices: readonly Slice[], a: number, b: number, dir: number, hand: Hand, keyOf: ((measure: number) => KeySignature | undefined) | undefined, out: (number | null)[], turnBefore: boolean, turnAfter: boolean): void {
  const chromas = new Set<number>();
  for (let s = a; s <= b; s++) chromas.add(chromaOf(slices[s]!.midis[0]!));
  const key = keyOf?.(slices[a]!.measure);
  // With the key known: its first form that holds every note. Without: every scale that holds the
  // run's notes, and only the fingers they all agree on.
  const candidates = key ? formsOf(key).map((form) => table(keyTonic(key), form, hand)) : TONICS.flatMap((tonic) => ALL_FORMS.map((form) => table(tonic, form, hand)));
  let agreed: (number | null)[] | null = null;
  for (const t of candidates) {
    if (!t || ![...chromas].every((c) => t.chromas.has(c))) continue;
    const fingers = runFingers(slices, a, b, dir, t, turnBefore, turnAfter);
    agreed = agreed ? agreed.map((f, k) => (f === fingers[k] ? f : null)) : fingers;
    if (key) break;
  }
  if (!agreed) return;
  agreed.forEach((f, k) => { if (f != null) out[a + k] = f; });
}

/**
 * Notes on either side that must match for two statements of a figure to count as the same.
 *
 * @example
 * FIGURE_CONTEXT // 2
 */
export const FIGURE_CONTEXT = 2;

/**
 * Preferred fingers per slice from the score's own printed fingering of the same figure elsewhere:
 * an editor often marks only the first statement of a repeated figure, and a repeat is played with
 * the same fingers (common practice). A slice without written fingers whose notes and the notes of
 * `FIGURE_CONTEXT` slices on each side equal those around a fully fingered slice gets that slice's
 * fingers. `written[s]` is the written finger tuple of slice s, or null.
 *
 * @example
 * repeatPriors(slices, written)[12] // [1] when the same figure at slice 4 is printed with 1
 */
export function repeatPriors(slices: readonly Slice[], written: readonly (readonly number[] | null)[]): (readonly number[] | null)[] {
  const keyAt = (s: number): string => {
    let key = "";
    for (let k = s - FIGURE_CONTEXT; k <= s + FIGURE_CONTEXT; k++) key += `${slices[k]?.midis.join("+") ?? "-"}|`;
    return key;
  };
  const fingered = new Map<string, readonly number[]>();
  slices.forEach((_, s) => {
    const w = written[s];
    if (w) fingered.set(keyAt(s), w);
  });
  return slices.map((_, s) => (written[s] ? null : fingered.get(keyAt(s)) ?? null));
}
