/**
 * `<attributes>` (divisions, key, time, staves, clefs, transposition) and `<direction>` (octave shifts,
 * dynamics, words, metronome marks) reading.
 */
import { atBarStart, position, setDivisions, type Cursor } from "./read-cursor";
import type { RawScore, AttrState } from "./read-types";
import {
  BEAT_TYPE, BEAT_UNIT, BEAT_UNIT_DOT, BEATS, CHROMATIC, CLEF, CLEF_OCTAVE_CHANGE, DIRECTION, DIVISIONS, DYNAMICS,
  FIFTHS, LINE, MODE, OCTAVE_CHANGE, OCTAVE_SHIFT, OTHER_DYNAMICS, PER_MINUTE, SENZA_MISURA, SIGN, STAFF, STAVES,
  TRANSPOSE, WORDS,
} from "./read-names";
import { warn } from "./read-warnings";
import { octaveShiftSemitones } from "./pitch";
import type { AttributeChange, Clef, ClefSign, KeySignature, TimeSignature } from "./types";

export interface AttrDraft {
  divisions?: number;
  fifths?: number;
  mode?: string;
  beats: number[];
  beatTypes: number[];
  staves?: number;
  clefs: Clef[];
  clef: { sign?: string; line?: number; octave?: number };
  chromatic?: number;
  octaveChange?: number;
}

/**
 * An empty `<attributes>` draft.
 *
 * @example
 * newAttrDraft().clefs.length; // 0
 */
export function newAttrDraft(): AttrDraft {
  return { beats: [], beatTypes: [], clefs: [], clef: {} };
}

const CLEF_SIGNS = new Set(["G", "F", "C", "percussion", "TAB", "none"]);
const DEFAULT_LINE: Record<string, number> = { G: 2, F: 4, C: 3 };

/**
 * Handle a closing tag inside `<attributes>` (`code` and `parent` are element codes from read-names.ts).
 *
 * @example
 * closeAttributesChild(draft, DIVISIONS, ATTRIBUTES, "4", {}, cursor, raw);
 */
export function closeAttributesChild(
  a: AttrDraft, code: number, parent: number, value: string, attrs: Record<string, string>, c: Cursor, raw: RawScore,
): void {
  switch (code) {
    case DIVISIONS: a.divisions = Number(value); break;
    case FIFTHS: a.fifths = Number(value); break;
    case MODE: a.mode = value; break;
    case BEATS: a.beats.push(value.split("+").reduce((s, x) => s + Number(x), 0)); break;
    case BEAT_TYPE: a.beatTypes.push(Number(value)); break;
    case SENZA_MISURA:
      warn(raw, "senza-misura", "Unmeasured time (senza-misura) is read with the previous time signature", c.measureIndex, "senza-misura");
      break;
    case STAVES: a.staves = Number(value); break;
    case SIGN: if (parent === CLEF) a.clef.sign = value; break;
    case LINE: if (parent === CLEF) a.clef.line = Number(value); break;
    case CLEF_OCTAVE_CHANGE: a.clef.octave = Number(value); break;
    case CLEF: {
      const sign = (CLEF_SIGNS.has(a.clef.sign ?? "") ? a.clef.sign : "none") as ClefSign;
      const staff = Math.max(1, Number(attrs.number ?? 1) || 1);
      a.clefs.push({
        staff, sign, line: a.clef.line ?? DEFAULT_LINE[sign] ?? 0,
        ...(a.clef.octave ? { octaveChange: a.clef.octave } : {}),
      });
      a.clef = {};
      break;
    }
    case CHROMATIC: if (parent === TRANSPOSE) a.chromatic = Number(value); break;
    case OCTAVE_CHANGE: if (parent === TRANSPOSE) a.octaveChange = Number(value); break;
  }
}

function combineTime(a: AttrDraft): TimeSignature | undefined {
  if (a.beats.length === 0 || a.beats.length !== a.beatTypes.length) return undefined;
  if (a.beats.length === 1) return { beats: a.beats[0], beatType: a.beatTypes[0] };
  const beatType = Math.max(...a.beatTypes);
  const beats = a.beats.reduce((s, b, i) => s + (b * beatType) / a.beatTypes[i], 0);
  return { beats, beatType };
}

const sameKey = (x: KeySignature, y: KeySignature) => x.fifths === y.fifths && x.mode === y.mode;
const sameTime = (x: TimeSignature, y: TimeSignature) => x.beats === y.beats && x.beatType === y.beatType;
const sameClef = (x: Clef | undefined, y: Clef) =>
  !!x && x.sign === y.sign && x.line === y.line && (x.octaveChange ?? 0) === (y.octaveChange ?? 0);

/**
 * Apply a finished `<attributes>` block at the cursor: update divisions and state, record changes.
 *
 * @example
 * finishAttributes(draft, cursor, raw);
 */
