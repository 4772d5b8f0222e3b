/**
 * Shared drill assembly for every family: lay the content into full bars, put the right hand on
 * staff 1 and the left on staff 2 (one staff for a one-hand drill), choose clefs by range, keep the
 * score's fingerings, add estimated ones, measure the span per hand and collect warnings.
 */
import Fraction from "fraction.js";
import type { Clef, Hand, Measure, NoteEvent, Passage, Score, Sonority, TimeSignature } from "../score/types";
import type { Drill, DrillContext, DrillWarning, HandProfile, SpanReport } from "./types";
import { barLength, laySegments, type LaidEvent, type Segment, type Slot, type SlotNote } from "./layout";
import { countOf } from "./length";
import { beatUnit, inBeats } from "./meter";
import { mulberry32 } from "./rng";
import { repairWithReport } from "./finger-repair";
import { estimatedFingers, measureSpan, newFingeringMemo, PROFILE, type FingeringMemo } from "./span";

export { barLength, writtenPieces, laySegments } from "./layout";
export type { Segment, Slot, SlotNote } from "./layout";

/** Lowest and highest piano keys: A0 = MIDI 21, C8 = MIDI 108 (FACTS.md §1). */
export const PIANO_RANGE = { low: 21, high: 108 } as const;

/** What a family hands to `buildDrill`. */
export interface DrillSpec {
  readonly family: string;
  readonly variant: string;
  readonly title: string;
  readonly teacherNote: string;
  readonly studentNote: string;
  readonly segments: readonly Segment[];
  /** Hands written; defaults to the passage's hand. */
  readonly hands?: Hand | "both";
  readonly tempo?: { readonly start: number; readonly target: number };
  readonly warnings?: readonly DrillWarning[];
  /** Time signature of the drill; defaults to the passage's. */
  readonly time?: TimeSignature;
  /** The segments' right and left lines are two voices of this one hand (fingered as one hand). */
  readonly oneHand?: Hand;
}

/**
 * A drill context with defaults: the standard profile, seed 1, safety on.
 *
 * @example
 * const ctx = makeContext({ seed: 7 });
 */
export function makeContext(
  o: { profile?: HandProfile; seed?: number; safety?: boolean; fingeringMemo?: FingeringMemo; maxBars?: number } = {},
): DrillContext {
  return {
    profile: o.profile ?? PROFILE,
    rng: mulberry32(o.seed ?? 1),
    safety: o.safety ?? true,
    fingeringMemo: o.fingeringMemo ?? newFingeringMemo(),
    ...(o.maxBars !== undefined ? { maxBars: o.maxBars } : {}),
  };
}

/**
 * Default tempi from the score: the target is the passage's metronome mark (80 when none, common
 * practice) and practice starts at 60 % of it (common practice).
 *
 * @example
 * defaultTempo(passage); // { start: 48, target: 80 } when the passage has no mark
 */
export function defaultTempo(passage: Passage): { start: number; target: number } {
  const target = passage.measures.find((m) => m.tempo !== undefined)?.tempo ?? 80;
  return { start: Math.max(20, Math.round(target * 0.6)), target };
}

/**
 * Quarter-note tempi with the same marks in the meter's beat added when the beat is not a quarter.
 *
 * @example
 * withBeat({ start: 54, target: 90 }, { beats: 6, beatType: 8 }).beat; // { symbol: "♩.", start: 36, target: 60 }
 */
export function withBeat(t: { start: number; target: number }, time: TimeSignature): Drill["tempo"] {
  const unit = beatUnit(time);
  if (unit.type === "quarter" && unit.dots === 0) return { start: t.start, target: t.target };
  return { start: t.start, target: t.target, beat: { symbol: unit.symbol, start: inBeats(t.start, time), target: inBeats(t.target, time) } };
}

/**
 * A slot that plays a passage sonority as written (its notes keep their fingering).
 *
 * @example
 * passage.sonorities.right.map((s) => sonoritySlot(s));
 */
