/**
 * The Knotwork score model: plain, readonly data with exact rational time.
 *
 * Time is a `Fraction` (fraction.js) counted in quarter notes from the start of the score;
 * it is never a float. Every other layer (drills, playback, handouts) reads this model.
 */
import type Fraction from "fraction.js";

export type { Fraction };

/** A hand on the keyboard. Staff 1 of a piano part is the right hand by default, staff 2 the left. */
export type Hand = "right" | "left";

/** Written pitch spelled as in MusicXML, plus its sounding MIDI number (octave shifts applied). */
export interface Pitch {
  readonly step: "C" | "D" | "E" | "F" | "G" | "A" | "B";
  /** Chromatic alteration in semitones (-2 … 2; microtones rounded, with a warning). */
  readonly alter: number;
  /** MusicXML octave: octave 4 starts at middle C. */
  readonly octave: number;
  /** Sounding MIDI number: middle C = 60, A0 = 21, C8 = 108. */
  readonly midi: number;
}

/** The written appearance of a note: type, dots and tuplet ratio (actual notes in the time of normal notes). */
export interface Written {
  /** MusicXML note type: "whole", "half", "quarter", "eighth", "16th" … or null when the file had none. */
  readonly type: string | null;
  readonly dots: number;
  /** Combined tuplet ratio, e.g. { actual: 3, normal: 2 } for triplets; nested tuplets multiply. */
  readonly tuplet: { readonly actual: number; readonly normal: number } | null;
}

/** One fingering mark. Several per note are allowed (substitution or alternatives). */
export interface Fingering {
  /** 1 = thumb … 5 = little finger. */
  readonly finger: number;
  readonly substitution?: boolean;
  readonly alternate?: boolean;
}

export type TieFlag = "none" | "start" | "stop" | "continue";

/** One written note or rest. Tied notes stay separate events with tie flags (see `mergeTies`). */
export interface NoteEvent {
  readonly id: string;
  /** Part id as in the file (e.g. "P1"). */
  readonly part: string;
  /** 1-based staff within the part. */
  readonly staff: number;
  /** Voice label as in the file ("1" when missing). */
  readonly voice: string;
  /** 0-based measure index in written order. */
  readonly measure: number;
  /** Absolute onset in quarter notes from the start of the score. */
  readonly onset: Fraction;
  /** Sounding duration in quarter notes; zero for grace notes. */
  readonly duration: Fraction;
  readonly written: Written;
  /** Null for rests. */
  readonly pitch: Pitch | null;
  /** True when this note sounds together with the previous note of the same voice (a `<chord/>` member). */
  readonly chord: boolean;
  readonly tie: TieFlag;
  readonly grace?: boolean;
  /** Fingering marks; the first is the one played. */
  readonly fingering?: readonly Fingering[];
  /** Where the fingering came from: the score, an estimate, or a drill that prescribes it. */
  readonly fingeringSource?: "score" | "estimated" | "drill";
  /** Extra marks a drill may write: fermata, accent, staccato, a diamond (silently pressed) head. */
  readonly marks?: readonly NoteMark[];
  /** Dynamic written at this note (e.g. "f", "p"), for drills that ask one voice to be louder. */
  readonly dynamic?: string;
  /** Drill instruction text written above this note. */
  readonly words?: string;
  /** A grace note written with a slash (an acciaccatura). Graces keep their written order at one onset. */
  readonly graceSlash?: boolean;
  /** Tuplet brackets as the file wrote them on this note (`<tuplet type>`); the writer follows them. */
  readonly tuplets?: readonly ("start" | "stop")[];
  /** A tremolo: one note repeated ("single"), or two notes alternated ("start" on the first, "stop" on the second). */
  readonly tremolo?: Tremolo;
  /** An arpeggio sign on this chord note (rolled, optionally up or down) or a non-arpeggio bracket. */
  readonly arpeggio?: "arpeggiate" | "up" | "down" | "non-arpeggiate";
  /** Octave line in force on this note's staff, in semitones written below the sound (8va = 12, 8vb = −12). */
  readonly octaveShift?: number;
}

/** MusicXML `<tremolo>`: its type and the number of strokes (1 = eighths, 2 = sixteenths, 3 = 32nds). */
export interface Tremolo {
  readonly type: "single" | "start" | "stop" | "unmeasured";
  readonly marks: number;
}

export type NoteMark = "fermata" | "accent" | "staccato" | "tenuto" | "diamond";

export interface TimeSignature {
  readonly beats: number;
  readonly beatType: number;
}

