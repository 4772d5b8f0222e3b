/**
 * Lay out drill content into bars: durations become written notes (type, dots, tuplet), notes
 * that cross a barline are split and tied, and every bar is completed with rests so that it sums
 * exactly to the time signature.
 */
import Fraction from "fraction.js";
import type { Fingering, Hand, NoteEvent, NoteMark, Pitch, TimeSignature, Written } from "../score/types";
import { writtenPieces } from "./written-pieces";

export { impliedTuplet, writtenPieces } from "./written-pieces";

/** One note of a drill slot; `source` is the passage note it comes from (its fingering is kept). */
export interface SlotNote {
  readonly pitch: Pitch;
  readonly source?: NoteEvent;
  /**
   * A passage note this note stands for when moved (a sequence step, another octave): its
   * estimated finger is suggested, but its written fingering is not copied.
   */
  readonly like?: NoteEvent;
  /** A fingering the drill prescribes (e.g. standard scale fingering), marked "drill". */
  readonly fingering?: readonly Fingering[];
}

/** One written sonority (or rest, when `notes` is empty) of a drill, with its exact duration. */
export interface Slot {
  /** Sounding duration in quarter notes. */
  readonly duration: Fraction;
  readonly notes: readonly SlotNote[];
  readonly tuplet?: { readonly actual: number; readonly normal: number };
  readonly marks?: readonly NoteMark[];
  readonly words?: string;
  readonly dynamic?: string;
  /** Grace notes written just before this slot's notes (no time of their own). */
  readonly grace?: readonly SlotNote[];
}

/** A stretch of drill music that starts on a new bar; both hands run side by side. */
export interface Segment {
  readonly right?: readonly Slot[];
  readonly left?: readonly Slot[];
  /** Rests before the first slot, e.g. to keep a pickup's place in the bar. */
  readonly lead?: Fraction;
  /** Metronome mark written in the first bar of the segment. */
  readonly tempo?: number;
}

/** A laid-out hand: events without ids yet, plus the number of bars used. */
export interface LaidEvent extends Omit<NoteEvent, "id" | "part" | "staff" | "voice"> {
  readonly hand: Hand;
  /** The passage note this note plays (its fingering can be carried over). */
  readonly source?: NoteEvent;
  /** The passage note this moved note stands for (see `SlotNote.like`). */
  readonly like?: NoteEvent;
}

/**
 * Bar length in quarter notes.
 *
 * @example
 * barLength({ beats: 6, beatType: 8 }).toFraction(); // "3"
 */
export function barLength(time: TimeSignature): Fraction {
  return new Fraction(time.beats * 4, time.beatType);
}

/** One written piece of a slot: where it starts, its bar and its written value. */
interface Piece { onset: Fraction; duration: Fraction; written: Written; measure: number }

function gcd(x: number, y: number): number {
  while (y !== 0) [x, y] = [y, x % y];
  return x;
}

/** `f` in ticks of 1/`unit` quarter note, or NaN when it is not a whole number of ticks. */
function ticksOf(f: Fraction, unit: number): number {
  const t = (Number(f.s * f.n) * unit) / Number(f.d);
  return Number.isSafeInteger(t) ? t : NaN;
}

/**
 * The written pieces of every slot, counted in integer ticks (a common denominator of all
 * lengths) so that only each piece's onset becomes a Fraction. Null when a length does not fit
 * the ticks; the caller then lays the slots with Fractions throughout.
 */
