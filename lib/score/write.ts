/**
 * Writes the score model as MusicXML 4.0 (score-partwise) text that validates against the
 * MusicXML 4.0 XSD.
 */
import Fraction from "fraction.js";
import type { PartInfo, Score } from "./types";
import { divisionsFor } from "./write-durations";
import { measureXml, type PartState } from "./write-measure";
import { piecesByMeasure, type Piece } from "./write-pieces";
import { partHomeStaffs } from "./write-voices";
import { partMeasure } from "./part-measure";
import { el } from "./write-xml";

/**
 * Serialises a score as MusicXML 4.0 partwise text.
 *
 * Divisions are the LCM of the denominators of every onset (within its bar) and duration in the
 * part, written in the first bar. Notes that cross a barline are split and tied; each voice is
 * written in onset order with `<backup>`/`<forward>` between voices and staves; gaps in the first
 * voice of a staff become rests. Type and dots are derived from the duration when the model has
 * none (or one that no longer fits), tuplets get `<time-modification>` and brackets, beams follow
 * the beat, and key, time and clefs are written in the first bar and wherever they change.
 * @example
 *   const xml = writeMusicXML(score); // '<?xml version="1.0" encoding="UTF-8"?>\n<score-partwise version="4.0">…'
 */
export function writeMusicXML(score: Score): string {
  const parts = partIds(score.parts);
  const out: string[] = ['<?xml version="1.0" encoding="UTF-8" standalone="no"?>', '<score-partwise version="4.0">'];
  out.push(headerXml(score));
  out.push("<part-list>");
  for (const part of score.parts) {
    const id = parts.get(part.id)!;
    const name = part.name.trim() || "Piano";
    out.push(
      `<score-part id="${id}">${el("part-name", name)}` +
        `<score-instrument id="${id}-I1">${el("instrument-name", "Piano")}</score-instrument>` +
        `<midi-instrument id="${id}-I1">${el("midi-channel", 1)}${el("midi-program", 1)}</midi-instrument>` +
        `</score-part>`,
    );
  }
  out.push("</part-list>");
  for (const part of score.parts) out.push(partXml(score, part, parts.get(part.id)!));
  out.push("</score-partwise>");
  return out.join("\n") + "\n";
}

function headerXml(score: Score): string {
  const { title, composer, subtitle } = score.meta;
  const parts: string[] = [];
  if (title) parts.push(`<work>${el("work-title", title)}</work>`, el("movement-title", title));
  const creator = composer ? el("creator", composer, { type: "composer" }) : "";
  parts.push(`<identification>${creator}<encoding>${el("software", "Knotwork")}</encoding></identification>`);
  if (subtitle) {
    parts.push(`<credit page="1">${el("credit-type", "subtitle")}${el("credit-words", subtitle)}</credit>`);
  }
  return parts.join("\n");
}

/** Part ids as written: the model's id when it is a valid XML ID, otherwise P1, P2 … */
function partIds(parts: readonly PartInfo[]): Map<string, string> {
  const ids = new Map<string, string>();
  const used = new Set<string>();
  parts.forEach((p, i) => {
    let id = /^[A-Za-z_][A-Za-z0-9_.-]*$/.test(p.id) && !used.has(p.id) ? p.id : `P${i + 1}`;
    while (used.has(id)) id = `${id}_`;
    used.add(id);
    ids.set(p.id, id);
  });
  return ids;
}

function partXml(score: Score, part: PartInfo, id: string): string {
  const byBar = piecesByMeasure(score, part.id);
  const staves = Math.max(1, part.staves, ...byBar.flat().map((p) => p.event.staff));
  const divisions = partDivisions(score, byBar);
  const state: PartState = { clefs: new Map(), homeStaff: partHomeStaffs(score.events.filter((e) => e.part === part.id)) };
  const measures = score.measures;
  if (measures.length === 0) return `<part id="${id}">\n<measure number="1"/>\n</part>`;
  const body = measures.map((m, i) =>
    measureXml(partMeasure(m, part.id), byBar[i], {
      part: part.id,
      staves,
      divisions,
      first: i === 0,
      last: i === measures.length - 1,
      state,
    }),
  );
  return `<part id="${id}">\n${body.join("\n")}\n</part>`;
}

function partDivisions(score: Score, byBar: readonly Piece[][]): number {
  const values: Fraction[] = [];
  score.measures.forEach((m, i) => {
    values.push(m.length);
    for (const c of m.changes) values.push(c.offset);
    for (const p of byBar[i]) values.push(p.onset.sub(m.start), p.duration);
  });
  return divisionsFor(values);
}
