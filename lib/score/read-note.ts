/**
 * `<note>` reading: collects the note's children into a draft, then places it in time on `</note>`.
 */
import type Fraction from "fraction.js";
import { ScoreError } from "./errors";
import { makePitch } from "./pitch";
import { advance, lastOnset, markOnset, position, toTime, type Cursor } from "./read-cursor";
import {
  ACCENT, ACTUAL_NOTES, ALTER, CHORD, CUE, DOT, DURATION, DYNAMICS, FERMATA, FINGERING, GRACE, NORMAL_NOTES,
  NOTE, OCTAVE, OTHER_DYNAMICS, PITCH, REST, STACCATO, STAFF, STEP, TECHNICAL, TENUTO, TIE, TIME_MODIFICATION,
  TYPE, UNPITCHED, VOICE, TUPLET, TREMOLO, ARPEGGIATE, NON_ARPEGGIATE, TIED,
} from "./read-names";
import { newNoteDraft, resetNoteDraft, type NoteDraft, type RawEvent, type RawScore, type ReadLimits } from "./read-types";
import { noteBoundary, snapDuration } from "./read-snap";
import { warn } from "./read-warnings";
import { ZERO } from "./time";
import type { NoteMark, Pitch, TieFlag, Written } from "./types";

export type NoteState = NoteDraft;

/**
 * A fresh note draft for `<note>`.
 *
 * @example
 * newNoteState().chord; // false
 */
export function newNoteState(): NoteState {
  return newNoteDraft();
}

/**
 * Empty the draft when a new `<note>` opens.
 *
 * @example
 * resetNoteState(draft); // draft.chord === false
 */
export function resetNoteState(n: NoteState): void {
  resetNoteDraft(n);
}

function addMark(n: NoteState, mark: NoteMark): void {
  if (n.marks === null) n.marks = [mark];
  else if (!n.marks.includes(mark)) n.marks.push(mark);
}

/**
 * Handle an opening tag inside `<note>` (flags that are empty elements or carry attributes), by the
 * element's code from read-names.ts.
 *
 * @example
 * openNoteChild(draft, CHORD, {}); // draft.chord === true
 */
export function openNoteChild(n: NoteState, code: number, attrs: Record<string, string>): void {
  switch (code) {
    case CHORD: n.chord = true; break;
    case GRACE:
      n.grace = true;
      if (attrs.slash === "yes") n.graceSlash = true;
      break;
    case CUE: n.cue = true; break;
    case REST: n.rest = true; break;
    case UNPITCHED: n.unpitched = true; break;
    case DOT: n.dots += 1; break;
    case TIE:
      if (attrs.type === "start") n.tieStart = true;
      else if (attrs.type === "stop") n.tieStop = true;
      break;
    case FERMATA: addMark(n, "fermata"); break;
    case ACCENT: addMark(n, "accent"); break;
    case STACCATO: addMark(n, "staccato"); break;
    case TENUTO: addMark(n, "tenuto"); break;
    case TUPLET:
      if (attrs.type === "start" || attrs.type === "stop") (n.tuplets ??= []).push(attrs.type);
      break;
    case ARPEGGIATE:
      n.arpeggio = attrs.direction === "up" || attrs.direction === "down" ? attrs.direction : "arpeggiate";
      break;
    case NON_ARPEGGIATE: n.arpeggio = "non-arpeggiate"; break;
    // A tie to nothing (MusicXML 4.0 <tied type="let-ring">): the note rings on; read as a tie start.
    case TIED: if (attrs.type === "let-ring") n.tieStart = true; break;
  }
}

/**
 * Handle a closing tag inside `<note>` whose text carries a value (`code` and `parent` are element
 * codes; `name` is needed only for dynamics, whose element name is the value).
 *
 * @example
 * closeNoteChild(draft, STEP, PITCH, "step", "G", {}, cursor, raw); // draft.step === "G"
 */
