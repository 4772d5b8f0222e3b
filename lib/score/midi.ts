/**
 * The score as a Standard MIDI File: format 1, 480 ticks per quarter, a conductor track with
 * tempo and time-signature meta events, then one track per hand (staff).
 */
import { writeMidi as encodeMidi, type MidiData, type MidiEvent } from "midi-file";
import { toPerformance, type PerformedNote } from "./performance";
import type { Score } from "./types";

/** Ticks per quarter note in the files written. */
export const TICKS_PER_QUARTER = 480;

export interface MidiOptions {
  /** Quarter-note bpm for the whole file; overrides the score's metronome marks. */
  readonly bpm?: number;
}

type Timed = { tick: number; order: number; event: MidiEvent };

/**
 * Microseconds per quarter note for a tempo (Standard MIDI File `Set Tempo`: 60,000,000 / bpm).
 * @example
 *   microsecondsPerQuarter(120); // 500000
 */
export function microsecondsPerQuarter(bpm: number): number {
  return Math.round(60_000_000 / bpm);
}

/** Track name of a staff: staff 1 is the right hand, staff 2 the left. */
function handName(staff: number): string {
  return staff === 1 ? "Right hand" : staff === 2 ? "Left hand" : `Staff ${staff}`;
}

/**
 * Writes the score as a Standard MIDI File (tied notes merged, grace notes just before their note).
 * @example
 *   const bytes = writeMidi(score, { bpm: 90 }); // "MThd" … format 1, 480 ticks per quarter
 */
export function writeMidi(score: Score, options: MidiOptions = {}): Uint8Array {
  const perf = toPerformance(score, { bpm: options.bpm });
  const conductor: Timed[] = [{ tick: 0, order: 0, event: { deltaTime: 0, meta: true, type: "trackName", text: score.meta.title || "Knotwork" } }];
  for (const t of perf.tempos) {
    conductor.push({ tick: ticks(t.quarters), order: 1, event: { deltaTime: 0, meta: true, type: "setTempo", microsecondsPerBeat: microsecondsPerQuarter(t.bpm) } });
  }
  let prev: string | null = null;
  for (const m of score.measures) {
    const times = [{ at: m.start, time: m.time }, ...m.changes.filter((c) => c.time && c.offset.gt(0)).map((c) => ({ at: m.start.add(c.offset), time: c.time! }))];
    for (const { at, time } of times) {
      const key = `${time.beats}/${time.beatType}`;
      if (key === prev) continue;
      prev = key;
      conductor.push({
        tick: ticks(at.valueOf()),
        order: 2,
        event: { deltaTime: 0, meta: true, type: "timeSignature", numerator: time.beats, denominator: time.beatType, metronome: 24, thirtyseconds: 8 },
      });
    }
  }

  const tracks: Timed[][] = [conductor];
  const multiPart = score.parts.length > 1;
  let channel = 0;
  for (const part of score.parts) {
    const staves = Math.max(part.staves, ...perf.notes.filter((n) => n.part === part.id).map((n) => n.staff));
    for (let staff = 1; staff <= staves; staff++) {
      const name = multiPart ? `${part.name} – ${handName(staff)}` : handName(staff);
      const notes = perf.notes.filter((n) => n.part === part.id && n.staff === staff);
      tracks.push(noteTrack(name, notes, channel));
      channel = channel === 8 ? 10 : (channel + 1) % 16; // channel 10 (index 9) is percussion
    }
  }
  const data: MidiData = {
    header: { format: 1, numTracks: tracks.length, ticksPerBeat: TICKS_PER_QUARTER },
    tracks: tracks.map(toDeltas),
  };
  return Uint8Array.from(encodeMidi(data));
}

function ticks(quarters: number): number {
  return Math.round(quarters * TICKS_PER_QUARTER);
}

function noteTrack(name: string, notes: readonly PerformedNote[], channel: number): Timed[] {
  const out: Timed[] = [{ tick: 0, order: 0, event: { deltaTime: 0, meta: true, type: "trackName", text: name } }];
  out.push({ tick: 0, order: 1, event: { deltaTime: 0, type: "programChange", channel, programNumber: 0 } });
  for (const n of notes) {
    const on = ticks(n.startQuarters);
    const off = Math.max(on + 1, ticks(n.startQuarters + n.quarters));
    // At the same tick, note-offs come before note-ons so a repeated key sounds again.
    out.push({ tick: on, order: 3, event: { deltaTime: 0, type: "noteOn", channel, noteNumber: n.midi, velocity: n.velocity } });
    out.push({ tick: off, order: 2, event: { deltaTime: 0, type: "noteOff", channel, noteNumber: n.midi, velocity: 0 } });
  }
  return out;
}

function toDeltas(track: Timed[]): MidiEvent[] {
  const sorted = [...track].sort((a, b) => a.tick - b.tick || a.order - b.order);
  let last = 0;
  const events = sorted.map((t) => {
    const e = { ...t.event, deltaTime: t.tick - last } as MidiEvent;
    last = t.tick;
    return e;
  });
  events.push({ deltaTime: 0, meta: true, type: "endOfTrack" });
  return events;
}
