/**
 * The score as a performance: sounding notes with start and length in seconds, MIDI pitch and
 * velocity, plus metronome clicks — what playback and the MIDI writer need.
 */
import Fraction from "fraction.js";
import { mergeTies } from "./ties";
import type { Measure, NoteEvent, Score } from "./types";

/** One sounding note (tied notes merged into one). */
export interface PerformedNote {
  readonly midi: number;
  /** Start in seconds from the start of the score. */
  readonly start: number;
  readonly duration: number;
  /** MIDI velocity 1–127. */
  readonly velocity: number;
  readonly part: string;
  readonly staff: number;
  /** Start and length in quarter notes (grace notes: their placed time). */
  readonly startQuarters: number;
  readonly quarters: number;
  /** Ids of the written events this note merges. */
  readonly eventIds: readonly string[];
}

/** One metronome click. */
export interface Click {
  readonly time: number;
  /** First beat of a bar (the accented click). */
  readonly barStart: boolean;
  readonly measure: number;
}

export interface Performance {
  readonly notes: readonly PerformedNote[];
  /** Quarter-note tempo at the start (the override, the first metronome mark, or 120). */
  readonly bpm: number;
  readonly durationSeconds: number;
  readonly beats: readonly Click[];
  /** Tempo changes in quarter notes → bpm (one entry when `bpm` overrides). */
  readonly tempos: readonly { readonly quarters: number; readonly bpm: number }[];
}

export interface PerformanceOptions {
  /** Quarter-note beats per minute for the whole score; overrides the score's metronome marks. */
  readonly bpm?: number;
  /** Straight eighths only (swing is not supported). */
  readonly swing?: false;
  /** Metronome clicks too (default true); playback that needs only the notes passes false. */
  readonly clicks?: boolean;
}

/** Most clicks ever made for one score, whatever its bars say (lib/score/limits.ts refuses more at upload). */
export const MAX_CLICKS = 200_000;

/** Tempo without any mark: 120 quarter notes a minute, the Standard MIDI File default (500,000 µs per quarter). */
export const DEFAULT_BPM = 120;

/**
 * Length of each grace note: a 32nd note (1/8 quarter), placed just before the main note so the
 * main note stays on its beat; several grace notes before one note follow each other in that time
 * (common practice for playback; a grace chord sounds together).
 */
export const GRACE_QUARTERS = 1 / 8;

/** Dynamic → MIDI velocity (common practice; mf when nothing is written). */
export const VELOCITY: Readonly<Record<string, number>> = {
  pppp: 8, ppp: 20, pp: 33, p: 49, mp: 64, mf: 80, f: 96, ff: 112, fff: 120, ffff: 127,
};
const ACCENTED_DYNAMICS: Readonly<Record<string, number>> = { sf: 112, sfz: 112, fz: 112, sffz: 120, rf: 104, rfz: 104, fp: 96, sfp: 112 };
const AFTER_ACCENT: Readonly<Record<string, string>> = { fp: "p", sfp: "p" };
const ACCENT_BOOST = 16;
const GRACE_SOFTER = 8;

/**
 * The score as timed notes and clicks. Onset in seconds = onset in quarters × 60 / bpm at a
 * constant tempo; with metronome marks each bar's mark holds until the next one.
 * @example
 *   const perf = toPerformance(score, { bpm: 60 });
 *   perf.notes[0].start; // 0 — and a note at quarter 2 starts at 2 s
 */
export function toPerformance(score: Score, options: PerformanceOptions = {}): Performance {
  const tempos = tempoMap(score.measures, options.bpm);
  const seconds = secondsAt(tempos);
  const notes: PerformedNote[] = [];
  const groups = new Map<string, NoteEvent[]>();
  for (const e of score.events) {
    const key = `${e.part}|${e.staff}`;
    const group = groups.get(key);
    if (group) group.push(e);
    else groups.set(key, [e]);
  }
  for (const events of groups.values()) notes.push(...staffNotes(events, seconds));
  notes.sort((a, b) => a.start - b.start || a.staff - b.staff || a.midi - b.midi);
  const end = score.measures.length > 0 ? score.measures[score.measures.length - 1] : null;
  const endQuarters = end ? end.start.add(end.length).valueOf() : 0;
  const durationSeconds = notes.reduce((max, n) => Math.max(max, n.start + n.duration), seconds(endQuarters));
  const beats = options.clicks === false ? [] : clicks(score.measures, seconds);
  return { notes, bpm: tempos[0].bpm, durationSeconds, beats, tempos };
}