export function sonoritySlot(s: Sonority, duration: Fraction = s.duration, extra: Partial<Slot> = {}): Slot {
  return { duration, notes: s.notes.map(noteOf), ...extra };
}

/**
 * A slot note from a passage note (pitch plus source, so its fingering travels with it).
 *
 * @example
 * noteOf(passage.events[0]).pitch;
 */
export function noteOf(e: NoteEvent): SlotNote {
  if (!e.pitch) throw new RangeError(`event ${e.id} is a rest`);
  return { pitch: e.pitch, source: e };
}

/**
 * A rest slot.
 *
 * @example
 * restSlot(new Fraction(1, 2)); // an eighth rest
 */
export function restSlot(duration: Fraction, tuplet?: Slot["tuplet"]): Slot {
  return { duration, notes: [], ...(tuplet ? { tuplet } : {}) };
}

/**
 * One hand of the passage as written, as slots from the passage's first bar to its end: rests
 * fill the gaps, and a note held past the next onset is shortened to it (one line per hand).
 * `map` may change each sonority's slot (marks, rhythm) given its index and written length.
 *
 * @example
 * const slots = passageSlots(passage, "right", (s, i, slot) => (i === 0 ? { ...slot, marks: ["accent"] } : slot));
 */
export function passageSlots(
  passage: Passage,
  hand: Hand,
  map: (s: Sonority, i: number, slot: Slot) => Slot | readonly Slot[] = (_s, _i, slot) => slot,
  sonorities: readonly Sonority[] = passage.sonorities[hand],
  range: { from: Fraction; to: Fraction } = passageRange(passage),
): Slot[] {
  const out: Slot[] = [];
  let t = range.from;
  sonorities.forEach((s, i) => {
    if (s.onset.compare(t) > 0) out.push(restSlot(s.onset.sub(t)));
    const next = sonorities[i + 1]?.onset ?? range.to;
    const end = s.onset.add(s.duration);
    const stop = end.compare(next) > 0 ? next : end;
    const duration = stop.sub(s.onset);
    // The tuplet of the note that lasts exactly this long (a tuplet voice under a held note), else the first note's.
    const tuplet = (s.notes.find((n) => n.written.tuplet && n.duration.equals(duration)) ?? s.notes[0])?.written.tuplet ?? undefined;
    const slot: Slot = { duration, notes: s.notes.map(noteOf), ...(tuplet ? { tuplet } : {}) };
    const mapped = map(s, i, slot);
    out.push(...(Array.isArray(mapped) ? (mapped as Slot[]) : [mapped as Slot]));
    t = s.onset.add(slot.duration);
  });
  if (range.to.compare(t) > 0) out.push(restSlot(range.to.sub(t)));
  return out;
}

/**
 * Start and end of the passage in quarter notes.
 *
 * @example
 * passageRange(passage).to.sub(passageRange(passage).from).toFraction(); // "8" for two 4/4 bars
 */
export function passageRange(passage: Passage): { from: Fraction; to: Fraction } {
  const first = passage.measures[0];
  const last = passage.measures[passage.measures.length - 1];
  return { from: first ? first.start : new Fraction(0), to: last ? last.start.add(last.length) : new Fraction(0) };
}

/** The hands of a passage, right first. */
export function passageHands(passage: Passage): Hand[] {
  return passage.hand === "both" ? ["right", "left"] : [passage.hand];
}

/**
 * The offset of the passage's first note from its bar's start (keeps a pickup's place in the bar).
 *
 * @example
 * leadOf(passage).toFraction(); // "3" for a one-beat pickup in 4/4
 */
export function leadOf(passage: Passage): Fraction {
  const first = passage.measures[0];
  if (!first) return new Fraction(0);
  const bar = barLength(passage.time);
  const missing = bar.sub(first.length);
  return missing.compare(0) > 0 && missing.compare(bar) < 0 ? missing : new Fraction(0);
}

