/**
 * Renders a drill sheet as a printable PDF handout: header, each drill engraved and never split
 * across pages, and a footer with the caution and page numbers on every page. Text uses the
 * embedded handout TTF so ♭, ♯ and ♩ print everywhere.
 */
import PDFDocument from "pdfkit";
import { drawDrill, measureDrill, type DrillArt } from "./drill-block";
import { FONT, handoutFontPath, registerHandoutFonts } from "./fonts";
import { HandoutInputSchema, PAGE_SIZE_PT, type HandoutInput } from "./input";
import { contentBottom, drawFooters, drawRunningHeader, drawSheetHeader } from "./page-chrome";
import { STYLE } from "./page-style";
import { engravedDrillSvg } from "./engraving-cache";
import { svgSize } from "./svg-size";

/** Engraving width in px; at A4's column (≈ 487 pt) a staff is ≈ 7 mm high, a usual print size. */
const ART_WIDTH_PX = 820;

function collect(doc: PDFKit.PDFDocument): Promise<Uint8Array> {
  return new Promise((resolve, reject) => {
    const chunks: Buffer[] = [];
    doc.on("data", (c: Buffer) => chunks.push(c));
    doc.on("end", () => resolve(new Uint8Array(Buffer.concat(chunks))));
    doc.on("error", reject);
  });
}

/**
 * The handout PDF for one drill sheet.
 * @example
 *   const pdf = await renderHandoutPdf({
 *     sheetTitle: "Smooth thirds", pieceTitle: "Two Ribbons", bars: "bars 1–2, right hand",
 *     studentName: "Ada Example", date: "3 March 2025", paper: "a4",
 *     drills: [{ title: "Thirds in slow pairs", musicxml, studentNote: "Lift between pairs.",
 *                tempo: { start: 50, target: 72 } }],
 *   });
 *   // pdf is a Uint8Array starting with "%PDF-"
 */
export async function renderHandoutPdf(raw: HandoutInput): Promise<Uint8Array> {
  const input = HandoutInputSchema.parse(raw);
  const arts: DrillArt[] = [];
  for (const drill of input.drills) {
    const svg = await engravedDrillSvg(drill.musicxml, ART_WIDTH_PX);
    arts.push({ svg, ...svgSize(svg) });
  }

  const size = PAGE_SIZE_PT[input.paper];
  const margins = { ...STYLE.margin };
  const doc = new PDFDocument({
    size: [size.width, size.height],
    margins,
    bufferPages: true,
    font: handoutFontPath("regular"),
    info: { Title: input.sheetTitle, Subject: `${input.pieceTitle}, ${input.bars}`, Creator: "Knotwork" },
    displayTitle: true,
    lang: "en",
  });
  const done = collect(doc);
  registerHandoutFonts(doc);
  doc.font(FONT.regular);

  const x = STYLE.margin.left;
  const width = size.width - STYLE.margin.left - STYLE.margin.right;
  let y = drawSheetHeader(doc, input);
  let pageTop = y;
  input.drills.forEach((drill, i) => {
    let layout = measureDrill(doc, drill, arts[i], width);
    if (y + layout.total > contentBottom(doc) && y > pageTop) {
      doc.addPage({ size: [size.width, size.height], margins });
      y = pageTop = drawRunningHeader(doc, input);
    }
    const room = contentBottom(doc) - y;
    if (layout.total > room) {
      // taller than a whole page: shrink the engraving so the block still fits on one page
      const maxArt = Math.max(40, layout.artHeight - (layout.total - room));
      layout = measureDrill(doc, drill, arts[i], width, maxArt);
    }
    drawDrill(doc, i, drill, arts[i], layout, x, y, width);
    y += layout.total + STYLE.gapBetweenDrills;
  });

  drawFooters(doc);
  doc.end();
  return done;
}
