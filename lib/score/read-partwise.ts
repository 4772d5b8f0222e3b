/**
 * The streaming pass: one saxes walk over a partwise MusicXML file straight into `RawScore`.
 * Element handling is split by container: notes (read-note.ts), attributes and directions
 * (read-attributes.ts); this file keeps the element stack, the parts and the bars.
 */
import { SaxesParser } from "saxes";
import { ScoreError } from "./errors";
import { ZERO } from "./time";
import { advance, back, barSoFar, newCursor, position, startBar, toTime, type Cursor } from "./read-cursor";
import { landOnBoundary } from "./read-snap";
import { closeNoteChild, finishNote, newNoteState, openNoteChild, resetNoteState } from "./read-note";
import {
  closeAttributesChild, closeDirectionChild, finishAttributes, finishDirection, newAttrDraft,
  newDirectionDraft, type AttrDraft, type DirectionDraft,
} from "./read-attributes";
import {
  ATTRIBUTES, BACKUP, carriesText, CREATOR, DIRECTION, DURATION, elementCode, ENDING, FORWARD, IDENTIFICATION,
  MEASURE, MOVEMENT_TITLE, NOTE, PART, PART_NAME, REPEAT, SCORE_PART, SOUND, UNSUPPORTED, WORK_TITLE,
} from "./read-names";
import type { RawMeasure, RawScore, ReadLimits } from "./read-types";
import type { XmlCleaner } from "./sanitize";
import { warn } from "./read-warnings";

/** saxes keeps its handlers in fields; setting the text one directly skips `on`/`off`'s name lookup. */
type TextSlot = { textHandler?: (text: string) => void };

/**
 * Read partwise MusicXML text (already checked by `assertSafeXml`) into the raw model. A `cleaner`
 * (sanitize.ts) is fed from the same pass, so the cleaned copy costs no second parse.
 *
 * @example
 * parsePartwise('<score-partwise>…</score-partwise>', DEFAULT_LIMITS).parts.get("P1");
 */
