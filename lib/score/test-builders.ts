/**
 * Hand-built scores for tests: bars from time signatures, notes from short specs
 * ("C#4", onset and duration in quarter notes).
 */
import Fraction from "fraction.js";
import type { AttributeChange, Clef, KeySignature, Measure, NoteEvent, Pitch, Score, TimeSignature } from "./types";

const STEP_SEMITONES = { C: 0, D: 2, E: 4, F: 5, G: 7, A: 9, B: 11 } as const;

/**
 * A pitch from scientific notation (octave 4 starts at middle C = MIDI 60).
 * @example
 *   pitchOf("C#4"); // { step: "C", alter: 1, octave: 4, midi: 61 }
 */
export function pitchOf(name: string): Pitch {
  const m = /^([A-G])(#{1,2}|b{1,2})?(-?\d+)$/.exec(name);
  if (!m) throw new Error(`bad pitch name ${name}`);
  const step = m[1] as Pitch["step"];
  const alter = !m[2] ? 0 : m[2][0] === "#" ? m[2].length : -m[2].length;
  const octave = Number(m[3]);
  return { step, alter, octave, midi: (octave + 1) * 12 + STEP_SEMITONES[step] + alter };
}

type Time = number | string | Fraction;
const frac = (t: Time): Fraction => (t instanceof Fraction ? t : new Fraction(t));

/** A note (or rest, with pitch null) to place in a test score. */
export interface NoteSpec {
  readonly pitch: string | null;
  readonly onset: Time;
  readonly duration: Time;
  readonly staff?: number;
  readonly voice?: string;
  readonly part?: string;
  readonly extra?: Partial<Omit<NoteEvent, "onset" | "duration" | "pitch">>;
}

export interface ScoreSpec {
  readonly title?: string;
  readonly composer?: string;
  readonly subtitle?: string;
  readonly staves?: number;
  /** One time signature per bar, or one for all bars. */
  readonly time?: TimeSignature | readonly TimeSignature[];
  readonly key?: KeySignature;
  readonly bars: number;
  readonly notes: readonly NoteSpec[];
  /** Extra fields per bar index (tempo, repeat, changes, a shorter pickup length …). */
  readonly barExtras?: Record<number, Partial<Omit<Measure, "index" | "start">>>;
}

const trebleBass = (staves: number): Clef[] =>
  staves >= 2
    ? [{ staff: 1, sign: "G", line: 2 }, { staff: 2, sign: "F", line: 4 }]
    : [{ staff: 1, sign: "G", line: 2 }];

/**
 * A score with one piano part ("P1") built from specs.
 * @example
 *   const score = buildScore({ bars: 1, notes: [{ pitch: "C4", onset: 0, duration: 4 }] });
 */
export function buildScore(spec: ScoreSpec): Score {
  const staves = spec.staves ?? 2;
  const key = spec.key ?? { fifths: 0, mode: "major" };
  const measures: Measure[] = [];
  let start = new Fraction(0);
  for (let i = 0; i < spec.bars; i++) {
    const times = spec.time ?? { beats: 4, beatType: 4 };
    const time = Array.isArray(times) ? times[Math.min(i, times.length - 1)] : (times as TimeSignature);
    const extra = spec.barExtras?.[i] ?? {};
    const length = extra.length ?? new Fraction(time.beats * 4, time.beatType);
    const changes: AttributeChange[] = [...(extra.changes ?? [])];
    measures.push({
      index: i,
      number: String(i + 1),
      implicit: false,
      start,
      length,
      time,
      key,
      clefs: trebleBass(staves),
      divisions: 1,
      ...extra,
      changes,
    });
    start = start.add(length);
  }
  const events: NoteEvent[] = spec.notes.map((n, i) => {
    const onset = frac(n.onset);
    const measure = Math.max(0, measures.findLastIndex((m) => m.start.lte(onset)));
    return {
      id: `n${i}`,
      part: n.part ?? "P1",
      staff: n.staff ?? 1,
      voice: n.voice ?? String(n.staff === 2 ? 5 : 1),
      measure,
      onset,
      duration: frac(n.duration),
      written: { type: null, dots: 0, tuplet: null },
      pitch: n.pitch === null ? null : pitchOf(n.pitch),
      chord: false,
      tie: "none",
      ...n.extra,
    };
  });
  events.sort((a, b) => a.onset.compare(b.onset) || a.staff - b.staff || (a.pitch?.midi ?? 0) - (b.pitch?.midi ?? 0));
  return {
    meta: { title: spec.title ?? "Study in C", composer: spec.composer ?? "A. Teacher", subtitle: spec.subtitle },
    parts: [{ id: "P1", name: "Piano", staves }],
    measures,
    events,
  };
}
