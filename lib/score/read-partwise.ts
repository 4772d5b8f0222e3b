/**
 * The streaming pass: one saxes walk over a partwise MusicXML file straight into `RawScore`.
 * Element handling is split by container: notes (read-note.ts), attributes and directions
 * (read-attributes.ts); this file keeps the element stack, the parts and the bars.
 */
import { SaxesParser } from "saxes";
import { ScoreError } from "./errors";
import { ZERO } from "./time";
import { newCursor, toTime, type Cursor } from "./read-cursor";
import { closeNoteChild, finishNote, newNoteState, openNoteChild, type NoteState } from "./read-note";
import {
  closeAttributesChild, closeDirectionChild, finishAttributes, finishDirection, newAttrDraft,
  newDirectionDraft, type AttrDraft, type DirectionDraft,
} from "./read-attributes";
import type { RawMeasure, RawScore, ReadLimits } from "./read-types";
import { warn } from "./read-warnings";

interface Frame {
  readonly name: string;
  readonly attrs: Record<string, string>;
}

/** Elements that change what sounds and that this reader does not model: each gives a warning. */
const UNSUPPORTED = new Set(["tremolo", "glissando", "slide", "figured-bass", "harmon-mute", "multiple-rest"]);

/**
 * Read partwise MusicXML text (already checked by `assertSafeXml`) into the raw model.
 *
 * @example
 * parsePartwise('<score-partwise>…</score-partwise>', DEFAULT_LIMITS).parts.get("P1");
 */
export function parsePartwise(text: string, limits: ReadLimits): RawScore {
  const raw: RawScore = {
    title: "", movementTitle: "", composer: "", partNames: new Map(), partOrder: [], parts: new Map(), warnings: [],
  };
  const stack: Frame[] = [];
  let chars = "";
  let cursor: Cursor | null = null;
  let note: NoteState | null = null;
  let attr: AttrDraft | null = null;
  let dir: DirectionDraft | null = null;
  let rootSeen = false;
  let scorePartId = "";
  const counter = { notes: 0 };

  const parser = new SaxesParser({ position: false });
  parser.on("opentag", (tag) => {
    const name = tag.name;
    const attrs = tag.attributes as Record<string, string>;
    if (!rootSeen) {
      rootSeen = true;
      if (name === "score-timewise") {
        throw new ScoreError("timewise", "Timewise MusicXML (score-timewise) is not supported; export the piece as partwise MusicXML", { element: name });
      }
      if (name !== "score-partwise") {
        throw new ScoreError("not-musicxml", `The root element is <${name}>, not <score-partwise>`, { element: name });
      }
    }
    stack.push({ name, attrs });
    chars = "";
    switch (name) {
      case "score-part":
        scorePartId = attrs.id ?? "";
        break;
      case "part": {
        const id = attrs.id ?? `P${raw.partOrder.length + 1}`;
        if (!raw.partNames.has(id)) warn(raw, "part-not-listed", `Part ${id} is not in the part list`, undefined, "part");
        const part = { id, staves: 1, measures: [], events: [] };
        raw.parts.set(id, part);
        raw.partOrder.push(id);
        cursor = newCursor(part);
        break;
      }
      case "measure":
        if (cursor) openMeasure(cursor, attrs, limits);
        break;
      case "note":
        if (cursor) note = newNoteState();
        break;
      case "attributes":
        attr = newAttrDraft();
        break;
      case "direction":
        dir = newDirectionDraft(attrs);
        break;
      case "sound":
        if (cursor?.measure && attrs.tempo !== undefined) setTempo(cursor.measure, Number(attrs.tempo), true);
        break;
      case "repeat":
        if (cursor?.measure) {
          const r = cursor.measure.repeat ?? {};
          cursor.measure.repeat = attrs.direction === "backward"
            ? { ...r, backward: true, ...(attrs.times ? { times: Number(attrs.times) } : {}) }
            : { ...r, forward: true };
        }
        break;
      case "ending":
        if (cursor?.measure) {
          const type = attrs.type === "start" || attrs.type === "stop" ? attrs.type : "discontinue";
          cursor.measure.repeat = { ...cursor.measure.repeat, ending: { number: attrs.number ?? "", type } };
        }
        break;
      default:
        if (note) openNoteChild(note, name, attrs);
        if (UNSUPPORTED.has(name) && cursor) {
          warn(raw, "unsupported", `<${name}> is not modelled and was left out`, cursor.measureIndex, name);
        }
    }
  });

  parser.on("text", (t) => {
    chars += t;
  });
  parser.on("cdata", (t) => {
    chars += t;
  });

  parser.on("closetag", () => {
    const frame = stack.pop();
    if (!frame) return;
    const name = frame.name;
    const parent = stack.length > 0 ? stack[stack.length - 1].name : "";
    const value = chars.trim();
    chars = "";
    const c = cursor as Cursor | null;
    if (note && c) {
      if (name === "note") {
        finishNote(note, c, raw, counter, limits);
        note = null;
      } else closeNoteChild(note, name, parent, value, frame.attrs, c, raw);
      return;
    }
    if (attr && c) {
      if (name === "attributes") {
        finishAttributes(attr, c, raw);
        attr = null;
      } else closeAttributesChild(attr, name, parent, value, frame.attrs, c, raw);
      return;
    }
    if (dir && c) {
      if (name === "direction") {
        const tempo = finishDirection(dir, c);
        if (tempo !== undefined && c.measure) setTempo(c.measure, tempo, false);
        dir = null;
      } else closeDirectionChild(dir, name, parent, value, frame.attrs);
      return;
    }
    switch (name) {
      case "work-title":
        raw.title = value;
        break;
      case "movement-title":
        raw.movementTitle = value;
        break;
      case "creator":
        if (parent === "identification" && frame.attrs.type === "composer" && !raw.composer) raw.composer = value;
        break;
      case "part-name":
        if (parent === "score-part" && scorePartId) raw.partNames.set(scorePartId, value);
        break;
      case "score-part":
        if (scorePartId && !raw.partNames.has(scorePartId)) raw.partNames.set(scorePartId, "");
        break;
      case "duration":
        if (c && (parent === "backup" || parent === "forward")) moveCursor(c, parent, Number(value), raw);
        break;
      case "measure":
        if (c) c.measure = null;
        break;
      case "part":
        cursor = null;
        break;
    }
  });

  try {
    parser.write(text).close();
  } catch (e) {
    if (e instanceof ScoreError) throw e;
    throw new ScoreError("xml-malformed", `The XML is not well formed: ${(e as Error).message}`);
  }
  if (!rootSeen) throw new ScoreError("not-musicxml", "The file holds no XML element");
  if (raw.partOrder.length === 0) throw new ScoreError("not-musicxml", "The file has no <part>", { element: "part" });
  return raw;
}

