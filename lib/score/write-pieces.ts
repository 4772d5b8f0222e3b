/**
 * Cuts a part's events into notated pieces per bar: notes that cross a barline (or whose length no
 * single note value shows) become tied pieces; grace notes stay in the bar they were written in.
 */
import Fraction from "fraction.js";
import type { Measure, NoteEvent, Score } from "./types";
import { noteValues } from "./write-durations";

/** One notated note or rest of the output: a source event, or a tied slice of one. */
export interface Piece {
  readonly event: NoteEvent;
  /** Absolute onset in quarter notes. */
  readonly onset: Fraction;
  readonly duration: Fraction;
  readonly type: string | null;
  readonly dots: number;
  readonly tuplet: { readonly actual: number; readonly normal: number } | null;
  readonly tieStart: boolean;
  readonly tieStop: boolean;
  /** The event's tie starts but its other half is not in the score: written as `<tied type="let-ring">`. */
  readonly letRing?: boolean;
  /** First / last slice of its event (marks and fingering go on these). */
  readonly first: boolean;
  readonly last: boolean;
  /** Position of the source event in score.events, for a stable order. */
  readonly order: number;
}

const minF = (a: Fraction, b: Fraction): Fraction => (a.lte(b) ? a : b);
const measureEnd = (m: Measure): Fraction => m.start.add(m.length);

/** Index of the bar holding time `t` (the last bar whose start ≤ t), or -1 before the first. */
function measureAt(measures: readonly Measure[], t: Fraction): number {
  let lo = 0;
  let hi = measures.length - 1;
  let found = -1;
  while (lo <= hi) {
    const mid = (lo + hi) >> 1;
    if (measures[mid].start.lte(t)) {
      found = mid;
      lo = mid + 1;
    } else hi = mid - 1;
  }
  return found;
}

/**
 * The pieces of one part, grouped by bar index.
 * @example
 *   const byBar = piecesByMeasure(score, "P1"); // byBar[0] = pieces of the first bar
 */
export function piecesByMeasure(score: Score, part: string): Piece[][] {
  const measures = score.measures;
  const out: Piece[][] = measures.map(() => []);
  if (measures.length === 0) return out;
  const end = measureEnd(measures[measures.length - 1]);
  const pairs = tiePartners(score.events, part);
  score.events.forEach((event, order) => {
    if (event.part !== part) return;
    if (event.grace || event.duration.lte(0)) {
      const i = graceMeasure(measures, event);
      if (i >= 0) out[i].push(gracePiece(event, order));
      return;
    }
    const from = event.onset;
    const to = minF(event.onset.add(event.duration), end);
    if (from.gte(end) || to.lte(from)) return;
    const slices: { bar: number; onset: Fraction; duration: Fraction }[] = [];
    let t = from;
    while (t.lt(to)) {
      const bar = Math.max(0, measureAt(measures, t));
      const stop = minF(to, measureEnd(measures[bar]));
      if (stop.lte(t)) break;
      slices.push({ bar, onset: t, duration: stop.sub(t) });
      t = stop;
    }
    const values = slices.flatMap((s) => {
      let at = s.onset;
      return noteValues(s.duration, event.written).map((v) => {
        const item = { bar: s.bar, onset: at, value: v };
        at = at.add(v.duration);
        return item;
      });
    });
    // A tie whose other half is not in this score (a passage's edge) is dropped, never written as half a pair.
    const origStop = (event.tie === "stop" || event.tie === "continue") && pairs.hasStart(event);
    const tiedOn = event.tie === "start" || event.tie === "continue";
    const origStart = tiedOn && pairs.hasStop(event);
    const isNote = event.pitch !== null;
    const letRing = isNote && tiedOn && !origStart;
    values.forEach((v, i) => {
      out[v.bar].push({
        event,
        onset: v.onset,
        duration: v.value.duration,
        type: v.value.type,
        dots: v.value.dots,
        tuplet: v.value.tuplet,
        tieStop: isNote && (i > 0 || origStop),
        tieStart: isNote && (i < values.length - 1 || origStart),
        ...(letRing && i === values.length - 1 ? { letRing: true } : {}),
        first: i === 0,
        last: i === values.length - 1,
        order,
      });
    });
  });
  return out;
}

/** Which tied notes of a part have their other half in the score: same pitch, one ending where the other starts. */
function tiePartners(events: readonly NoteEvent[], part: string): { hasStart(e: NoteEvent): boolean; hasStop(e: NoteEvent): boolean } {
  const starts = new Set<string>();
  const stops = new Set<string>();
  for (const e of events) {
    if (e.part !== part || !e.pitch) continue;
    if (e.tie === "start" || e.tie === "continue") starts.add(`${e.pitch.midi}|${e.onset.add(e.duration).toFraction()}`);
    if (e.tie === "stop" || e.tie === "continue") stops.add(`${e.pitch.midi}|${e.onset.toFraction()}`);
  }
  return {
    hasStart: (e) => !e.pitch || starts.has(`${e.pitch.midi}|${e.onset.toFraction()}`),
    hasStop: (e) => !e.pitch || stops.has(`${e.pitch.midi}|${e.onset.add(e.duration).toFraction()}`),
  };
}

/** The bar of a grace note: its own bar when its onset lies inside or at the end of it. */
function graceMeasure(measures: readonly Measure[], event: NoteEvent): number {
  const own = measures[event.measure];
  if (own && own.start.lte(event.onset) && event.onset.lte(measureEnd(own))) return event.measure;
  return measureAt(measures, event.onset);
}

function gracePiece(event: NoteEvent, order: number): Piece {
  const origStop = event.tie === "stop" || event.tie === "continue";
  const origStart = event.tie === "start" || event.tie === "continue";
  return {
    event,
    onset: event.onset,
    duration: new Fraction(0),
    type: event.written.type ?? "eighth",
    dots: event.written.dots,
    tuplet: null,
    tieStop: event.pitch !== null && origStop,
    tieStart: event.pitch !== null && origStart,
    first: true,
    last: true,
    order,
  };
}
