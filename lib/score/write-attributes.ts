/**
 * `<attributes>`, `<direction>` and `<barline>` elements for the MusicXML writer.
 */
import type { Clef, KeySignature, Measure, NoteEvent, TimeSignature } from "./types";
import { el, empty, escapeXml } from "./write-xml";

/** What an `<attributes>` element states; absent fields are left out. */
export interface AttributesState {
  readonly divisions?: number;
  readonly key?: KeySignature;
  readonly time?: TimeSignature;
  readonly staves?: number;
  readonly clefs?: readonly Clef[];
}

/**
 * An `<attributes>` element (XSD order: divisions, key, time, staves, clef), or "" when empty.
 * @example
 *   attributesXml({ divisions: 2, time: { beats: 3, beatType: 4 } });
 */
export function attributesXml(a: AttributesState): string {
  const parts: string[] = [];
  if (a.divisions !== undefined) parts.push(el("divisions", a.divisions));
  if (a.key) {
    const mode = a.key.mode ? el("mode", a.key.mode) : "";
    parts.push(`<key>${el("fifths", a.key.fifths)}${mode}</key>`);
  }
  if (a.time) parts.push(`<time>${el("beats", a.time.beats)}${el("beat-type", a.time.beatType)}</time>`);
  if (a.staves !== undefined && a.staves > 1) parts.push(el("staves", a.staves));
  for (const c of a.clefs ?? []) parts.push(clefXml(c, (a.staves ?? 1) > 1 || c.staff > 1));
  return parts.length > 0 ? `<attributes>${parts.join("")}</attributes>` : "";
}

function clefXml(c: Clef, numbered: boolean): string {
  const line = c.sign === "percussion" || c.sign === "none" ? "" : el("line", c.line);
  const octave = c.octaveChange ? el("clef-octave-change", c.octaveChange) : "";
  return `<clef${numbered ? ` number="${c.staff}"` : ""}>${el("sign", c.sign)}${line}${octave}</clef>`;
}

export const sameKey = (a?: KeySignature, b?: KeySignature): boolean =>
  !!a && !!b && a.fifths === b.fifths && (a.mode || "") === (b.mode || "");
export const sameTime = (a?: TimeSignature, b?: TimeSignature): boolean =>
  !!a && !!b && a.beats === b.beats && a.beatType === b.beatType;
export const sameClef = (a?: Clef, b?: Clef): boolean =>
  !!a && !!b && a.sign === b.sign && a.line === b.line && (a.octaveChange ?? 0) === (b.octaveChange ?? 0);

const DYNAMICS = new Set([
  "p", "pp", "ppp", "pppp", "ppppp", "pppppp", "f", "ff", "fff", "ffff", "fffff", "ffffff",
  "mp", "mf", "sf", "sfp", "sfpp", "fp", "rf", "rfz", "sfz", "sffz", "fz", "n", "pf", "sfzp",
]);

/**
 * `<direction>` elements for an event's dynamic (below) and words (above), on the event's staff.
 * @example
 *   eventDirectionsXml(event); // '<direction placement="below">…<dynamics><f/></dynamics>…'
 */
export function eventDirectionsXml(event: NoteEvent): string {
  let out = "";
  const staff = el("staff", event.staff);
  if (event.words) {
    out += `<direction placement="above"><direction-type>${el("words", event.words)}</direction-type>${staff}</direction>`;
  }
  if (event.dynamic) {
    const d = event.dynamic.trim();
    const mark = DYNAMICS.has(d) ? empty(d) : el("other-dynamics", d);
    out += `<direction placement="below"><direction-type><dynamics>${mark}</dynamics></direction-type>${staff}</direction>`;
  }
  return out;
}

/**
 * A metronome mark with its playback tempo (quarter = bpm).
 * @example
 *   tempoXml(72); // '<direction placement="above">…<per-minute>72</per-minute>…<sound tempo="72"/></direction>'
 */
export function tempoXml(bpm: number): string {
  return (
    `<direction placement="above"><direction-type><metronome>${el("beat-unit", "quarter")}` +
    `${el("per-minute", bpm)}</metronome></direction-type>${empty("sound", { tempo: bpm })}</direction>`
  );
}

/**
 * Left and right `<barline>`s of a bar from its repeat marks (XSD order: bar-style, ending, repeat).
 * An ending that starts in a bar closing a repeat also stops there; a bar with a final
 * barline gets light-heavy.
 * @example
 *   barlinesXml(measure, true).right; // '<barline location="right"><bar-style>light-heavy</bar-style></barline>'
 */
export function barlinesXml(m: Measure, last: boolean): { left: string; right: string } {
  const r = m.repeat;
  let left = "";
  let right = "";
  const ending = r?.ending;
  const leftParts: string[] = [];
  if (r?.forward) leftParts.push(el("bar-style", "heavy-light"));
  if (ending?.type === "start") leftParts.push(empty("ending", { number: ending.number, type: "start" }));
  if (r?.forward) leftParts.push(empty("repeat", { direction: "forward" }));
  if (leftParts.length > 0) left = `<barline location="left">${leftParts.join("")}</barline>`;

  const rightParts: string[] = [];
  if (r?.backward || last) rightParts.push(el("bar-style", "light-heavy"));
  if (ending && ending.type !== "start") {
    rightParts.push(empty("ending", { number: ending.number, type: ending.type }));
  } else if (ending?.type === "start" && (r?.backward || last)) {
    rightParts.push(empty("ending", { number: ending.number, type: r?.backward ? "stop" : "discontinue" }));
  }
  if (r?.backward) rightParts.push(empty("repeat", { direction: "backward", times: r.times }));
  if (rightParts.length > 0) right = `<barline location="right">${rightParts.join("")}</barline>`;
  return { left, right };
}

export { escapeXml };