function tempoMap(measures: readonly Measure[], override?: number): { quarters: number; bpm: number }[] {
  if (override !== undefined) {
    if (!(override > 0)) throw new RangeError(`bpm must be positive, got ${override}`);
    return [{ quarters: 0, bpm: override }];
  }
  const marks = measures.filter((m) => m.tempo && m.tempo > 0);
  const map = marks.map((m) => ({ quarters: m.start.valueOf(), bpm: m.tempo! }));
  if (map.length === 0 || map[0].quarters > 0) map.unshift({ quarters: 0, bpm: map[0]?.bpm ?? DEFAULT_BPM });
  return map;
}

/** Quarter-note position → seconds through a piecewise-constant tempo map. */
function secondsAt(tempos: readonly { quarters: number; bpm: number }[]): (q: number) => number {
  return (q) => {
    let t = 0;
    for (let i = 0; i < tempos.length; i++) {
      const from = tempos[i].quarters;
      const to = i + 1 < tempos.length ? tempos[i + 1].quarters : Infinity;
      if (q <= from) break;
      t += ((Math.min(q, to) - from) * 60) / tempos[i].bpm;
    }
    return t;
  };
}

function staffNotes(events: readonly NoteEvent[], seconds: (q: number) => number): PerformedNote[] {
  const ordered = [...events].sort((a, b) => a.onset.compare(b.onset));
  const merged = mergeTies(ordered);
  const ids = tieChains(ordered, merged);
  const out: PerformedNote[] = [];
  let level = VELOCITY.mf;
  for (const e of merged) {
    let velocity = level;
    if (e.dynamic) {
      const d = e.dynamic.trim();
      if (VELOCITY[d] !== undefined) velocity = level = VELOCITY[d];
      else if (ACCENTED_DYNAMICS[d] !== undefined) {
        velocity = ACCENTED_DYNAMICS[d];
        if (AFTER_ACCENT[d]) level = VELOCITY[AFTER_ACCENT[d]];
      }
    }
    if (!e.pitch) continue;
    if (e.marks?.includes("accent")) velocity += ACCENT_BOOST;
    velocity = Math.max(1, Math.min(127, Math.round(velocity)));
    if (e.grace || e.duration.lte(0)) {
      const steps = graceTotal(merged, e.onset);
      const start = Math.max(0, e.onset.valueOf() - (steps - graceCount(merged, e)) * GRACE_QUARTERS);
      out.push(note(e, start, GRACE_QUARTERS, Math.max(1, velocity - GRACE_SOFTER), seconds, [e.id]));
      continue;
    }
    const startQ = e.onset.valueOf() + rollOffset(merged, e);
    const chain = ids.get(e.id) ?? [e.id];
    if (e.tremolo) {
      for (const [at, len] of tremoloStrokes(e)) out.push(note(e, at, len, velocity, seconds, chain));
      continue;
    }
    out.push(note(e, startQ, e.onset.valueOf() + e.duration.valueOf() - startQ, velocity, seconds, chain));
  }
  return out;
}

/** Most strokes one tremolo note plays (a longer tremolo plays slower strokes). */
export const MAX_TREMOLO_STROKES = 64;
/** Delay between the notes of a rolled (arpeggiated) chord, in quarter notes (common practice, from memory). */
export const ROLL_QUARTERS = 1 / 16;

/**
 * The strokes a tremolo note plays, as [start, length] in quarter notes. A stroke lasts 1/2^marks of a
 * quarter (1 stroke mark = eighths, 2 = sixteenths, 3 = 32nds). A single-note tremolo repeats its note;
 * in a two-note tremolo the first note ("start") plays the even strokes of the pair's whole span and
 * the second ("stop") the odd ones.
 */