export function parsePartwise(text: string, limits: ReadLimits, cleaner?: XmlCleaner): RawScore {
  const raw: RawScore = {
    title: "", movementTitle: "", composer: "", partNames: new Map(), partOrder: [], parts: new Map(), warnings: [],
  };
  // The open elements: names, codes (read-names.ts), attributes and whether their text is collected,
  // one slot per depth.
  const names: string[] = [];
  const codes: number[] = [];
  const attrStack: Record<string, string>[] = [];
  const textStack: boolean[] = [];
  let depth = 0;
  let chars = "";
  let cursor: Cursor | null = null;
  // One note draft serves the whole file; `inNote` says whether a <note> is open.
  const note = newNoteState();
  let inNote = false;
  let attr: AttrDraft | null = null;
  let dir: DirectionDraft | null = null;
  let rootSeen = false;
  let scorePartId = "";
  const counter = { notes: 0 };

  const parser = new SaxesParser({ position: false });
  const slot = parser as unknown as TextSlot;
  const onText = (t: string) => {
    chars += t;
  };
  // What the text handler is while an element's text is collected, and while it is not. With a
  // cleaner every piece of text goes to it, so the handler stays set and only collection switches.
  let collecting = false;
  let textOn: ((t: string) => void) | undefined = onText;
  let textOff: ((t: string) => void) | undefined;
  if (cleaner) {
    textOn = (t) => {
      cleaner.text(t);
      if (collecting) chars += t;
    };
    textOff = textOn;
    slot.textHandler = textOn;
  }
  parser.on("opentag", (tag) => {
    if (cleaner) cleaner.openTag(tag);
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
    const code = elementCode(name);
    names[depth] = name;
    codes[depth] = code;
    attrStack[depth] = attrs;
    const text = carriesText(code);
    textStack[depth] = text;
    depth += 1;
    chars = "";
    collecting = text;
    slot.textHandler = text ? textOn : textOff;
    switch (code) {
      case SCORE_PART:
        scorePartId = attrs.id ?? "";
        break;
      case PART: {
        const id = attrs.id ?? `P${raw.partOrder.length + 1}`;
        if (!raw.partNames.has(id)) warn(raw, "part-not-listed", `Part ${id} is not in the part list`, undefined, "part");
        const part = { id, staves: 1, measures: [], events: [] };
        raw.parts.set(id, part);
        raw.partOrder.push(id);
        cursor = newCursor(part);
        break;
      }
      case MEASURE:
        if (cursor) openMeasure(cursor, attrs, limits);
        break;
      case NOTE:
        if (cursor) {
          resetNoteState(note);
          inNote = true;
        }
        break;
      case ATTRIBUTES:
        attr = newAttrDraft();
        break;
      case DIRECTION:
        dir = newDirectionDraft(attrs);
        break;
      case SOUND:
        if (cursor?.measure && attrs.tempo !== undefined) setTempo(cursor.measure, Number(attrs.tempo), true);
        break;
      case REPEAT:
        if (cursor?.measure) {
          const r = cursor.measure.repeat ?? {};
          cursor.measure.repeat = attrs.direction === "backward"
            ? { ...r, backward: true, ...(attrs.times ? { times: Number(attrs.times) } : {}) }
            : { ...r, forward: true };
        }
        break;
      case ENDING:
        if (cursor?.measure) {
          const type = attrs.type === "start" || attrs.type === "stop" ? attrs.type : "discontinue";
          cursor.measure.repeat = { ...cursor.measure.repeat, ending: { number: attrs.number ?? "", type } };
        }
        break;
      case UNSUPPORTED:
        if (cursor) warn(raw, "unsupported", `<${name}> is not modelled and was left out`, cursor.measureIndex, name);
        break;
      default:
        if (inNote) openNoteChild(note, code, attrs);
    }
  });

  parser.on("cdata", cleaner ? (t) => {
    cleaner.cdata(t);
    chars += t;
  } : onText);

  parser.on("closetag", (tag) => {
    if (cleaner) cleaner.closeTag(tag);
    if (depth === 0) return;
    depth -= 1;
    const code = codes[depth];
    const attrs = attrStack[depth];
    const parent = depth > 0 ? codes[depth - 1] : -1;
    const value = chars.length === 0 ? "" : chars.trim();
    chars = "";
    // Text after a child element belongs to the parent again.
    collecting = depth > 0 && textStack[depth - 1];
    slot.textHandler = collecting ? textOn : textOff;
    const c = cursor as Cursor | null;
    if (inNote && c) {
      if (code === NOTE) {
        finishNote(note, c, raw, counter, limits);
        inNote = false;
      } else closeNoteChild(note, code, parent, names[depth], value, attrs, c, raw);
      return;
    }
    if (attr && c) {
      if (code === ATTRIBUTES) {
        finishAttributes(attr, c, raw);
        attr = null;
      } else closeAttributesChild(attr, code, parent, value, attrs, c, raw);
      return;
    }
    if (dir && c) {
      if (code === DIRECTION) {
        const tempo = finishDirection(dir, c);
        if (tempo !== undefined && c.measure) setTempo(c.measure, tempo, false);
        dir = null;
      } else closeDirectionChild(dir, code, parent, names[depth], value, attrs);
      return;
    }
    switch (code) {
      case WORK_TITLE:
        raw.title = value;
        break;
      case MOVEMENT_TITLE:
        raw.movementTitle = value;
        break;
      case CREATOR:
        if (parent === IDENTIFICATION && attrs.type === "composer" && !raw.composer) raw.composer = value;
        break;
      case PART_NAME:
        if (parent === SCORE_PART && scorePartId) raw.partNames.set(scorePartId, value);
        break;
      case SCORE_PART:
        if (scorePartId && !raw.partNames.has(scorePartId)) raw.partNames.set(scorePartId, "");
        break;
      case DURATION:
        if (c && (parent === BACKUP || parent === FORWARD)) moveCursor(c, parent === BACKUP ? "backup" : "forward", Number(value), raw);
        break;
      case MEASURE:
        if (c?.measure) {
          c.measure.length = barSoFar(c);
          c.measure = null;
        }
        break;
      case PART:
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
  startBar(c);
}

function moveCursor(c: Cursor, kind: "backup" | "forward", duration: number, raw: RawScore): void {
  if (duration === 0) return;
  const by = toTime(c, duration, kind);
  const before = kind === "backup" && c.snapCount > 0 ? position(c) : null;
  if (kind === "forward") advance(c, by);
  else if (!back(c, by) && !(before && by.sub(before).mul(c.divisions).compare(c.snapCount) < 0)) {
    warn(raw, "backup-before-bar", "A <backup> goes before the start of the bar; clamped to the bar start", c.measureIndex, "backup");
  }
  landOnBoundary(c);
}

function setTempo(m: RawMeasure, bpm: number, fromSound: boolean): void {
  if (!Number.isFinite(bpm) || bpm <= 0) return;
  if (m.tempo === undefined || fromSound) m.tempo = Math.round(bpm * 100) / 100;
}
