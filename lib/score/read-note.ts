/**
 * `<note>` reading: collects the note's children into a draft, then places it in time on `</note>`.
 */
import type Fraction from "fraction.js";
import { ScoreError } from "./errors";
import { makePitch } from "./pitch";
import { advance, lastOnset, markOnset, position, toTime, type Cursor } from "./read-cursor";
import { newNoteDraft, type NoteDraft, type RawEvent, type RawScore, type ReadLimits } from "./read-types";
import { warn } from "./read-warnings";
import { ZERO } from "./time";
import type { NoteMark, Pitch, TieFlag } from "./types";

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
 * Handle an opening tag inside `<note>` (flags that are empty elements or carry attributes).
 *
 * @example
 * openNoteChild(draft, "chord", {}); // draft.chord === true
 */
export function openNoteChild(n: NoteState, name: string, attrs: Record<string, string>): void {
  switch (name) {
    case "chord": n.chord = true; break;
    case "grace": n.grace = true; break;
    case "cue": n.cue = true; break;
    case "rest": n.rest = true; break;
    case "unpitched": n.unpitched = true; break;
    case "dot": n.dots += 1; break;
    case "tie":
      if (attrs.type === "start") n.tieStart = true;
      else if (attrs.type === "stop") n.tieStop = true;
      break;
    case "fermata": case "accent": case "staccato": case "tenuto":
      if (!n.marks.includes(name as NoteMark)) n.marks.push(name as NoteMark);
      break;
  }
}

/**
 * Handle a closing tag inside `<note>` whose text carries a value.
 *
 * @example
 * closeNoteChild(draft, "step", "pitch", "G", {}, cursor, raw); // draft.step === "G"
 */
export function closeNoteChild(
  n: NoteState, name: string, parent: string, value: string, attrs: Record<string, string>, c: Cursor, raw: RawScore,
): void {
  switch (name) {
    case "step": if (parent === "pitch") n.step = value; break;
    case "alter": if (parent === "pitch") n.alter = alterOf(value, c, raw); break;
    case "octave": if (parent === "pitch") n.octave = Number(value); break;
    case "duration": if (parent === "note") n.duration = Number(value); break;
    case "voice": if (parent === "note") n.voice = value || "1"; break;
    case "staff": if (parent === "note") n.staff = Math.max(1, Math.round(Number(value)) || 1); break;
    case "type": if (parent === "note") n.type = value; break;
    case "actual-notes": if (parent === "time-modification") n.actual = Number(value); break;
    case "normal-notes": if (parent === "time-modification") n.normal = Number(value); break;
    case "fingering":
      if (parent === "technical") {
        const finger = Number(value);
        if (Number.isInteger(finger) && finger >= 1 && finger <= 5) {
          const mark: { finger: number; substitution?: boolean; alternate?: boolean } = { finger };
          if (attrs.substitution === "yes") mark.substitution = true;
          if (attrs.alternate === "yes") mark.alternate = true;
          n.fingering.push(mark);
        } else warn(raw, "fingering-text", `Fingering "${value}" is not a finger 1–5 and was left out`, c.measureIndex, "fingering");
      }
      break;
    default:
      if (parent === "dynamics") n.dynamic = name === "other-dynamics" ? value : name;
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
    } else duration = toTime(c, n.duration, "note");
  }
  let offset: Fraction;
  if (n.chord) offset = lastOnset(c);
  else {
    markOnset(c);
    offset = position(c);
    c.lastDuration = duration;
    if (!n.grace) advance(c, duration);
  }
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
      pitch = makePitch(n.step, n.alter, n.octave, c.transpose);
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
    written: { type: n.type, dots: n.dots, tuplet: n.actual > 0 && n.normal > 0 && n.actual !== n.normal ? { actual: n.actual, normal: n.normal } : null },
    pitch,
    chord: n.chord,
    tie,
  };
  if (n.grace) event.grace = true;
  if (n.fingering.length > 0) {
    event.fingering = n.fingering;
    event.fingeringSource = "score";
  }
  if (n.marks.length > 0) event.marks = n.marks;
  if (dynamic) event.dynamic = dynamic;
  if (words) event.words = words;
  c.part.events.push(event);
}