export function closeNoteChild(
  n: NoteState, code: number, parent: number, name: string, value: string, attrs: Record<string, string>,
  c: Cursor, raw: RawScore,
): void {
  switch (code) {
    case STEP: if (parent === PITCH) n.step = value; break;
    case ALTER: if (parent === PITCH) n.alter = alterOf(value, c, raw); break;
    case OCTAVE: if (parent === PITCH) n.octave = Number(value); break;
    case DURATION: if (parent === NOTE) n.duration = Number(value); break;
    case VOICE: if (parent === NOTE) n.voice = value || "1"; break;
    case STAFF: if (parent === NOTE) n.staff = Math.max(1, Math.round(Number(value)) || 1); break;
    case TYPE: if (parent === NOTE) n.type = value; break;
    case ACTUAL_NOTES: if (parent === TIME_MODIFICATION) n.actual = Number(value); break;
    case NORMAL_NOTES: if (parent === TIME_MODIFICATION) n.normal = Number(value); break;
    case TREMOLO: {
      const type = attrs.type === "start" || attrs.type === "stop" || attrs.type === "unmeasured" ? attrs.type : "single";
      const marks = Number(value || 3);
      n.tremolo = { type, marks: Number.isInteger(marks) && marks >= 0 && marks <= 8 ? marks : 3 };
      break;
    }
    case FINGERING:
      if (parent === TECHNICAL) {
        const finger = Number(value);
        if (Number.isInteger(finger) && finger >= 1 && finger <= 5) {
          const mark: { finger: number; substitution?: boolean; alternate?: boolean } = { finger };
          if (attrs.substitution === "yes") mark.substitution = true;
          if (attrs.alternate === "yes") mark.alternate = true;
          if (n.fingering === null) n.fingering = [mark];
          else n.fingering.push(mark);
        } else warn(raw, "fingering-text", `Fingering "${value}" is not a finger 1–5 and was left out`, c.measureIndex, "fingering");
      }
      break;
    default:
      if (parent === DYNAMICS) n.dynamic = code === OTHER_DYNAMICS ? value : name;
  }
}

function alterOf(value: string, c: Cursor, raw: RawScore): number {
  const a = Number(value);
  if (!Number.isFinite(a)) return 0;
  if (!Number.isInteger(a)) {
    warn(raw, "microtone", `Alteration ${value} was rounded to a semitone`, c.measureIndex, "alter");
    return Math.round(a);
  }
  return a;
}

function isStepLetter(s: string): s is Pitch["step"] {
  return s.length === 1 && s >= "A" && s <= "G";
}

/**
 * The pitch of a note, shared with earlier notes of the part that have the same step, alteration,
 * octave and transposition (only small integer values, and never -0, are shared).
 */
function pitchOf(c: Cursor, step: Pitch["step"], alter: number, octave: number): Pitch {
  const t = c.transpose;
  if (
    !Number.isInteger(octave) || octave < -10 || octave > 20 || alter < -8 || alter > 8 || t < -48 || t > 48
    || Object.is(alter, -0) || Object.is(octave, -0)
  ) return makePitch(step, alter, octave, t);
  const key = (((octave + 10) * 7 + step.charCodeAt(0) - 65) * 17 + alter + 8) * 97 + t + 48;
  let pitch = c.pitches.get(key);
  if (pitch === undefined) {
    pitch = makePitch(step, alter, octave, t);
    c.pitches.set(key, pitch);
  }
  return pitch;
}

/** The written form of a note without a tuplet, shared within the part. */
function plainWritten(c: Cursor, type: string | null, dots: number): Written {
  if (dots > 8) return { type, dots, tuplet: null };
  let byDots = c.writtens.get(type);
  if (byDots === undefined) {
    byDots = [];
    c.writtens.set(type, byDots);
  }
  return (byDots[dots] ??= { type, dots, tuplet: null });
}

