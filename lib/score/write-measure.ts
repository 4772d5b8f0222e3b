/**
 * One `<measure>` of one part: barlines, attributes at the start and mid-bar, the tempo mark,
 * then every voice stream with `<backup>`/`<forward>` between them and rests in the gaps.
 */
import Fraction from "fraction.js";
import type { AttributeChange, Clef, KeySignature, Measure, NoteEvent, TimeSignature } from "./types";
import {
  attributesXml,
  barlinesXml,
  eventDirectionsXml,
  sameClef,
  sameKey,
  sameTime,
  tempoXml,
} from "./write-attributes";
import { assignBeams, assignTuplets, beamSpan } from "./write-beams";
import { noteValues, toDivisions } from "./write-durations";
import { noteXml } from "./write-notes";
import type { Piece } from "./write-pieces";
import { voiceStreams, type Slot, type VoiceStream } from "./write-voices";
import { el, empty } from "./write-xml";
import { barAccidentals, type AccidentalMark, type AccidentalState } from "./write-accidentals";

/** Key, time and clefs in force while a part is written; updated bar by bar. */
export interface PartState {
  key?: KeySignature;
  time?: TimeSignature;
  clefs: Map<number, Clef>;
  /** Alterations the previous bar left different from its key (for courtesy accidentals). */
  accidentals?: AccidentalState;
  /** Octave line in force per staff (semitones, as `NoteEvent.octaveShift`). */
  shifts?: Map<number, number>;
  /** The staff each voice of the part mostly sits on (see write-voices). */
  homeStaff?: ReadonlyMap<string, number>;
}

export interface MeasureContext {
  readonly part: string;
  readonly staves: number;
  readonly divisions: number;
  readonly first: boolean;
  readonly last: boolean;
  readonly state: PartState;
}

type Marker = { readonly onset: Fraction; readonly change: AttributeChange };

/**
 * The `<measure>` XML of one part for one bar.
 * @example
 *   measureXml(measure, pieces, { part: "P1", staves: 2, divisions: 4, first: true, last: false, state });
 */
export function measureXml(m: Measure, pieces: readonly Piece[], ctx: MeasureContext): string {
  const out: string[] = [];
  const bars = barlinesXml(m, ctx.last);
  out.push(bars.left);
  out.push(startAttributes(m, ctx));
  if (m.tempo && m.tempo > 0) out.push(tempoXml(m.tempo));

  const streams = voiceStreams(pieces, ctx.staves, ctx.state.homeStaff);
  const accidentals = barAccidentals(m, pieces, ctx.state.accidentals ?? new Map());
  ctx.state.accidentals = accidentals.state;
  const span = beamSpan(m.time);
  for (const s of streams) {
    assignBeams(s.slots, m.start, span);
    assignTuplets(s.slots);
  }
  const markers = new Map<VoiceStream, Marker[]>();
  for (const change of m.changes.filter((c) => c.offset.gt(0))) {
    const target = (change.clef && streams.find((s) => s.primary && s.staff === change.clef!.staff)) || streams[0];
    markers.set(target, [...(markers.get(target) ?? []), { onset: m.start.add(change.offset), change }]);
  }

  let cursor = new Fraction(0);
  streams.forEach((stream, i) => {
    if (i > 0 && cursor.gt(0)) {
      out.push(`<backup>${el("duration", toDivisions(cursor, ctx.divisions))}</backup>`);
      cursor = new Fraction(0);
    }
    const items: (Slot | Marker)[] = [...(markers.get(stream) ?? []), ...stream.slots];
    items.sort((a, b) => a.onset.compare(b.onset) || Number("pieces" in a) - Number("pieces" in b));
    for (const item of items) {
      const t = item.onset.sub(m.start);
      if (t.gt(cursor)) out.push(fill(stream, m, cursor, t, ctx));
      else if (t.lt(cursor)) out.push(`<backup>${el("duration", toDivisions(cursor.sub(t), ctx.divisions))}</backup>`);
      cursor = t;
      if ("pieces" in item) {
        out.push(slotXml(item, stream, m, ctx, accidentals.marks));
        cursor = cursor.add(item.advance);
      } else {
        out.push(changeXml(item.change, ctx));
      }
    }
    if (stream.primary && cursor.lt(m.length)) {
      out.push(fill(stream, m, cursor, m.length, ctx, stream.slots.length === 0));
      cursor = m.length;
    }
  });
  if (ctx.last) out.push(closeShifts(ctx.state));
  out.push(bars.right);
  const implicit = m.implicit ? ' implicit="yes"' : "";
  return `<measure number="${escapeNumber(m.number, m.index)}"${implicit}>${out.join("")}</measure>`;
}