export interface KeySignature {
  /** Circle-of-fifths position: -7 … 7. */
  readonly fifths: number;
  readonly mode: "major" | "minor" | string;
}

export type ClefSign = "G" | "F" | "C" | "percussion" | "TAB" | "none";

export interface Clef {
  readonly staff: number;
  readonly sign: ClefSign;
  readonly line: number;
  readonly octaveChange?: number;
}

/** A key, time or clef change inside a bar, at an offset from the bar's start. */
export interface AttributeChange {
  readonly offset: Fraction;
  readonly key?: KeySignature;
  readonly time?: TimeSignature;
  readonly clef?: Clef;
}

export interface RepeatMarks {
  readonly forward?: boolean;
  readonly backward?: boolean;
  readonly times?: number;
  /** Ending numbers ("1", "1, 2") and their type at this bar. */
  readonly ending?: { readonly number: string; readonly type: "start" | "stop" | "discontinue" };
}

export interface Measure {
  /** 0-based index in written order. */
  readonly index: number;
  /** Printed bar number as in the file ("0" for a pickup, "12a" …). */
  readonly number: string;
  /** True for an implicit (pickup or split) bar, which does not count in bar numbering. */
  readonly implicit: boolean;
  /** Absolute start in quarter notes. */
  readonly start: Fraction;
  /** Actual length in quarter notes (a pickup is shorter than its time signature). */
  readonly length: Fraction;
  /** Time, key and clefs in force at the start of the bar. */
  readonly time: TimeSignature;
  readonly key: KeySignature;
  readonly clefs: readonly Clef[];
  /** MusicXML divisions in force at the start of the bar (for reference; the model is exact). */
  readonly divisions: number;
  /** Changes inside the bar (offset > 0) or at its start when they differ from the previous bar. */
  readonly changes: readonly AttributeChange[];
  readonly repeat?: RepeatMarks;
  /** Metronome mark (quarter-note beats per minute) written in this bar, if any. */
  readonly tempo?: number;
  /**
   * Clefs and changes of each part, by part id, when the score has several parts (`clefs` and `changes`
   * above are the first part's). A song's piano part has its own clefs; see `partMeasure`.
   */
  readonly partAttributes?: Readonly<Record<string, { readonly clefs: readonly Clef[]; readonly changes: readonly AttributeChange[] }>>;
}

export interface PartInfo {
  readonly id: string;
  readonly name: string;
  /** Number of staves; a piano part has 2. */
  readonly staves: number;
}

export interface ScoreMeta {
  readonly title: string;
  readonly composer: string;
  /** Free text, e.g. a drill's instruction, written as a credit. */
  readonly subtitle?: string;
}

export interface Score {
  readonly meta: ScoreMeta;
  readonly parts: readonly PartInfo[];
  /** Measures are shared by all parts (partwise files keep them aligned). */
  readonly measures: readonly Measure[];
  /** All events of all parts, ordered by part, then onset, then staff, then pitch (grace notes first, in written order). */
  readonly events: readonly NoteEvent[];
}

export interface ScoreWarning {
  readonly code: string;
  readonly message: string;
  /** 0-based measure index, when the warning belongs to a bar. */
  readonly measure?: number;
  readonly element?: string;
}

/** Notes that sound together in one hand (a chord, or a single note). */
export interface Sonority {
  readonly hand: Hand;
  readonly onset: Fraction;
  /** Longest duration among the notes. */
  readonly duration: Fraction;
  /** Pitched, non-grace notes, sorted low to high. */
  readonly notes: readonly NoteEvent[];
}

/** A run of sonorities the hand plays as one unit. */
export interface NoteGroup {
  readonly hand: Hand;
  readonly kind: "beat" | "figure";
  readonly onset: Fraction;
  readonly duration: Fraction;
  readonly sonorities: readonly Sonority[];
}

/** The bars a teacher marked, with everything a drill generator needs. */
export interface Passage {
  readonly part: string;
  readonly hand: Hand | "both";
  /** 0-based measure indexes, inclusive. */
  readonly from: number;
  readonly to: number;
  readonly measures: readonly Measure[];
  /** Events inside the passage, onsets kept absolute. */
  readonly events: readonly NoteEvent[];
  readonly sonorities: { readonly right: readonly Sonority[]; readonly left: readonly Sonority[] };
  readonly groups: { readonly right: readonly NoteGroup[]; readonly left: readonly NoteGroup[] };
  readonly key: KeySignature;
  readonly time: TimeSignature;
  readonly meta: ScoreMeta;
  /** The staff that holds each hand in this part. */
  readonly staffOf: { readonly right: number; readonly left: number };
}
