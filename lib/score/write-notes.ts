/**
 * One `<note>` element in the order the MusicXML 4.0 XSD requires: grace, chord, pitch|rest,
 * duration, tie, voice, type, dot, accidental, time-modification, stem, notehead, staff, beam,
 * notations.
 */
import type { NoteMark, Pitch } from "./types";
import type { Piece } from "./write-pieces";
import { toDivisions } from "./write-durations";
import { el, empty } from "./write-xml";
import type { AccidentalMark } from "./write-accidentals";

export interface NoteContext {
  readonly divisions: number;
  readonly voice: string;
  /** Second and later notes of a chord. */
  readonly chord: boolean;
  /** Beam values by level, written on the first note of a slot. */
  readonly beams: readonly string[];
  readonly tuplet: readonly ("start" | "stop")[];
  /** A rest filling the whole bar (`<rest measure="yes"/>`). */
  readonly measureRest?: boolean;
  /** The accidental sign this note shows (see write-accidentals). */
  readonly accidental?: AccidentalMark;
  /** Position in its chord: non-arpeggio brackets mark the chord's bottom and top notes. */
  readonly chordEdge?: "bottom" | "top";
}

const STEP_SEMITONES = { C: 0, D: 2, E: 4, F: 5, G: 7, A: 9, B: 11 } as const;

/**
 * The octave to write: the model keeps the written octave and the sounding MIDI number (octave
 * shifts applied); the writer writes no `<octave-shift>`, so it writes the sounding octave.
 */
function soundingOctave(p: Pitch): number {
  const written = (p.octave + 1) * 12 + STEP_SEMITONES[p.step] + p.alter;
  const diff = p.midi - written;
  return diff !== 0 && diff % 12 === 0 ? p.octave + diff / 12 : p.octave;
}

const ARTICULATIONS: readonly NoteMark[] = ["accent", "staccato", "tenuto"];

/**
 * The `<note>` XML for one piece.
 * @example
 *   noteXml(piece, { divisions: 2, voice: "1", chord: false, beams: [], tuplet: [] });
 */
export function noteXml(piece: Piece, ctx: NoteContext): string {
  const ev = piece.event;
  const grace = piece.duration.equals(0);
  const parts: string[] = [];
  if (grace) parts.push(empty("grace", { slash: ev.graceSlash ? "yes" : undefined }));
  if (ctx.chord) parts.push(empty("chord"));
  if (ev.pitch) {
    const alter = ev.pitch.alter !== 0 ? el("alter", ev.pitch.alter) : "";
    parts.push(`<pitch>${el("step", ev.pitch.step)}${alter}${el("octave", soundingOctave(ev.pitch))}</pitch>`);
  } else {
    parts.push(empty("rest", { measure: ctx.measureRest ? "yes" : undefined }));
  }
  if (!grace) parts.push(el("duration", toDivisions(piece.duration, ctx.divisions)));
  if (piece.tieStop) parts.push(empty("tie", { type: "stop" }));
  if (piece.tieStart) parts.push(empty("tie", { type: "start" }));
  parts.push(el("voice", ctx.voice));
  if (piece.type) parts.push(el("type", piece.type));
  for (let i = 0; i < piece.dots; i++) parts.push(empty("dot"));
  if (ctx.accidental) parts.push(el("accidental", ctx.accidental.value, { cautionary: ctx.accidental.cautionary ? "yes" : undefined }));
  if (piece.tuplet && !grace) {
    parts.push(
      `<time-modification>${el("actual-notes", piece.tuplet.actual)}${el("normal-notes", piece.tuplet.normal)}</time-modification>`,
    );
  }
  const marks = ev.marks ?? [];
  if (marks.includes("diamond")) parts.push(el("notehead", "diamond"));
  parts.push(el("staff", ev.staff));
  ctx.beams.forEach((value, i) => parts.push(el("beam", value, { number: i + 1 })));
  const notations = notationsXml(piece, ctx, marks);
  if (notations) parts.push(notations);
  return `<note>${parts.join("")}</note>`;
}

function notationsXml(piece: Piece, ctx: NoteContext, marks: readonly NoteMark[]): string {
  const inner: string[] = [];
  if (piece.tieStop) inner.push(empty("tied", { type: "stop" }));
  if (piece.tieStart) inner.push(empty("tied", { type: "start" }));
  if (piece.letRing) inner.push(empty("tied", { type: "let-ring" }));
  for (const type of ctx.tuplet) inner.push(empty("tuplet", { type, bracket: "yes" }));
  const ev = piece.event;
  // A tremolo stays on a note that is not split; a split note loses it (its slices are tied values).
  if (ev.tremolo && piece.first && piece.last) {
    const attrs = { type: ev.tremolo.type };
    inner.push(`<ornaments>${el("tremolo", ev.tremolo.marks, attrs)}</ornaments>`);
  }
  if (ev.arpeggio && piece.first) {
    if (ev.arpeggio === "non-arpeggiate") {
      if (ctx.chordEdge) inner.push(empty("non-arpeggiate", { type: ctx.chordEdge }));
    } else inner.push(empty("arpeggiate", { direction: ev.arpeggio === "arpeggiate" ? undefined : ev.arpeggio }));
  }
  const fingering = piece.first ? (piece.event.fingering ?? []) : [];
  if (fingering.length > 0) {
    const fingers = fingering.map((f) =>
      el("fingering", f.finger, {
        substitution: f.substitution ? "yes" : undefined,
        alternate: f.alternate ? "yes" : undefined,
      }),
    );
    inner.push(`<technical>${fingers.join("")}</technical>`);
  }
  const arts = ARTICULATIONS.filter((m) => marks.includes(m) && (m === "accent" ? piece.first : piece.last));
  if (arts.length > 0) inner.push(`<articulations>${arts.map((m) => empty(m)).join("")}</articulations>`);
  if (marks.includes("fermata") && piece.last) inner.push(empty("fermata", { type: "upright" }));
  return inner.length > 0 ? `<notations>${inner.join("")}</notations>` : "";
}