function piecesByTicks(slots: readonly Slot[], start: Fraction, bar: Fraction): { pieces: Piece[][]; end: Fraction } | null {
  let unit = Number(bar.d) * Number(start.d) / gcd(Number(bar.d), Number(start.d));
  for (const slot of slots) {
    const d = Number(slot.duration.d);
    unit = (unit / gcd(unit, d)) * d;
  }
  if (!Number.isSafeInteger(unit) || unit > 1 << 20) return null;
  const barT = ticksOf(bar, unit);
  const onsets = new Map<number, Fraction>();
  const at = (t: number) => {
    let f = onsets.get(t);
    if (!f) onsets.set(t, (f = new Fraction(t, unit)));
    return f;
  };
  let t = ticksOf(start, unit);
  const out: Piece[][] = [];
  for (const slot of slots) {
    const slotEnd = t + ticksOf(slot.duration, unit);
    const pieces: Piece[] = [];
    let cursor = t;
    while (cursor < slotEnd) {
      const measure = Math.floor(cursor / barT);
      const chunkEnd = Math.min((measure + 1) * barT, slotEnd);
      for (const p of writtenPieces(new Fraction(chunkEnd - cursor, unit), slot.tuplet)) {
        const length = ticksOf(p.duration, unit);
        if (Number.isNaN(length)) return null;
        pieces.push({ onset: at(cursor), duration: p.duration, written: p.written, measure });
        cursor += length;
      }
    }
    out.push(pieces);
    t = slotEnd;
  }
  return { pieces: out, end: at(t) };
}

/** The same pieces with Fractions throughout (any length). */
function piecesExact(slots: readonly Slot[], start: Fraction, bar: Fraction): { pieces: Piece[][]; end: Fraction } {
  let t = start;
  const out: Piece[][] = [];
  for (const slot of slots) {
    const slotEnd = t.add(slot.duration);
    const pieces: Piece[] = [];
    let cursor = t;
    while (cursor.compare(slotEnd) < 0) {
      const measure = cursor.div(bar).floor().valueOf();
      const barEnd = bar.mul(measure + 1);
      const chunkEnd = barEnd.compare(slotEnd) < 0 ? barEnd : slotEnd;
      for (const p of writtenPieces(chunkEnd.sub(cursor), slot.tuplet)) {
        pieces.push({ onset: cursor, duration: p.duration, written: p.written, measure });
        cursor = cursor.add(p.duration);
      }
    }
    out.push(pieces);
    t = slotEnd;
  }
  return { pieces: out, end: t };
}

/** The slot's notes low to high, one per key (a printed finger's note kept over a bare one). */
function oneNotePerKey(notes: readonly SlotNote[]): SlotNote[] {
  const byKey = new Map<number, SlotNote>();
  for (const n of notes) {
    const had = byKey.get(n.pitch.midi);
    if (!had || (!had.source?.fingering?.length && n.source?.fingering?.length)) byKey.set(n.pitch.midi, n);
  }
  return [...byKey.values()].sort((a, b) => a.pitch.midi - b.pitch.midi);
}