function openMeasure(c: Cursor, attrs: Record<string, string>, limits: ReadLimits): void {
  c.measureIndex += 1;
  if (c.measureIndex >= limits.maxMeasures) {
    throw new ScoreError("too-many-measures", `The part ${c.part.id} has more than ${limits.maxMeasures} measures`, {
      measure: c.measureIndex, element: "measure",
    });
  }
  const m: RawMeasure = {
    number: attrs.number ?? String(c.measureIndex + 1),
    implicit: attrs.implicit === "yes",
    length: ZERO,
    divisions: c.divisions,
    start: { ...c.state, clefs: [...c.state.clefs] },
    changes: [],
  };
  c.part.measures.push(m);
  c.measure = m;
  c.pos = ZERO;
  c.lastOnset = ZERO;
}

function moveCursor(c: Cursor, kind: "backup" | "forward", duration: number, raw: RawScore): void {
  if (duration === 0) return;
  const by = toTime(c, duration, kind);
  if (kind === "forward") {
    c.pos = c.pos.add(by);
    if (c.measure && c.pos.compare(c.measure.length) > 0) c.measure.length = c.pos;
    return;
  }
  c.pos = c.pos.sub(by);
  if (c.pos.compare(0) < 0) {
    warn(raw, "backup-before-bar", "A <backup> goes before the start of the bar; clamped to the bar start", c.measureIndex, "backup");
    c.pos = ZERO;
  }
}

function setTempo(m: RawMeasure, bpm: number, fromSound: boolean): void {
  if (!Number.isFinite(bpm) || bpm <= 0) return;
  if (m.tempo === undefined || fromSound) m.tempo = Math.round(bpm * 100) / 100;
}
