/**
 * Beams by beat and tuplet brackets for one voice of one bar (MusicXML `<beam>` and
 * `<tuplet type="start|stop">`).
 */
import Fraction from "fraction.js";
import type { TimeSignature } from "./types";
import { NOTE_TYPES } from "./write-durations";
import type { Slot } from "./write-voices";

/**
 * The span one beam group covers: a dotted quarter in compound meters (6/8, 9/8, 12/8, 3/8),
 * otherwise a quarter (common practice).
 * @example
 *   beamSpan({ beats: 6, beatType: 8 }).toFraction(); // "3/2"
 */
export function beamSpan(time: TimeSignature): Fraction {
  if (time.beatType >= 8 && time.beats % 3 === 0) return new Fraction(3 * 4, time.beatType);
  return new Fraction(1);
}

/** Number of beams a type carries: eighth 1, 16th 2, 32nd 3 …; 0 for a quarter or longer. */
export function beamCount(type: string | null): number {
  if (!type) return 0;
  const i = NOTE_TYPES.findIndex(([name]) => name === type);
  const eighth = NOTE_TYPES.findIndex(([name]) => name === "eighth");
  return i < eighth ? 0 : Math.min(8, i - eighth + 1);
}

/**
 * Sets `slot.beams` for the slots of one voice in one bar: consecutive beamable notes inside
 * one beat share a beam; extra levels (16ths …) begin/continue/end, or hook when alone.
 * @example
 *   assignBeams(slots, measure.start, beamSpan(measure.time));
 */
export function assignBeams(slots: readonly Slot[], barStart: Fraction, span: Fraction): void {
  let group: Slot[] = [];
  let beat = -1;
  const flush = (): void => {
    if (group.length >= 2) beamGroup(group);
    group = [];
  };
  for (const slot of slots) {
    const count = slot.grace || slot.rest ? 0 : beamCount(slot.pieces[0].type);
    if (count === 0) {
      flush();
      continue;
    }
    const b = Math.floor(slot.onset.sub(barStart).div(span).valueOf() + 1e-9);
    const prev = group[group.length - 1];
    if (prev && (b !== beat || !prev.onset.add(prev.advance).equals(slot.onset))) flush();
    beat = b;
    group.push(slot);
  }
  flush();
}

function beamGroup(group: Slot[]): void {
  const counts = group.map((s) => beamCount(s.pieces[0].type));
  const levels = Math.max(...counts);
  for (let level = 1; level <= levels; level++) {
    for (let i = 0; i < group.length; i++) {
      if (counts[i] < level) continue;
      if (level === 1) {
        group[i].beams.push(i === 0 ? "begin" : i === group.length - 1 ? "end" : "continue");
        continue;
      }
      const before = i > 0 && counts[i - 1] >= level;
      const after = i < group.length - 1 && counts[i + 1] >= level;
      group[i].beams.push(
        before && after ? "continue" : before ? "end" : after ? "begin" : i === 0 ? "forward hook" : "backward hook",
      );
    }
  }
}

/**
 * Sets `slot.tuplet` brackets: runs of consecutive notes with the same tuplet ratio, cut each time
 * the run fills `normal` × its shortest written value (three triplet eighths fill one quarter).
 * @example
 *   assignTuplets(slots);
 */
export function assignTuplets(slots: readonly Slot[]): void {
  let i = 0;
  while (i < slots.length) {
    const t = bracketable(slots[i]) ? slots[i].pieces[0].tuplet : null;
    if (!t) {
      i++;
      continue;
    }
    let j = i;
    while (
      j + 1 < slots.length &&
      bracketable(slots[j + 1]) &&
      sameRatio(slots[j + 1].pieces[0].tuplet, t) &&
      slots[j].onset.add(slots[j].advance).equals(slots[j + 1].onset)
    ) {
      j++;
    }
    const run = slots.slice(i, j + 1);
    const shortest = run.reduce((min, s) => {
      const len = NOTE_TYPES.find(([n]) => n === s.pieces[0].type)?.[1];
      return len && (!min || len.lt(min)) ? len : min;
    }, null as Fraction | null);
    const unit = shortest ? shortest.mul(t.normal) : null;
    let start = 0;
    let filled = new Fraction(0);
    const close = (k: number) => {
      run[start].tuplet.push("start");
      run[k].tuplet.push("stop");
      start = k + 1;
      filled = new Fraction(0);
    };
    run.forEach((slot, k) => {
      // The file's own brackets win: a bracket the source started here closes the open group before it.
      const marks = sourceMarks(slot);
      if (marks.includes("start") && k > start) close(k - 1);
      filled = filled.add(slot.advance);
      const full = unit !== null && filled.gte(unit);
      if (marks.includes("stop") || (!marks.length && full && !openInSource(run, start, k)) || k === run.length - 1) close(k);
    });
    i = j + 1;
  }
}

/** A slot that may carry a tuplet bracket: not a grace note, not a two-note tremolo (its ratio is no tuplet). */
function bracketable(slot: Slot): boolean {
  const ev = slot.pieces[0].event;
  return !slot.grace && !(ev.tremolo && (ev.tremolo.type === "start" || ev.tremolo.type === "stop"));
}

/** The source's `<tuplet>` marks on a slot written as one whole note. */
function sourceMarks(slot: Slot): readonly ("start" | "stop")[] {
  const p = slot.pieces[0];
  return p.first && p.last ? (p.event.tuplets ?? []) : [];
}

/** True when the source opened a bracket in this group that it has not closed yet (then its stop decides). */
function openInSource(run: readonly Slot[], start: number, k: number): boolean {
  let open = false;
  for (let x = start; x <= k; x++) {
    const m = sourceMarks(run[x]);
    if (m.includes("start")) open = true;
    if (m.includes("stop")) open = false;
  }
  if (!open) return false;
  // Only trust the open bracket when the source closes it later in this run.
  return run.slice(k + 1).some((s) => sourceMarks(s).includes("stop"));
}

function sameRatio(a: Slot["pieces"][number]["tuplet"], b: { actual: number; normal: number }): boolean {
  return a !== null && a.actual === b.actual && a.normal === b.normal;
}