/** Lay one hand's slots from `start`, splitting at barlines; returns events and the end time. */
function layHand(
  hand: Hand,
  slots: readonly Slot[],
  start: Fraction,
  bar: Fraction,
): { events: LaidEvent[]; end: Fraction } {
  const { pieces: all, end } = piecesByTicks(slots, start, bar) ?? piecesExact(slots, start, bar);
  const events: LaidEvent[] = [];
  slots.forEach((slot, s) => {
    const pieces = all[s]!;
    // One hand plays a key once: a unison of two voices in one slot is written as one note (the
    // one with a printed finger, if any), never as two noteheads with one finger.
    const sorted = slot.notes.length > 1 ? oneNotePerKey(slot.notes) : slot.notes;
    const extra: { marks?: readonly NoteMark[]; words?: string; dynamic?: string } = {};
    if (slot.marks !== undefined) extra.marks = slot.marks;
    if (slot.words !== undefined) extra.words = slot.words;
    if (slot.dynamic !== undefined) extra.dynamic = slot.dynamic;
    // A chord takes one fermata, accent, word or dynamic (on its first note), as printed music does;
    // a diamond head marks every key pressed silently.
    const diamonds = slot.marks?.filter((m) => m === "diamond") ?? [];
    const rest: typeof extra = diamonds.length ? { marks: diamonds } : {};
    pieces.forEach((p, i) => {
      const { measure } = p;
      const first = i === 0;
      if (first && slot.grace) {
        for (const g of slot.grace) {
          const written = { type: g.source?.written.type ?? "eighth", dots: 0, tuplet: null };
          const fromScore = g.source?.fingering?.length ? g.source.fingering : undefined;
          events.push({
            hand, measure, onset: p.onset, duration: new Fraction(0), written, pitch: g.pitch, chord: false, tie: "none", grace: true,
            ...(g.source ? { source: g.source } : {}),
            ...(fromScore ? { fingering: fromScore, fingeringSource: "score" as const } : {}),
          });
        }
      }
      const tie = pieces.length === 1 ? "none" : first ? "start" : i === pieces.length - 1 ? "stop" : "continue";
      if (sorted.length === 0) {
        events.push({ hand, measure, onset: p.onset, duration: p.duration, written: p.written, pitch: null, chord: false, tie: "none", ...(first ? extra : {}) });
        return;
      }
      sorted.forEach((n, k) => {
        const fromScore = first && n.source?.fingering?.length ? n.source.fingering : undefined;
        const chosen = first && !fromScore && n.fingering?.length ? n.fingering : undefined;
        const e: LaidEvent = {
          hand,
          measure,
          onset: p.onset,
          duration: p.duration,
          written: p.written,
          pitch: n.pitch,
          chord: k > 0,
          tie,
          ...(n.source ? { source: n.source } : {}),
          ...(n.like ? { like: n.like } : {}),
          ...(fromScore ? { fingering: fromScore, fingeringSource: "score" as const } : {}),
          ...(chosen ? { fingering: chosen, fingeringSource: "drill" as const } : {}),
          ...(first ? (k === 0 ? extra : rest) : {}),
        };
        events.push(e);
      });
    });
  });
  return { events, end };
}

/** Rests from `from` to `to`, split at barlines. */
function restsBetween(hand: Hand, from: Fraction, to: Fraction, bar: Fraction): LaidEvent[] {
  if (from.compare(to) >= 0) return [];
  return layHand(hand, [{ duration: to.sub(from), notes: [] }], from, bar).events;
}

/**
 * Lay segments into full bars for the given hands. Each segment starts on a new bar; each hand is
 * completed with rests to the end of the segment's last bar.
 *
 * @example
 * const { events, bars } = laySegments([{ right: [{ duration: new Fraction(3), notes: [] }] }], ["right"], { beats: 4, beatType: 4 });
 * // bars === 1; the right hand has a dotted-half rest and a quarter rest
 */
export function laySegments(
  segments: readonly Segment[],
  hands: readonly Hand[],
  time: TimeSignature,
): { events: LaidEvent[]; bars: number; tempos: Map<number, number> } {
  const bar = barLength(time);
  const events: LaidEvent[] = [];
  const tempos = new Map<number, number>();
  let barIndex = 0;
  for (const seg of segments) {
    const segStart = bar.mul(barIndex);
    const contentStart = segStart.add(seg.lead ?? 0);
    const laid = hands.map((h) => layHand(h, seg[h] ?? [], contentStart, bar));
    const maxEnd = laid.reduce((m, l) => (l.end.compare(m) > 0 ? l.end : m), contentStart);
    let bars = maxEnd.sub(segStart).div(bar).ceil().valueOf();
    if (bars < 1) bars = 1;
    const segEnd = segStart.add(bar.mul(bars));
    hands.forEach((h, i) => {
      events.push(...restsBetween(h, segStart, contentStart, bar));
      events.push(...laid[i].events);
      events.push(...restsBetween(h, laid[i].end, segEnd, bar));
    });
    if (seg.tempo !== undefined) tempos.set(barIndex, seg.tempo);
    barIndex += bars;
  }
  return { events, bars: barIndex, tempos };
}