/**
 * Place a finished note in time, move the cursor and store the event.
 *
 * @example
 * finishNote(draft, cursor, raw, { notes: 0 }, DEFAULT_LIMITS);
 */
export function finishNote(n: NoteState, c: Cursor, raw: RawScore, counter: { notes: number }, limits: ReadLimits): void {
  if (!c.measure) return;
  let duration: Fraction = ZERO;
  if (!n.grace) {
    if (n.duration === null) {
      if (!n.chord) {
        throw new ScoreError("missing-duration", "A note has no <duration>", {
          measure: c.measureIndex, number: c.measure.number, element: "note",
        });
      }
      duration = c.lastDuration;
    } else duration = snapDuration(n, c, raw, toTime(c, n.duration, "note"));
  }
  let offset: Fraction;
  if (n.chord) offset = lastOnset(c);
  else {
    markOnset(c);
    offset = position(c);
    c.lastDuration = duration;
    if (!n.grace) advance(c, duration);
  }
  if (c.snapCount > 0 && !n.grace) noteBoundary(c, offset, duration);
  if (n.cue) {
    warn(raw, "cue-note", "Cue notes are not played and were left out", c.measureIndex, "cue");
    return;
  }
  counter.notes += 1;
  if (counter.notes > limits.maxNotes) {
    throw new ScoreError("too-many-notes", `The file has more than ${limits.maxNotes} notes`, {
      measure: c.measureIndex, number: c.measure.number, element: "note",
    });
  }
  if (n.staff > c.part.staves) c.part.staves = n.staff;
  let pitch = null;
  if (!n.rest && !n.unpitched) {
    if (isStepLetter(n.step) && Number.isFinite(n.octave)) {
      // <octave-shift> lines change only the display: MusicXML's <pitch> data is already the true pitch.
      pitch = pitchOf(c, n.step, n.alter, n.octave);
    } else warn(raw, "bad-pitch", `A note has no readable <pitch>; read as a rest`, c.measureIndex, "pitch");
  } else if (n.unpitched) warn(raw, "unpitched", "Unpitched notes are read as rests", c.measureIndex, "unpitched");
  let dynamic = n.dynamic;
  let words: string | undefined;
  if (pitch && !n.grace && (c.pendingDynamic.size > 0 || c.pendingWords.size > 0)) {
    dynamic ??= c.pendingDynamic.get(n.staff);
    words = c.pendingWords.get(n.staff);
    c.pendingDynamic.delete(n.staff);
    c.pendingWords.delete(n.staff);
  }
  const tie: TieFlag = n.tieStart && n.tieStop ? "continue" : n.tieStart ? "start" : n.tieStop ? "stop" : "none";
  const event: RawEvent = {
    id: "",
    part: c.part.id,
    staff: n.staff,
    voice: n.voice,
    measure: c.measureIndex,
    onset: offset,
    duration,
    written: n.actual > 0 && n.normal > 0 && n.actual !== n.normal
      ? { type: n.type, dots: n.dots, tuplet: { actual: n.actual, normal: n.normal } }
      : plainWritten(c, n.type, n.dots),
    pitch,
    chord: n.chord,
    tie,
  };
  if (n.grace) {
    event.grace = true;
    if (n.graceSlash) event.graceSlash = true;
  }
  if (n.tuplets !== null) event.tuplets = n.tuplets;
  if (n.tremolo !== null) event.tremolo = n.tremolo;
  if (n.arpeggio !== null) event.arpeggio = n.arpeggio;
  if (c.shift.size > 0) {
    const shift = c.shift.get(n.staff);
    if (shift) event.octaveShift = shift;
  }
  if (n.fingering !== null) {
    event.fingering = n.fingering;
    event.fingeringSource = "score";
  }
  if (n.marks !== null) event.marks = n.marks;
  if (dynamic) event.dynamic = dynamic;
  if (words) event.words = words;
  c.part.events.push(event);
}
