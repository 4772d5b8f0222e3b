/**
 * The key and mode of a passage from its notes and its key signature: the signature's major key
 * or its relative minor (tonal's `Key.majorKey(...).minorRelative`) — or a key one fifth away when
 * the passage clearly centres there (a bar in the dominant) — chosen by how well the
 * passage's pitch classes (weighted by length, the bass of its first and last sonority counted
 * extra) fit each key's tonal-hierarchy profile; the raised leading tone of the minor counts as
 * minor evidence. Scale drills then use the passage's key, in the minor form the teacher chooses.
 */
import { Key, Note, Scale } from "tonal";
import type { KeySignature, Passage } from "../score/types";
import { keyTonic } from "./spell";

export const MINOR_FORMS = ["natural", "harmonic", "melodic"] as const;
export type MinorForm = (typeof MINOR_FORMS)[number];

/** A passage's key: tonic name as tonal spells it, mode, and the signature it sits on. */
export interface PassageKey {
  readonly tonic: string;
  readonly mode: "major" | "minor";
  readonly fifths: number;
}

/**
 * Krumhansl–Kessler probe-tone profiles (Krumhansl & Kessler 1982; values from memory), from the
 * tonic upwards by semitone.
 */
const MAJOR_PROFILE = [6.35, 2.23, 3.48, 2.33, 4.38, 4.09, 2.52, 5.19, 2.39, 3.66, 2.29, 2.88];
const MINOR_PROFILE = [6.33, 2.68, 3.52, 5.38, 2.6, 3.53, 2.54, 4.75, 3.98, 2.69, 3.34, 3.17];

/**
 * How much better the minor must fit before the signature's major key is set aside: the major
 * reading is the default, so only a passage that clearly centres on the minor tonic switches.
 */
const MARGIN = 0.05;
/** How much better a key one fifth away from the signature must fit than the signature's own keys. */
const NEIGHBOUR_MARGIN = 0.1;

function correlation(hist: readonly number[], profile: readonly number[], tonicChroma: number): number {
  const rotated = hist.map((_, i) => hist[(i + tonicChroma) % 12]);
  const mean = (xs: readonly number[]) => xs.reduce((a, b) => a + b, 0) / xs.length;
  const mx = mean(rotated);
  const my = mean(profile);
  let num = 0;
  let dx = 0;
  let dy = 0;
  for (let i = 0; i < 12; i++) {
    num += (rotated[i] - mx) * (profile[i] - my);
    dx += (rotated[i] - mx) ** 2;
    dy += (profile[i] - my) ** 2;
  }
  return dx === 0 || dy === 0 ? 0 : num / Math.sqrt(dx * dy);
}

/**
 * The key of a passage: its signature's major key or relative minor, whichever its notes fit
 * better, or a neighbouring key (one fifth away) that fits clearly better still; a signature
 * marked minor, or a passage of fewer than three pitch classes, keeps the signature's key.
 *
 * @example
 * passageKey(aMinorPassage); // { tonic: "A", mode: "minor", fifths: 0 }
 * passageKey(cMajorPassage); // { tonic: "C", mode: "major", fifths: 0 }
 */
export function passageKey(passage: Pick<Passage, "key" | "sonorities">): PassageKey {
  let found = KEYS.get(passage);
  if (!found) KEYS.set(passage, (found = findKey(passage)));
  return found;
}

/** Keys found per passage object (passages are immutable; several families ask for the same one). */
const KEYS = new WeakMap<object, PassageKey>();