function clefFor(hand: Hand, staff: number, events: readonly LaidEvent[]): Clef {
  let sum = 0;
  let count = 0;
  for (const e of events) if (e.hand === hand && e.pitch) { sum += e.pitch.midi; count++; }
  const mean = count ? sum / count : hand === "right" ? 67 : 50;
  const treble = hand === "right" ? mean >= 55 : mean > 65;
  return treble ? { staff, sign: "G", line: 2 } : { staff, sign: "F", line: 4 };
}

function gcd(x: number, y: number): number {
  while (y !== 0) [x, y] = [y, x % y];
  return x;
}

/** Least common multiple of every onset and duration denominator: the MusicXML divisions. */
function divisionsOf(events: readonly LaidEvent[]): number {
  const seen = new Set<number>();
  let divisions = 1;
  for (const e of events) {
    for (const d of [Number(e.onset.d), Number(e.duration.d)]) {
      if (seen.has(d)) continue;
      seen.add(d);
      divisions = (divisions / gcd(divisions, d)) * d;
    }
  }
  return divisions;
}

/** A laid event as a score event on its staff (one voice per staff), with its estimated finger if any. */
function toEvent(l: LaidEvent, id: string, staff: number, estimated: number | null): NoteEvent {
  const e: { -readonly [K in keyof NoteEvent]: NoteEvent[K] } = {
    measure: l.measure, onset: l.onset, duration: l.duration, written: l.written, pitch: l.pitch, chord: l.chord, tie: l.tie,
    id, part: "P1", staff, voice: String(staff),
  };
  if (l.grace !== undefined) e.grace = l.grace;
  if (l.fingering !== undefined) e.fingering = l.fingering;
  if (l.fingeringSource !== undefined) e.fingeringSource = l.fingeringSource;
  if (estimated !== null) {
    e.fingering = [{ finger: estimated }];
    e.fingeringSource = "estimated";
  }
  if (l.marks !== undefined) e.marks = l.marks;
  if (l.dynamic !== undefined) e.dynamic = l.dynamic;
  if (l.words !== undefined) e.words = l.words;
  return e;
}

/**
 * Laid bars without the whole bars of rests before the first note (a pickup bar that holds only a
 * rest in this hand): the drill starts with music, its later bars and metronome marks moved up.
 */
function dropEmptyOpening(
  laid: { events: LaidEvent[]; bars: number; tempos: Map<number, number> },
  bar: Fraction,
): { events: LaidEvent[]; bars: number; tempos: Map<number, number> } {
  let first = Infinity;
  for (const e of laid.events) if (e.pitch && e.measure < first) first = e.measure;
  if (!Number.isFinite(first) || first === 0) return laid;
  const shift = bar.mul(first);
  const events = laid.events.filter((e) => e.measure >= first).map((e) => ({ ...e, measure: e.measure - first, onset: e.onset.sub(shift) }));
  const tempos = new Map<number, number>();
  for (const [i, t] of [...laid.tempos].sort((a, b) => a[0] - b[0])) tempos.set(Math.max(0, i - first), t);
  return { events, bars: laid.bars - first, tempos };
}

/**
 * Build a complete drill: full bars, staves, clefs, fingering, span and warnings.
 *
 * @example
 * const drill = buildDrill(passage, { family: "blocking", variant: "block", title: "Blocked", teacherNote: "…", studentNote: "…", segments: [{ right: slots }] }, makeContext());
 */
