/**
 * One drill on the printed page: number badge, title and tempo goals, the engraving, the student
 * note and an optional span warning. Measured before it is drawn so a drill never splits across pages.
 */
import SVGtoPDF from "svg-to-pdfkit";
import { FONT, fontForSvgText } from "./fonts";
import type { HandoutDrill } from "./input";
import { STYLE } from "./page-style";

export interface DrillArt {
  svg: string;
  /** Size of the SVG in px. */
  width: number;
  height: number;
}

export interface DrillLayout {
  titleHeight: number;
  artScale: number;
  artHeight: number;
  noteHeight: number;
  warningHeight: number;
  total: number;
}

const GAP_TITLE_ART = 2;
const GAP_ART_NOTE = 4;
const GAP_NOTE_WARNING = 7;
const WARNING_PAD = 6;

/** "♩ = 60 → 92" */
export function tempoLabel(tempo: HandoutDrill["tempo"]): string {
  return tempo.start === tempo.target ? `♩ = ${tempo.target}` : `♩ = ${tempo.start} → ${tempo.target}`;
}

function tempoWidth(doc: PDFKit.PDFDocument, drill: HandoutDrill): number {
  return doc.font(FONT.regular).fontSize(STYLE.size.tempo).widthOfString(tempoLabel(drill.tempo));
}

const warningText = (w: string) => `⚠  ${w}`;

/** Heights of each part of a drill block laid out `width` points wide; the art shrinks to `maxArtHeight`. */
export function measureDrill(
  doc: PDFKit.PDFDocument,
  drill: HandoutDrill,
  art: DrillArt,
  width: number,
  maxArtHeight = Infinity,
): DrillLayout {
  const textWidth = width - STYLE.indent;
  const titleWidth = textWidth - tempoWidth(doc, drill) - 16;
  doc.font(FONT.bold).fontSize(STYLE.size.drillTitle);
  const titleHeight = Math.max(STYLE.badge * 2, doc.heightOfString(drill.title, { width: titleWidth }));
  const artScale = Math.min(width / art.width, maxArtHeight / art.height);
  const artHeight = art.height * artScale;
  doc.font(FONT.regular).fontSize(STYLE.size.note);
  const noteHeight = drill.studentNote.trim() ? doc.heightOfString(drill.studentNote, { width: textWidth, lineGap: 2 }) : 0;
  doc.font(FONT.regular).fontSize(STYLE.size.warning);
  const warningHeight = drill.spanWarning
    ? doc.heightOfString(warningText(drill.spanWarning), { width: textWidth - 2 * WARNING_PAD }) + 2 * WARNING_PAD
    : 0;
  const total =
    titleHeight + GAP_TITLE_ART + artHeight + (noteHeight ? GAP_ART_NOTE + noteHeight : 0) +
    (warningHeight ? GAP_NOTE_WARNING + warningHeight : 0);
  return { titleHeight, artScale, artHeight, noteHeight, warningHeight, total };
}

/** Draws a measured drill block with its top-left corner at (x, y). */
export function drawDrill(
  doc: PDFKit.PDFDocument,
  index: number,
  drill: HandoutDrill,
  art: DrillArt,
  layout: DrillLayout,
  x: number,
  y: number,
  width: number,
): void {
  const textX = x + STYLE.indent;
  const textWidth = width - STYLE.indent;
  // number badge
  doc.circle(x + STYLE.badge, y + STYLE.badge, STYLE.badge).fill(STYLE.accent);
  doc.font(FONT.bold).fontSize(10).fillColor("#ffffff");
  doc.text(String(index + 1), x, y + STYLE.badge - 6, { width: STYLE.badge * 2, align: "center", lineBreak: false });
  // title and tempo goals
  const tw = tempoWidth(doc, drill);
  doc.font(FONT.bold).fontSize(STYLE.size.drillTitle).fillColor(STYLE.ink);
  doc.text(drill.title, textX, y + 2, { width: textWidth - tw - 16 });
  doc.font(FONT.regular).fontSize(STYLE.size.tempo).fillColor(STYLE.accent);
  doc.text(tempoLabel(drill.tempo), x + width - tw, y + 3.5, { width: tw + 1, lineBreak: false });
  // engraving
  let cy = y + layout.titleHeight + GAP_TITLE_ART;
  doc.save();
  doc.translate(x, cy).scale(layout.artScale);
  SVGtoPDF(doc, art.svg, 0, 0, {
    width: art.width,
    height: art.height,
    assumePt: true,
    fontCallback: (_family, bold, italic) => fontForSvgText(bold, italic),
  });
  doc.restore();
  cy += layout.artHeight;
  if (layout.noteHeight) {
    cy += GAP_ART_NOTE;
    doc.font(FONT.regular).fontSize(STYLE.size.note).fillColor(STYLE.ink);
    doc.text(drill.studentNote, textX, cy, { width: textWidth, lineGap: 2 });
    cy += layout.noteHeight;
  }
  if (drill.spanWarning && layout.warningHeight) {
    cy += GAP_NOTE_WARNING;
    doc.roundedRect(textX, cy, textWidth, layout.warningHeight, 3).fillAndStroke(STYLE.warnFill, STYLE.warnStroke);
    doc.font(FONT.regular).fontSize(STYLE.size.warning).fillColor(STYLE.ink);
    doc.text(warningText(drill.spanWarning), textX + WARNING_PAD, cy + WARNING_PAD, { width: textWidth - 2 * WARNING_PAD });
  }
}
