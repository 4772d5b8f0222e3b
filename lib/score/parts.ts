/**
 * Which part of a score is the piano, and which staff each hand reads. A song has a voice part and a
 * two-staff piano part; the piano is found by its staves and its name, never by its position.
 * The right hand is the piano's upper staff and the left hand its lower staff; a note written on the
 * other staff (a cross-staff voice) follows the hand of the voice it belongs to.
 */
import type { Hand, NoteEvent, PartInfo, Score } from "./types";

/** Part names that say "keyboard" (common practice: piano, pianoforte, Klavier, Flügel, clavier …). */
const PIANO_NAME = /piano|pianoforte|klavier|clavier|fl[üu]gel|keyboard|cembalo|harpsichord|\bpf\b|\bpno\b/i;

/** A part a teacher could pick as the piano: its id, name and why it qualifies. */
export interface PianoCandidate {
  readonly part: PartInfo;
  /** Two or more staves (a grand staff). */
  readonly grandStaff: boolean;
  /** The name says piano (or another keyboard). */
  readonly named: boolean;
}

/**
 * Parts that could be the piano, most likely first: a grand staff named piano, then a grand staff, then
 * a one-staff part named piano. Empty when no part qualifies.
 *
 * @example
 * pianoCandidates(song).map((c) => c.part.id); // ["P2"] (P1 is the voice)
 */
export function pianoCandidates(score: Pick<Score, "parts">): PianoCandidate[] {
  const rank = (c: PianoCandidate) => (c.grandStaff ? 2 : 0) + (c.named ? 1 : 0);
  return score.parts
    .map((part) => ({ part, grandStaff: part.staves >= 2, named: PIANO_NAME.test(part.name) }))
    .filter((c) => c.grandStaff || c.named)
    .sort((a, b) => rank(b) - rank(a));
}

/**
 * The piano part: the best candidate, or the only part when the score has one part. Undefined when a
 * score with several parts has none that looks like a piano.
 *
 * @example
 * pianoPart(song)?.id; // "P2"
 */
export function pianoPart(score: Pick<Score, "parts">): PartInfo | undefined {
  return pianoCandidates(score)[0]?.part ?? (score.parts.length === 1 ? score.parts[0] : undefined);
}

/**
 * The hand each note of a part belongs to: its staff's hand (upper staff = right), except that a note
 * of a voice that sits mostly (three quarters or more) on the other staff follows its voice.
 *
 * @example
 * const handOf = handsOfPart(score.events, "P2"); handOf(event); // "left"
 */
export function handsOfPart(events: readonly NoteEvent[], part: string): (e: NoteEvent) => Hand {
  const counts = new Map<string, [number, number]>();
  for (const e of events) {
    if (e.part !== part || !e.pitch) continue;
    const c = counts.get(e.voice) ?? [0, 0];
    c[e.staff >= 2 ? 1 : 0] += 1;
    counts.set(e.voice, c);
  }
  const home = new Map<string, Hand>();
  for (const [voice, [upper, lower]] of counts) {
    if (upper >= 3 * lower && lower > 0) home.set(voice, "right");
    else if (lower >= 3 * upper && upper > 0) home.set(voice, "left");
  }
  return (e) => home.get(e.voice) ?? (e.staff >= 2 ? "left" : "right");
}