export function buildDrill(passage: Passage, spec: DrillSpec, ctx: DrillContext): Drill {
  const hands: Hand[] = spec.hands ? (spec.hands === "both" ? ["right", "left"] : [spec.hands]) : passageHands(passage);
  const time = spec.time ?? passage.time;
  const bar = barLength(time);
  const { events: laid, bars, tempos } = dropEmptyOpening(laySegments(spec.segments, hands, time), bar);
  const staffOf = (h: Hand) => (hands.length === 2 && h === "left" ? 2 : 1);
  const clefs = hands.map((h) => clefFor(h, staffOf(h), laid));

  const divisions = divisionsOf(laid);

  const measures: Measure[] = Array.from({ length: bars }, (_, i) => ({
    index: i,
    number: String(i + 1),
    implicit: false,
    start: bar.mul(i),
    length: bar,
    time,
    key: passage.key,
    clefs,
    divisions,
    changes: [],
    ...(tempos.has(i) ? { tempo: tempos.get(i) } : {}),
  }));

  // Sort by onset, staff, then pitch (the sort is stable). Onsets are compared as numbers: drill
  // onsets have small denominators, so two different onsets never round to the same double.
  const onsetKey = Float64Array.from(laid, (e) => e.onset.valueOf());
  const staffKey = Int8Array.from(laid, (e) => staffOf(e.hand));
  const pitchKey = Int16Array.from(laid, (e) => e.pitch?.midi ?? -1);
  // Grace notes come before the note they ornament, in the order written.
  const graceKey = Int8Array.from(laid, (e) => (e.grace ? 0 : 1));
  const order = Array.from(laid, (_, i) => i).sort(
    (a, b) => onsetKey[a]! - onsetKey[b]! || staffKey[a]! - staffKey[b]! || graceKey[a]! - graceKey[b]! || (graceKey[a] ? pitchKey[a]! - pitchKey[b]! : 0),
  );
  const ordered = order.map((i) => laid[i]!);
  const memo = ctx.fingeringMemo ?? newFingeringMemo();
  // Laid events carry every field the fingering estimate reads (pitch, onset, tie, measure, fingering).
  const playedBy = (h: Hand): Hand => spec.oneHand ?? h;
  const fingers = estimatedFingers(ordered as unknown as NoteEvent[], (i) => playedBy(ordered[i]!.hand), {
    passage, sources: ordered.map((e) => e.source), likes: ordered.map((e) => e.like), memo,
  });
  const handOfStaff = new Map(hands.map((h) => [staffOf(h), playedBy(h)]));
  const { events, unsettled } = repairWithReport(
    ordered.map((l, i) => toEvent(l, `e${i + 1}`, staffOf(l.hand), fingers[i] ?? null)),
    (e) => handOfStaff.get(e.staff) ?? "right",
  );

  const warnings: DrillWarning[] = [...(spec.warnings ?? [])];
  if (unsettled > 0) {
    warnings.push({ code: "fingering", message: "Some notes cannot be fingered in order with the printed fingering; check the fingering before handing this out." });
  }
  const outOfRange = events.filter((e) => e.pitch && (e.pitch.midi < PIANO_RANGE.low || e.pitch.midi > PIANO_RANGE.high));
  if (outOfRange.length) {
    warnings.push({ code: "range", message: `${countOf(outOfRange.length, "note")} ${outOfRange.length === 1 ? "falls" : "fall"} outside the keyboard (A0–C8).` });
  }
  const maxSpan: { right?: SpanReport; left?: SpanReport } = {};
  for (const h of hands) {
    const report = measureSpan(events.filter((e) => e.staff === staffOf(h)), ctx.profile);
    if (!report) continue;
    maxSpan[h] = report;
    if (report.overComfortable) {
      warnings.push({
        code: "span",
        message: `The ${h} hand needs ${report.semitones} semitones (${Math.round(report.mm)} mm), more than its comfortable span.`,
      });
    }
  }

  const fingeringSource: Record<string, "score" | "estimated" | "drill" | "none"> = {};
  for (const e of events) if (e.pitch) fingeringSource[e.id] = e.fingeringSource ?? "none";

  const score: Score = {
    meta: { title: spec.title, composer: "", subtitle: spec.studentNote },
    parts: [{ id: "P1", name: "Piano", staves: hands.length }],
    measures,
    events,
  };
  return {
    family: spec.family,
    variant: spec.variant,
    title: spec.title,
    teacherNote: spec.teacherNote,
    studentNote: spec.studentNote,
    hands: hands.length === 2 ? "both" : hands[0],
    score,
    tempo: withBeat(spec.tempo ?? defaultTempo(passage), time),
    maxSpan,
    warnings,
    fingeringSource,
  };
}
