/**
 * Sonorities (notes one hand strikes together) and groups (beats, repeated figures) of a passage.
 */
import Fraction from "fraction.js";
import { mergeTies } from "./ties";
import { maxTime, ZERO } from "./time";
import type { Hand, Measure, NoteEvent, NoteGroup, Sonority, TimeSignature } from "./types";

/**
 * Struck notes of one hand grouped by onset, low to high. Tied continuations merge into the note
 * they continue; grace notes and rests are left out.
 *
 * @example
 * sonorities(events, "right").map((s) => s.notes.length); // [3, 1, 1] for a chord then two notes
 */
export function sonorities(events: readonly NoteEvent[], hand: Hand): Sonority[] {
  const struck = mergeTies(events.filter((e) => e.pitch && !e.grace));
  const byOnset = new Map<string, NoteEvent[]>();
  for (const e of struck) {
    const k = e.onset.toFraction();
    const list = byOnset.get(k);
    if (list) list.push(e);
    else byOnset.set(k, [e]);
  }
  return [...byOnset.values()]
    .map((notes) => {
      const sorted = [...notes].sort((a, b) => a.pitch!.midi - b.pitch!.midi);
      const duration = sorted.reduce<Fraction>((d, n) => maxTime(d, n.duration), ZERO);
      return { hand, onset: sorted[0].onset, duration, notes: sorted };
    })
    .sort((a, b) => a.onset.compare(b.onset));
}

/**
 * The beat of a time signature in quarter notes: compound meters (6, 9, 12 … beats of a short note)
 * count in dotted beats, others in the beat-type note.
 *
 * @example
 * beatLength({ beats: 6, beatType: 8 }).toFraction(); // "3/2"
 * beatLength({ beats: 3, beatType: 4 }).toFraction(); // "1"
 */
export function beatLength(time: TimeSignature): Fraction {
  const note = new Fraction(4, time.beatType);
  return time.beats > 3 && time.beats % 3 === 0 ? note.mul(3) : note;
}

/**
 * Beat groups: the sonorities starting inside each beat of each bar.
 *
 * @example
 * beatGroups(sonorities(events, "left"), measures).length; // one per beat that has notes
 */
export function beatGroups(sons: readonly Sonority[], measures: readonly Measure[]): NoteGroup[] {
  const groups: NoteGroup[] = [];
  let m = 0;
  let current: { onset: Fraction; duration: Fraction; list: Sonority[] } | null = null;
  for (const s of sons) {
    while (m + 1 < measures.length && s.onset.compare(measures[m + 1].start) >= 0) m++;
    const bar = measures[m];
    const beat = beatLength(bar.time);
    const k = Math.max(0, Math.floor(s.onset.sub(bar.start).div(beat).valueOf()));
    const onset = bar.start.add(beat.mul(k));
    if (!current || !current.onset.equals(onset)) {
      if (current) groups.push(group(sons[0].hand, "beat", current.onset, current.duration, current.list));
      current = { onset, duration: beat, list: [] };
    }
    current.list.push(s);
  }
  if (current) groups.push(group(sons[0].hand, "beat", current.onset, current.duration, current.list));
  return groups;
}

function group(hand: Hand, kind: "beat" | "figure", onset: Fraction, duration: Fraction, list: Sonority[]): NoteGroup {
  return { hand, kind, onset, duration, sonorities: list };
}

/** Shape of a sonority relative to a reference pitch, with its duration: what must match to repeat. */
function shape(s: Sonority, ref: number): string {
  return `${s.notes.map((n) => n.pitch!.midi - ref).join(",")}/${s.duration.toFraction()}`;
}

/**
 * Figure groups: a run of at least 3 sonorities that is immediately repeated (same intervals from its
 * first note and same durations, so a figure moved to another pitch still counts). Each occurrence
 * becomes one group; the shortest figure that repeats wins.
 *
 * @example
 * // C-G-E-G C-G-E-G (an accompaniment figure) → two figure groups of four sonorities
 * figureGroups(sons).map((g) => g.sonorities.length); // [4, 4]
 */
export function figureGroups(sons: readonly Sonority[]): NoteGroup[] {
  const groups: NoteGroup[] = [];
  const n = sons.length;
  let i = 0;
  while (i < n) {
    let found = 0;
    for (let len = 3; i + 2 * len <= n && !found; len++) {
      if (sameFigure(sons, i, i + len, len)) found = len;
    }
    if (!found) {
      i++;
      continue;
    }
    let j = i;
    while (j + found <= n && (j === i || sameFigure(sons, i, j, found))) {
      const list = sons.slice(j, j + found);
      const last = list[list.length - 1];
      const end = last.onset.add(last.duration);
      groups.push(group(list[0].hand, "figure", list[0].onset, end.sub(list[0].onset), list));
      j += found;
    }
    i = j;
  }
  return groups;
}

function sameFigure(sons: readonly Sonority[], a: number, b: number, len: number): boolean {
  const refA = sons[a].notes[0].pitch!.midi;
  const refB = sons[b].notes[0].pitch!.midi;
  for (let k = 0; k < len; k++) {
    if (shape(sons[a + k], refA) !== shape(sons[b + k], refB)) return false;
  }
  return true;
}
