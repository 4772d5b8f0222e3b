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
    const partAttributes = parts.length > 1
      ? Object.fromEntries(parts.filter((p) => p.measures[i]).map((p) => [p.id, { clefs: p.measures[i].start.clefs, changes: p.measures[i].changes }]))
      : undefined;
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
      ...(partAttributes ? { partAttributes } : {}),
    });
    start = start.add(length);
  }
  const events: NoteEvent[] = [];
  for (const p of parts) {
    // Events arrive in bar order; number them within their bar, then make onsets absolute in place.
    // Notes of a bar that share an offset (chords, hands) share one onset.
    let bar = -1;
    let k = 0;
    const onsets = new Map<Fraction, Fraction>();
    for (const e of p.events) {
      if (e.measure !== bar) {
        bar = e.measure;
        k = 0;
        onsets.clear();
      }
      k += 1;
      e.id = `${p.id}-${bar}-${k}`;
      let onset = onsets.get(e.onset);
      if (onset === undefined) {
        onset = measures[bar].start.add(e.onset);
        onsets.set(e.onset, onset);
      }
      e.onset = onset;
    }
    sortEvents(p.events, events);
  }
  const partInfos: PartInfo[] = parts.map((p) => ({ id: p.id, name: raw.partNames.get(p.id) ?? "", staves: p.staves }));
  return {
    meta: { title: raw.title || raw.movementTitle, composer: raw.composer },
    parts: partInfos,
    measures,
    events,
  };
}

const SAFE = BigInt(Number.MAX_SAFE_INTEGER);

/**
 * Append one part's events to `out` ordered by onset, then staff, then pitch (rests first); stable
 * otherwise. Grace notes come first at their onset and staff, in written order. Sorts an index array on precomputed keys rather than the events themselves.
 */
function sortEvents(events: readonly NoteEvent[], out: NoteEvent[]): void {
  const n = events.length;
  const t = new Float64Array(n);
  const staff = new Float64Array(n);
  const midi = new Float64Array(n);
  const grace = new Uint8Array(n);
  // A float of n/d with n and d below 2^53 is correctly rounded, so when two such floats differ
  // they order the exact values; otherwise the exact comparison decides.
  const floatExact = new Uint8Array(n);
  const order = new Array<number>(n);
  let sorted = true;
  for (let i = 0; i < n; i++) {
    const e = events[i];
    t[i] = e.onset.valueOf();
    floatExact[i] = e.onset.n <= SAFE && e.onset.d <= SAFE ? 1 : 0;
    staff[i] = e.staff;
    midi[i] = e.pitch?.midi ?? -1;
    grace[i] = e.grace ? 1 : 0;
    order[i] = i;
    if (sorted && i > 0 && compare(i - 1, i) > 0) sorted = false;
  }
  function compare(a: number, b: number): number {
    if (t[a] !== t[b]) {
      if (floatExact[a] & floatExact[b]) return t[a] < t[b] ? -1 : 1;
      const exact = events[a].onset.compare(events[b].onset);
      if (exact !== 0) return exact;
    }
    if (staff[a] !== staff[b]) return staff[a] - staff[b];
    // Grace notes come before the note they lead to, in the order they were written.
    if (grace[a] !== grace[b]) return grace[b] - grace[a];
    if (grace[a]) return a - b;
    return midi[a] !== midi[b] ? midi[a] - midi[b] : a - b;
  }
  if (!sorted) order.sort(compare);
  for (let i = 0; i < n; i++) out.push(events[order[i]]);
}
