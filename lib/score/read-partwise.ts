/**
 * The streaming pass: one saxes walk over a partwise MusicXML file straight into `RawScore`.
 * Element handling is split by container: notes (read-note.ts), attributes and directions
 * (read-attributes.ts); this file keeps the element stack, the parts and the bars.
 */
import { SaxesParser } from "saxes";
import { ScoreError } from "./errors";
import { ZERO } from "./time";
import { advance, back, barSoFar, newCursor, startBar, toTime, type Cursor } from "./read-cursor";
import { closeNoteChild, finishNote, newNoteState, openNoteChild, type NoteState } from "./read-note";
import {
  closeAttributesChild, closeDirectionChild, finishAttributes, finishDirection, newAttrDraft,
  newDirectionDraft, type AttrDraft, type DirectionDraft,
} from "./read-attributes";
import type { RawMeasure, RawScore, ReadLimits } from "./read-types";
import { warn } from "./read-warnings";

/** Elements that change what sounds and that this reader does not model: each gives a warning. */
function isUnsupported(name: string): boolean {
  switch (name) {
    case "tremolo": case "glissando": case "slide": case "figured-bass": case "harmon-mute": case "multiple-rest":
      return true;
    default:
      return false;
  }
}

/**
 * Elements whose text the reader uses. Character data is collected only inside them: saxes then
 * skips building the whitespace strings between the other tags.
 */
function carriesText(name: string): boolean {
  switch (name) {
    case "step": case "alter": case "octave": case "duration": case "voice": case "staff": case "type":
    case "actual-notes": case "normal-notes": case "fingering": case "other-dynamics":
    case "divisions": case "fifths": case "mode": case "beats": case "beat-type": case "staves": case "sign":
    case "line": case "clef-octave-change": case "chromatic": case "octave-change":
    case "words": case "beat-unit": case "per-minute":
    case "work-title": case "movement-title": case "creator": case "part-name":
      return true;
    default:
      return false;
  }
}

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
  // The open elements: names, attributes and whether their text is collected, one slot per depth.
  const names: string[] = [];
  const attrStack: Record<string, string>[] = [];
  const textStack: boolean[] = [];
  let depth = 0;
  let chars = "";
  let cursor: Cursor | null = null;
  let note: NoteState | null = null;
  let attr: AttrDraft | null = null;
  let dir: DirectionDraft | null = null;
  let rootSeen = false;
  let scorePartId = "";
  const counter = { notes: 0 };

  const parser = new SaxesParser({ position: false });
  const onText = (t: string) => {
    chars += t;
  };
  let collecting = false;
  const collect = (on: boolean) => {
    if (on === collecting) return;
    collecting = on;
    if (on) parser.on("text", onText);
    else parser.off("text");
  };
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
    names[depth] = name;
    attrStack[depth] = attrs;
    const text = carriesText(name);
    textStack[depth] = text;
    depth += 1;
    chars = "";
    collect(text);
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
        if (cursor && isUnsupported(name)) {
          warn(raw, "unsupported", `<${name}> is not modelled and was left out`, cursor.measureIndex, name);
        }
    }
  });

  parser.on("cdata", onText);

  parser.on("closetag", () => {
    if (depth === 0) return;
    depth -= 1;
    const name = names[depth];
    const attrs = attrStack[depth];
    const parent = depth > 0 ? names[depth - 1] : "";
    const value = chars.length === 0 ? "" : chars.trim();
    chars = "";
    // Text after a child element belongs to the parent again.
    collect(depth > 0 && textStack[depth - 1]);
    const c = cursor as Cursor | null;
    if (note && c) {
      if (name === "note") {
        finishNote(note, c, raw, counter, limits);
        note = null;
      } else closeNoteChild(note, name, parent, value, attrs, c, raw);
      return;
    }
    if (attr && c) {
      if (name === "attributes") {
        finishAttributes(attr, c, raw);
        attr = null;
      } else closeAttributesChild(attr, name, parent, value, attrs, c, raw);
      return;
    }
    if (dir && c) {
      if (name === "direction") {
        const tempo = finishDirection(dir, c);
        if (tempo !== undefined && c.measure) setTempo(c.measure, tempo, false);
        dir = null;
      } else closeDirectionChild(dir, name, parent, value, attrs);
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
        if (parent === "identification" && attrs.type === "composer" && !raw.composer) raw.composer = value;
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
        if (c?.measure) {
          c.measure.length = barSoFar(c);
          c.measure = null;
        }
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
  startBar(c);
}

function moveCursor(c: Cursor, kind: "backup" | "forward", duration: number, raw: RawScore): void {
  if (duration === 0) return;
  const by = toTime(c, duration, kind);
  if (kind === "forward") advance(c, by);
  else if (!back(c, by)) {
    warn(raw, "backup-before-bar", "A <backup> goes before the start of the bar; clamped to the bar start", c.measureIndex, "backup");
  }
}

function setTempo(m: RawMeasure, bpm: number, fromSound: boolean): void {
  if (!Number.isFinite(bpm) || bpm <= 0) return;
  if (m.tempo === undefined || fromSound) m.tempo = Math.round(bpm * 100) / 100;
}