function tremoloStrokes(e: NoteEvent): [number, number][] {
  const t = e.tremolo!;
  const dur = e.duration.valueOf();
  const pair = t.type === "start" || t.type === "stop";
  const span = pair ? 2 * dur : dur;
  let stroke = 1 / 2 ** Math.max(1, Math.min(t.type === "unmeasured" ? 3 : t.marks || 3, 8));
  while (span / stroke > MAX_TREMOLO_STROKES) stroke *= 2;
  const from = t.type === "stop" ? e.onset.valueOf() - dur : e.onset.valueOf();
  const count = Math.max(1, Math.round(span / stroke));
  const out: [number, number][] = [];
  for (let k = 0; k < count; k++) {
    if (pair && (k % 2 === 1) !== (t.type === "stop")) continue;
    out.push([from + k * stroke, stroke]);
  }
  if (out.length === 0) out.push([e.onset.valueOf(), dur]);
  return out;
}

/** How late an arpeggiated chord note starts: one roll step per lower note of its chord (upper first for "down"). */
function rollOffset(events: readonly NoteEvent[], e: NoteEvent): number {
  if (!e.arpeggio || e.arpeggio === "non-arpeggiate" || !e.pitch) return 0;
  const chord = events.filter((x) => x.pitch && !x.grace && x.arpeggio && x.arpeggio !== "non-arpeggiate" && x.onset.equals(e.onset) && x.voice === e.voice);
  const below = chord.filter((x) => x.pitch!.midi < e.pitch!.midi).length;
  const step = Math.min(ROLL_QUARTERS, e.duration.valueOf() / (chord.length + 1));
  return (e.arpeggio === "down" ? chord.length - 1 - below : below) * step;
}

/** The grace step `e` belongs to (0 = first), counting non-chord grace notes at its onset. */
function graceCount(events: readonly NoteEvent[], e: NoteEvent): number {
  let n = 0;
  for (const x of events) {
    if (x === e) break;
    if ((x.grace || x.duration.lte(0)) && x.onset.equals(e.onset) && !x.chord) n++;
  }
  return e.chord ? Math.max(0, n - 1) : n;
}

/** Number of grace-note steps (chords count once) before the main note at `onset`. */
function graceTotal(events: readonly NoteEvent[], onset: Fraction): number {
  return events.filter((x) => (x.grace || x.duration.lte(0)) && x.onset.equals(onset) && !x.chord).length;
}

function note(e: NoteEvent, startQ: number, lengthQ: number, velocity: number, seconds: (q: number) => number, eventIds: string[]): PerformedNote {
  const start = seconds(startQ);
  return {
    midi: e.pitch!.midi,
    start,
    duration: seconds(startQ + lengthQ) - start,
    velocity,
    part: e.part,
    staff: e.staff,
    startQuarters: startQ,
    quarters: lengthQ,
    eventIds,
  };
}

/** Merged note id → ids of every written event its tie chain covers. */
function tieChains(written: readonly NoteEvent[], merged: readonly NoteEvent[]): Map<string, string[]> {
  const out = new Map<string, string[]>();
  // Candidates by pitch and voice, so each chain looks only at its own notes.
  const byKey = new Map<string, NoteEvent[]>();
  for (const w of written) {
    if (!w.pitch || w.grace) continue;
    const k = `${w.pitch.midi}|${w.voice}`;
    const list = byKey.get(k);
    if (list) list.push(w);
    else byKey.set(k, [w]);
  }
  for (const m of merged) {
    if (!m.pitch || m.grace) continue;
    const end = m.onset.add(m.duration);
    const members = (byKey.get(`${m.pitch.midi}|${m.voice}`) ?? []).filter(
      (w) => w.pitch?.midi === m.pitch!.midi && !w.grace && w.voice === m.voice && w.onset.gte(m.onset) && w.onset.lt(end) && (w.id === m.id || w.tie === "stop" || w.tie === "continue"),
    );
    out.set(m.id, members.map((w) => w.id));
  }
  return out;
}

/** Clicks: the beats of every bar (dotted quarters in 6/8, 9/8, 12/8; else the time signature's unit). */
function clicks(measures: readonly Measure[], seconds: (q: number) => number): Click[] {
  const out: Click[] = [];
  for (const m of measures) {
    const compound = m.time.beatType >= 8 && m.time.beats % 3 === 0 && m.time.beats > 3;
    const beat = new Fraction(compound ? 12 : 4, m.time.beatType);
    for (let t = new Fraction(0); t.lt(m.length); t = t.add(beat)) {
      if (out.length >= MAX_CLICKS) return out;
      out.push({ time: seconds(m.start.add(t).valueOf()), barStart: t.equals(0), measure: m.index });
    }
  }
  return out;
}