function findKey(passage: Pick<Passage, "key" | "sonorities">): PassageKey {
  const sig = passage.key;
  const major = Note.transposeFifths("C", sig.fifths);
  const minor = Key.majorKey(major).minorRelative;
  const marked: PassageKey = sig.mode === "minor" ? { tonic: keyTonic(sig), mode: "minor", fifths: sig.fifths } : { tonic: major, mode: "major", fifths: sig.fifths };
  const hist = new Array<number>(12).fill(0);
  const sons = [...passage.sonorities.right, ...passage.sonorities.left].sort((a, b) => a.onset.compare(b.onset));
  for (const s of sons) for (const n of s.notes) if (n.pitch) hist[((n.pitch.midi % 12) + 12) % 12] += s.duration.valueOf();
  // Too few pitch classes to tell (a note or two): the signature's own mode.
  if (sig.mode === "minor" || hist.filter((w) => w > 0).length < 3) return marked;
  const total = hist.reduce((a, b) => a + b, 0) || 1;
  // The bass of the first and last sonority weighs like a quarter of all the notes (common practice:
  // a passage opens and closes on its tonic harmony more often than not).
  for (const s of [sons[0], sons[sons.length - 1]]) {
    const low = s.notes[0]?.pitch;
    if (low) hist[((low.midi % 12) + 12) % 12] += total / 8;
  }
  // The signature's major and relative minor, then the keys one fifth either side (a passage
  // that centres on the dominant or subdominant), which must fit clearly better to be chosen.
  let best: { key: PassageKey; fit: number } | undefined;
  const own = new Set(Scale.get(`${major} major`).notes.map((n) => Note.chroma(n)!));
  // A neighbouring key needs a note of its own the signature lacks (G♯ for A minor under one sharp).
  const evidence = (notes: readonly string[]) => notes.some((n) => !own.has(Note.chroma(n)!) && hist[Note.chroma(n)!] > 0);
  for (const df of [0, 1, -1]) {
    const fifths = sig.fifths + df;
    if (Math.abs(fifths) > 7) continue;
    const maj = Note.transposeFifths("C", fifths);
    const min = Key.majorKey(maj).minorRelative;
    const penalty = df === 0 ? 0 : NEIGHBOUR_MARGIN;
    const majorFit = correlation(hist, MAJOR_PROFILE, Note.chroma(maj)!) - penalty;
    // The raised leading tone (G♯ in A minor) belongs to the minor key, not to its relative major.
    const leading = Note.chroma(Key.minorKey(min).harmonic.scale[6])!;
    const minorFit = correlation(hist, MINOR_PROFILE, Note.chroma(min)!) + (hist[leading] > 0 ? 0.1 : 0) - MARGIN - penalty;
    const candidates = [
      { key: { tonic: maj, mode: "major" as const, fifths }, fit: majorFit, notes: Scale.get(`${maj} major`).notes },
      { key: { tonic: min, mode: "minor" as const, fifths }, fit: minorFit, notes: Key.minorKey(min).harmonic.scale },
    ];
    for (const c of candidates) {
      if (df !== 0 && !evidence(c.notes)) continue;
      if (!best || c.fit > best.fit) best = { key: c.key, fit: c.fit };
    }
  }
  return best?.key ?? marked;
}

/**
 * The tonal scale name of a passage key in the chosen minor form ("A harmonic minor", "C major").
 *
 * @example
 * scaleNameOf({ tonic: "A", mode: "minor", fifths: 0 }, "harmonic"); // "A harmonic minor"
 * scaleNameOf({ tonic: "A", mode: "minor", fifths: 0 }, "natural"); // "A minor"
 */
export function scaleNameOf(k: PassageKey, form: MinorForm = "harmonic"): string {
  if (k.mode === "major") return `${k.tonic} major`;
  return form === "natural" ? `${k.tonic} minor` : `${k.tonic} ${form} minor`;
}

/**
 * The pitch classes of a passage key's scale, from tonal: `Scale.get(name).notes` for major,
 * `Key.minorKey(tonic)[form].scale` for minor.
 *
 * @example
 * keyScaleNotes({ tonic: "A", mode: "minor", fifths: 0 }, "harmonic"); // ["A", "B", "C", "D", "E", "F", "G#"]
 */
export function keyScaleNotes(k: PassageKey, form: MinorForm = "harmonic"): string[] {
  if (k.mode === "major") return Scale.get(`${k.tonic} major`).notes;
  return [...Key.minorKey(k.tonic)[form].scale];
}

/**
 * The signature-shaped key of a passage key (for helpers that take a `KeySignature`).
 *
 * @example
 * asSignature({ tonic: "A", mode: "minor", fifths: 0 }); // { fifths: 0, mode: "minor" }
 */
export function asSignature(k: PassageKey): KeySignature {
  return { fifths: k.fifths, mode: k.mode };
}

/**
 * How a teacher names the key and scale form ("A harmonic minor", "E♭ major").
 *
 * @example
 * keyLabel({ tonic: "Eb", mode: "major", fifths: -3 }); // "E♭ major"
 */
export function keyLabel(k: PassageKey, form: MinorForm = "harmonic"): string {
  return scaleNameOf(k, form).replace(/^([A-G])(#+|b+)?/, (_m, l: string, acc?: string) => l + (acc ?? "").replace(/#/g, "♯").replace(/b/g, "♭"));
}

/**
 * The minor form to write for a passage: the chosen one, unless its scale needs a double sharp or
 * flat the passage never writes (C𝄪 of D♯ harmonic minor), when the natural minor is used instead
 * (DRILL-RUBRIC "Spelled as a musician spells": no double accidentals the passage does not have).
 *
 * @example
 * writableForm({ tonic: "D#", mode: "minor", fifths: 6 }, "harmonic", passage); // "natural" when the passage has no C𝄪
 */
export function writableForm(k: PassageKey, form: MinorForm, passage: Pick<Passage, "events">): MinorForm {
  if (k.mode === "major" || form === "natural") return form;
  const doubles = (names: readonly string[]) => names.some((n) => /##|bb|x/.test(n));
  if (!doubles(keyScaleNotes(k, form))) return form;
  return passage.events.some((e) => e.pitch && Math.abs(e.pitch.alter) >= 2) ? form : "natural";
}