export function finishAttributes(a: AttrDraft, c: Cursor, raw: RawScore): void {
  const m = c.measure;
  if (a.divisions !== undefined) {
    if (a.divisions > 0) {
      setDivisions(c, a.divisions);
      if (m && atBarStart(c)) m.divisions = a.divisions;
    } else warn(raw, "bad-divisions", `<divisions> ${a.divisions} is not positive and was ignored`, c.measureIndex, "divisions");
  }
  if (a.staves !== undefined && a.staves > c.part.staves) c.part.staves = a.staves;
  if (a.chromatic !== undefined || a.octaveChange !== undefined) {
    c.transpose = (a.chromatic ?? 0) + 12 * (a.octaveChange ?? 0);
    if (c.transpose !== 0) {
      warn(raw, "transpose", `Transposing part ${c.part.id}: pitches are read at sounding pitch`, c.measureIndex, "transpose");
    }
  }
  const prev = c.state;
  const next: AttrState = { key: prev.key, time: prev.time, clefs: [...prev.clefs] };
  const change: { key?: KeySignature; time?: TimeSignature; clefs: Clef[] } = { clefs: [] };
  if (a.fifths !== undefined) {
    const key = { fifths: a.fifths, mode: a.mode || "major" };
    if (!sameKey(key, prev.key)) change.key = key;
    next.key = key;
  }
  const time = combineTime(a);
  if (time) {
    if (!sameTime(time, prev.time)) change.time = time;
    next.time = time;
  }
  for (const clef of a.clefs) {
    const i = next.clefs.findIndex((k) => k.staff === clef.staff);
    if (!sameClef(next.clefs[i], clef)) change.clefs.push(clef);
    if (i >= 0) next.clefs[i] = clef;
    else next.clefs.push(clef);
  }
  next.clefs.sort((x, y) => x.staff - y.staff);
  c.state = next;
  if (!m) return;
  const offset = position(c);
  if (offset.valueOf() === 0) m.start = { ...next, clefs: [...next.clefs] };
  const entries: AttributeChange[] = [];
  const head = { ...(change.key ? { key: change.key } : {}), ...(change.time ? { time: change.time } : {}) };
  if (change.clefs.length === 0 && (head.key || head.time)) entries.push({ offset, ...head });
  change.clefs.forEach((clef, i) => entries.push({ offset, ...(i === 0 ? head : {}), clef }));
  m.changes.push(...entries);
}

export interface DirectionDraft {
  staff: number;
  words: string[];
  dynamic?: string;
  shift?: { type: string; size: number };
  beatUnit?: string;
  beatDots: number;
  perMinute?: number;
}

/**
 * An empty `<direction>` draft.
 *
 * @example
 * newDirectionDraft({}).staff; // 1
 */
export function newDirectionDraft(_attrs: Record<string, string>): DirectionDraft {
  return { staff: 1, words: [], beatDots: 0 };
}

/**
 * Handle a closing tag inside `<direction>` (`code` and `parent` are element codes; `name` is needed
 * only for dynamics, whose element name is the value).
 *
 * @example
 * closeDirectionChild(draft, WORDS, OTHER, "words", "slowly", {}); // inside <direction-type>
 */
export function closeDirectionChild(
  d: DirectionDraft, code: number, parent: number, name: string, value: string, attrs: Record<string, string>,
): void {
  if (parent === DYNAMICS) {
    d.dynamic = code === OTHER_DYNAMICS ? value : name;
    return;
  }
  switch (code) {
    case STAFF: if (parent === DIRECTION) d.staff = Math.max(1, Number(value) || 1); break;
    case WORDS: if (value) d.words.push(value); break;
    case OCTAVE_SHIFT: d.shift = { type: attrs.type ?? "", size: Number(attrs.size ?? 8) || 8 }; break;
    case BEAT_UNIT: if (d.beatUnit === undefined) d.beatUnit = value; break;
    case BEAT_UNIT_DOT: d.beatDots += 1; break;
    case PER_MINUTE: d.perMinute = Number(value); break;
  }
}

const UNIT_QUARTERS: Record<string, number> = {
  whole: 4, half: 2, quarter: 1, eighth: 0.5, "16th": 0.25, "32nd": 0.125,
};

/**
 * Apply a finished `<direction>`; returns a quarter-note metronome mark when it wrote one.
 *
 * @example
 * finishDirection(draft, cursor); // 96 for ♩. = 64
 */
export function finishDirection(d: DirectionDraft, c: Cursor): number | undefined {
  if (d.shift) {
    if (d.shift.type === "stop") c.shift.delete(d.staff);
    else if (d.shift.type !== "continue") c.shift.set(d.staff, octaveShiftSemitones(d.shift.type, d.shift.size));
  }
  if (d.dynamic) c.pendingDynamic.set(d.staff, d.dynamic);
  if (d.words.length > 0) c.pendingWords.set(d.staff, d.words.join(" "));
  if (d.beatUnit && d.perMinute && UNIT_QUARTERS[d.beatUnit]) {
    let unit = UNIT_QUARTERS[d.beatUnit];
    let add = unit / 2;
    for (let i = 0; i < d.beatDots; i++, add /= 2) unit += add;
    return d.perMinute * unit;
  }
  return undefined;
}