function escapeNumber(number: string, index: number): string {
  const n = number.trim() || String(index + 1);
  return n.replace(/&/g, "&amp;").replace(/</g, "&lt;").replace(/"/g, "&quot;");
}

function startAttributes(m: Measure, ctx: MeasureContext): string {
  let key = m.key;
  let time = m.time;
  const clefs = new Map(m.clefs.map((c) => [c.staff, c]));
  for (const c of m.changes.filter((c) => c.offset.equals(0))) {
    if (c.key) key = c.key;
    if (c.time) time = c.time;
    if (c.clef) clefs.set(c.clef.staff, c.clef);
  }
  const st = ctx.state;
  const changedClefs = [...clefs.values()]
    .filter((c) => c.staff <= ctx.staves && (ctx.first || !sameClef(st.clefs.get(c.staff), c)))
    .sort((a, b) => a.staff - b.staff);
  const xml = attributesXml({
    divisions: ctx.first ? ctx.divisions : undefined,
    key: ctx.first || !sameKey(st.key, key) ? key : undefined,
    time: ctx.first || !sameTime(st.time, time) ? time : undefined,
    staves: ctx.first ? ctx.staves : undefined,
    clefs: changedClefs,
  });
  st.key = key;
  st.time = time;
  for (const c of clefs.values()) st.clefs.set(c.staff, c);
  return xml;
}

function changeXml(change: AttributeChange, ctx: MeasureContext): string {
  const st = ctx.state;
  const xml = attributesXml({
    key: change.key && !sameKey(st.key, change.key) ? change.key : undefined,
    time: change.time && !sameTime(st.time, change.time) ? change.time : undefined,
    staves: ctx.staves,
    clefs: change.clef && change.clef.staff <= ctx.staves ? [change.clef] : [],
  }).replace(/<staves>\d+<\/staves>/, "");
  if (change.key) st.key = change.key;
  if (change.time) st.time = change.time;
  if (change.clef) st.clefs.set(change.clef.staff, change.clef);
  return xml === "<attributes></attributes>" ? "" : xml;
}

function slotXml(slot: Slot, stream: VoiceStream, m: Measure, ctx: MeasureContext, accidentals: Map<Piece, AccidentalMark>): string {
  const directions = shiftXml(slot, ctx.state) + slot.pieces.filter((p) => p.first).map((p) => eventDirectionsXml(p.event)).join("");
  const midis = slot.pieces.map((p) => p.event.pitch?.midi ?? 0);
  const low = Math.min(...midis);
  const high = Math.max(...midis);
  const measureRest =
    slot.rest && stream.slots.length === 1 && slot.onset.equals(m.start) && slot.advance.equals(m.length);
  const notes = slot.pieces.map((p, i) =>
    noteXml(p, {
      divisions: ctx.divisions,
      voice: stream.voice,
      chord: i > 0 && !slot.rest,
      beams: i === 0 ? slot.beams : [],
      tuplet: i === 0 ? slot.tuplet : [],
      measureRest,
      accidental: accidentals.get(p),
      chordEdge: slot.pieces.length < 2 ? undefined : midis[i] === low ? "bottom" : midis[i] === high ? "top" : undefined,
    }),
  );
  return directions + notes.join("");
}

/** `<octave-shift>` for one staff: `shift` semitones written below the sound (8va = 12) or a stop. */
function octaveShiftXml(staff: number, shift: number, stop: boolean): string {
  const size = Math.abs(shift) / 12 === 1 ? 8 : Math.abs(shift) / 12 === 2 ? 15 : 22;
  const type = stop ? "stop" : shift > 0 ? "down" : "up";
  const placement = shift > 0 ? "above" : "below";
  return `<direction placement="${placement}"><direction-type>${empty("octave-shift", { type, size })}</direction-type>${el("staff", staff)}</direction>`;
}

/** Octave lines that end or begin at this slot, on the staff of its first note. */
function shiftXml(slot: Slot, state: PartState): string {
  const staff = slot.pieces[0].event.staff;
  const want = slot.pieces[0].event.octaveShift ?? 0;
  const shifts = (state.shifts ??= new Map());
  const now = shifts.get(staff) ?? 0;
  if (want === now) return "";
  let out = "";
  if (now !== 0) out += octaveShiftXml(staff, now, true);
  if (want !== 0) out += octaveShiftXml(staff, want, false);
  if (want === 0) shifts.delete(staff);
  else shifts.set(staff, want);
  return out;
}

/** Stops for every octave line still open at the end of the part. */
function closeShifts(state: PartState): string {
  const out = [...(state.shifts ?? new Map<number, number>()).entries()].map(([staff, shift]) => octaveShiftXml(staff, shift, true));
  state.shifts?.clear();
  return out.join("");
}

/** Rests (first voice of a staff) or a `<forward>` (other voices) from `from` to `to` in the bar. */
function fill(stream: VoiceStream, m: Measure, from: Fraction, to: Fraction, ctx: MeasureContext, whole = false): string {
  const gap = to.sub(from);
  if (!stream.primary) {
    return `<forward>${el("duration", toDivisions(gap, ctx.divisions))}${el("voice", stream.voice)}${el("staff", stream.staff)}</forward>`;
  }
  const values = whole ? [{ duration: gap, type: null, dots: 0, tuplet: null }] : noteValues(gap, { type: null, dots: 0, tuplet: null });
  let at = m.start.add(from);
  return values
    .map((v) => {
      const piece = restPiece(ctx.part, stream, m.index, at, v);
      at = at.add(v.duration);
      return noteXml(piece, { divisions: ctx.divisions, voice: stream.voice, chord: false, beams: [], tuplet: [], measureRest: whole });
    })
    .join("");
}

function restPiece(part: string, stream: VoiceStream, measure: number, onset: Fraction, v: ReturnType<typeof noteValues>[number]): Piece {
  const event: NoteEvent = {
    id: `rest-${measure}-${stream.voice}-${onset.toFraction()}`,
    part,
    staff: stream.staff,
    voice: stream.voice,
    measure,
    onset,
    duration: v.duration,
    written: { type: v.type, dots: v.dots, tuplet: v.tuplet },
    pitch: null,
    chord: false,
    tie: "none",
  };
  return { event, onset, duration: v.duration, type: v.type, dots: v.dots, tuplet: v.tuplet, tieStart: false, tieStop: false, first: true, last: true, order: -1 };
}
