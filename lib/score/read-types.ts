/**
 * Internal shapes the streaming reader fills while it walks the file, before `buildScore` turns them
 * into the public readonly model.
 */
import type Fraction from "fraction.js";
import type {
  Tremolo, AttributeChange, Clef, Fingering, KeySignature, NoteEvent, NoteMark, RepeatMarks, ScoreWarning, TimeSignature,
} from "./types";

/** Limits on what one file may hold. */
export interface ReadLimits {
  readonly maxMeasures: number;
  readonly maxNotes: number;
}

/** Options of `readScore`. */
export interface ReadOptions {
  /** Most measures per part (default 5,000). */
  readonly maxMeasures?: number;
  /** Most notes in the whole file (default 200,000). */
  readonly maxNotes?: number;
  /** Also return the cleaned copy (`sanitizeScore`'s text), made in the same pass. */
  readonly clean?: boolean;
}

export const DEFAULT_LIMITS: ReadLimits = { maxMeasures: 5000, maxNotes: 200_000 };

/**
 * A note as read, already in the shape of the public `NoteEvent`: while reading, `onset` holds the
 * offset inside its bar and `id` is empty; `buildScore` fills both in place once bar lengths are known.
 */
export type RawEvent = { -readonly [K in keyof NoteEvent]: NoteEvent[K] };

/** Key, time and clefs in force. */
export interface AttrState {
  key: KeySignature;
  time: TimeSignature;
  clefs: Clef[];
}

/** One bar of one part as read. */
export interface RawMeasure {
  number: string;
  implicit: boolean;
  /** Furthest position reached inside the bar. */
  length: Fraction;
  divisions: number;
  start: AttrState;
  changes: AttributeChange[];
  repeat?: RepeatMarks;
  tempo?: number;
}

export interface RawPart {
  readonly id: string;
  staves: number;
  readonly measures: RawMeasure[];
  readonly events: RawEvent[];
}

export interface RawScore {
  title: string;
  movementTitle: string;
  composer: string;
  readonly partNames: Map<string, string>;
  readonly partOrder: string[];
  readonly parts: Map<string, RawPart>;
  readonly warnings: ScoreWarning[];
}

/** The note under construction between `<note>` and `</note>`. */
export interface NoteDraft {
  chord: boolean;
  grace: boolean;
  cue: boolean;
  rest: boolean;
  unpitched: boolean;
  step: string;
  alter: number;
  octave: number;
  duration: number | null;
  voice: string;
  staff: number;
  type: string | null;
  dots: number;
  actual: number;
  normal: number;
  tieStart: boolean;
  tieStop: boolean;
  /** Null until the note has a fingering (most have none). */
  fingering: Fingering[] | null;
  /** Null until the note has a mark. */
  marks: NoteMark[] | null;
  dynamic: string | undefined;
  graceSlash: boolean;
  /** Null until the note has a `<tuplet>` start or stop. */
  tuplets: ("start" | "stop")[] | null;
  tremolo: Tremolo | null;
  arpeggio: NoteEvent["arpeggio"] | null;
}

/**
 * A fresh, empty note draft.
 *
 * @example
 * newNoteDraft().voice; // "1"
 */
export function newNoteDraft(): NoteDraft {
  return {
    chord: false, grace: false, cue: false, rest: false, unpitched: false, step: "", alter: 0, octave: 4,
    duration: null, voice: "1", staff: 1, type: null, dots: 0, actual: 0, normal: 0, tieStart: false,
    tieStop: false, fingering: null, marks: null, dynamic: undefined, graceSlash: false, tuplets: null,
    tremolo: null, arpeggio: null,
  };
}

/**
 * Empty a draft for the next `<note>`, so one draft serves a whole file. Arrays handed to an event
 * are dropped, never cleared.
 *
 * @example
 * resetNoteDraft(draft); // draft.voice === "1"
 */
export function resetNoteDraft(n: NoteDraft): void {
  n.chord = false; n.grace = false; n.cue = false; n.rest = false; n.unpitched = false;
  n.step = ""; n.alter = 0; n.octave = 4; n.duration = null; n.voice = "1"; n.staff = 1; n.type = null;
  n.dots = 0; n.actual = 0; n.normal = 0; n.tieStart = false; n.tieStop = false;
  n.fingering = null; n.marks = null; n.dynamic = undefined;
  n.graceSlash = false; n.tuplets = null; n.tremolo = null; n.arpeggio = null;
}
