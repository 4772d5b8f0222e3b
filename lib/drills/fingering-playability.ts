/**
 * Playability checks on a hand's fingering (DRILL-RUBRIC §4, common practice of piano teaching):
 * no finger on two different keys in a row inside a legato line, chord fingers in pitch order per hand
 * (rising in the right hand, falling in the left), no finger twice in one chord, and a held note never
 * shares its finger with a note struck while it sounds (a note the hand holds: nothing struck under it is
 * more than an octave away — further off, the pedal holds it). Only faults that involve an estimated finger
 * count — a printed fingering is the editor's choice.
 */
import type { Hand, NoteEvent } from "../score/types";
import { mergeTies } from "../score/ties";

/** Farthest interval (semitones) from a held note to the notes struck under it (as fingering.ts). */
const HOLD_REACH = 12;

export type PlayabilityRule = "same-finger-legato" | "chord-order" | "chord-duplicate" | "held-finger";

export interface PlayabilityFault {
  readonly rule: PlayabilityRule;
  /** 0-based measure index of the later note. */
  readonly measure: number;
  readonly hand: Hand;
  /** The two notes' ids. */
  readonly ids: readonly [string, string];
}

const EPS = 1e-9;

interface Struck {
  readonly e: NoteEvent;
  readonly finger: number;
  readonly estimated: boolean;
  readonly start: number;
  readonly end: number;
}

/**
 * The §4 faults of one hand's fingering. `fingers[i]` is event i's finger (null for rests and tied
 * continuations); `estimated[i]` tells an estimated finger from a printed one.
 *
 * @example
 * playabilityFaults(events, fingers, fingers.map(() => true), "right").length // 0 for a playable line
 */
export function playabilityFaults(events: readonly NoteEvent[], fingers: readonly (number | null)[], estimated: readonly boolean[], hand: Hand): PlayabilityFault[] {
  const fingerOf = new Map<string, { finger: number; estimated: boolean }>();
  events.forEach((e, i) => { if (fingers[i] != null) fingerOf.set(e.id, { finger: fingers[i]!, estimated: estimated[i]! }); });
  // Tied notes merged so a held note lasts its whole sounding length; merged notes keep the first id.
  const notes: Struck[] = [];
  for (const e of mergeTies(events.filter((x) => x.pitch))) {
    const f = fingerOf.get(e.id);
    if (!f) continue;
    const start = e.onset.valueOf();
    notes.push({ e, finger: f.finger, estimated: f.estimated, start, end: start + e.duration.valueOf() });
  }
  notes.sort((a, b) => a.start - b.start || a.e.pitch!.midi - b.e.pitch!.midi);
  const faults: PlayabilityFault[] = [];
  const add = (rule: PlayabilityRule, a: Struck, b: Struck) => {
    if (a.estimated || b.estimated) faults.push({ rule, measure: b.e.measure, hand, ids: [a.e.id, b.e.id] });
  };
  // Group by onset (grace notes alone).
  const groups: Struck[][] = [];
  // A tie continuation whose start is not in these events (it began in the other hand) is held, not struck.
  const continued = notes.filter((n) => n.e.tie === "stop" || n.e.tie === "continue");
  for (const n of notes) {
    if (n.e.tie === "stop" || n.e.tie === "continue") continue;
    const last = groups.at(-1);
    if (last && !n.e.grace && !last[0]!.e.grace && Math.abs(last[0]!.start - n.start) < EPS) last.push(n);
    else groups.push([n]);
  }
  for (const g of groups) {
    for (let i = 0; i < g.length; i++) {
      for (let j = i + 1; j < g.length; j++) {
        const a = g[i]!, b = g[j]!;
        const da = a.e.pitch!.midi, db = b.e.pitch!.midi;
        if (da === db) continue;
        if (a.finger === b.finger) add("chord-duplicate", a, b);
        else if ((db > da) !== (hand === "right" ? b.finger > a.finger : b.finger < a.finger)) add("chord-order", a, b);
      }
    }
  }
  /** A note the hand holds: nothing struck while it sounds is more than an octave away (else the pedal holds it). */
  const held = (a: Struck): boolean => notes.every((b) => b.e.grace || b.start <= a.start + EPS || b.start >= a.end - EPS || Math.abs(b.e.pitch!.midi - a.e.pitch!.midi) <= HOLD_REACH);
  let sounding: Struck[] = [];
  for (let k = 0; k < groups.length; k++) {
    const cur = groups[k]!;
    const t = cur[0]!.start;
    sounding = [...sounding, ...continued.filter((a) => a.start <= t + EPS && a.start > (groups[k - 1]?.[0]?.start ?? -Infinity) + EPS)];
    sounding = sounding.filter((a) => a.end > t + EPS && held(a));
    // Held notes: struck earlier, still sounding when the group is struck.
    for (const a of sounding) {
      if (a.e.grace || a.start >= t - EPS) continue;
      for (const b of cur) if (b.finger === a.finger && b.e.pitch!.midi !== a.e.pitch!.midi) add("held-finger", a, b);
    }
    sounding.push(...cur);
    if (k === 0) continue;
    const prev = groups[k - 1]!;
    // Legato line: one key after one key within an octave, the first lasting exactly until the second is struck.
    if (prev.length === 1 && cur.length === 1) {
      const a = prev[0]!, b = cur[0]!;
      const legato = (a.e.grace || Math.abs(a.end - t) < EPS) && Math.abs(a.e.pitch!.midi - b.e.pitch!.midi) <= HOLD_REACH;
      if (legato && a.finger === b.finger && a.e.pitch!.midi !== b.e.pitch!.midi) add("same-finger-legato", a, b);
    }
  }
  return faults;
}
