/**
 * Turn the raw, per-part reading into the public `Score`: shared bar lengths and starts, absolute
 * onsets, stable ids and the documented event order.
 */
import type Fraction from "fraction.js";
import { barLength, maxTime, ZERO } from "./time";
import type { RawMeasure, RawScore } from "./read-types";
import { warn } from "./read-warnings";
import type { Measure, NoteEvent, PartInfo, Score } from "./types";

/**
 * Assemble the score. Bars are shared by all parts: a bar lasts as long as its longest part, or its
 * time signature when no part wrote anything in it.
 *
 * @example
 * buildScore(parsePartwise(text, DEFAULT_LIMITS)).measures.length;
 */
export function buildScore(raw: RawScore): Score {
  const parts = raw.partOrder.map((id) => raw.parts.get(id)!);
  const count = Math.max(...parts.map((p) => p.measures.length));
  if (parts.some((p) => p.measures.length !== count)) {
    warn(raw, "part-lengths", "Parts have different numbers of measures; the longest one sets the bar count");
  }
  const measures: Measure[] = [];
  let start: Fraction = ZERO;
  for (let i = 0; i < count; i++) {
    const rows = parts.map((p) => p.measures[i]).filter((m): m is RawMeasure => m !== undefined);
    const head = rows[0];
    let length = rows.reduce<Fraction>((l, m) => maxTime(l, m.length), ZERO);
    if (length.valueOf() === 0) length = barLength(head.start.time);
    const tempo = rows.find((m) => m.tempo !== undefined)?.tempo;
    const repeat = rows.find((m) => m.repeat !== undefined)?.repeat;
    measures.push({
      index: i,
      number: head.number,
      implicit: head.implicit,
      start,
      length,
      time: head.start.time,
      key: head.start.key,
      clefs: head.start.clefs,
      divisions: head.divisions,
      changes: head.changes,
      ...(repeat ? { repeat } : {}),
      ...(tempo !== undefined ? { tempo } : {}),
    });
    start = start.add(length);
  }
  const events: NoteEvent[] = [];
  for (const p of parts) {
    const perMeasure = new Map<number, number>();
    const own: NoteEvent[] = [];
    for (const e of p.events) {
      const k = (perMeasure.get(e.measure) ?? 0) + 1;
      perMeasure.set(e.measure, k);
      own.push({
        id: `${p.id}-${e.measure}-${k}`,
        part: e.part,
        staff: e.staff,
        voice: e.voice,
        measure: e.measure,
        onset: measures[e.measure].start.add(e.offset),
        duration: e.duration,
        written: e.written,
        pitch: e.pitch,
        chord: e.chord,
        tie: e.tie,
        ...(e.grace ? { grace: true } : {}),
        ...(e.fingering.length > 0 ? { fingering: e.fingering, fingeringSource: "score" as const } : {}),
        ...(e.marks.length > 0 ? { marks: e.marks } : {}),
        ...(e.dynamic ? { dynamic: e.dynamic } : {}),
        ...(e.words ? { words: e.words } : {}),
      });
    }
    events.push(...sortEvents(own));
  }
  const partInfos: PartInfo[] = parts.map((p) => ({ id: p.id, name: raw.partNames.get(p.id) ?? "", staves: p.staves }));
  return {
    meta: { title: raw.title || raw.movementTitle, composer: raw.composer },
    parts: partInfos,
    measures,
    events,
  };
}

/** Order one part's events by onset, then staff, then pitch (rests first); stable otherwise. */
function sortEvents(events: NoteEvent[]): NoteEvent[] {
  const keyed = events.map((e, i) => ({ e, i, t: e.onset.valueOf() }));
  keyed.sort((a, b) => {
    if (a.t !== b.t) {
      const exact = a.e.onset.compare(b.e.onset);
      if (exact !== 0) return exact;
    }
    if (a.e.staff !== b.e.staff) return a.e.staff - b.e.staff;
    const pa = a.e.pitch?.midi ?? -1;
    const pb = b.e.pitch?.midi ?? -1;
    return pa !== pb ? pa - pb : a.i - b.i;
  });
  return keyed.map((k) => k.e);
}
