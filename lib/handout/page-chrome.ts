/** The parts of a handout page around the drills: first-page header, running header, footer. */
import { FONT } from "./fonts";
import { HANDOUT_CAUTION, type HandoutInput } from "./input";
import { STYLE } from "./page-style";

const contentWidth = (doc: PDFKit.PDFDocument) => doc.page.width - STYLE.margin.left - STYLE.margin.right;

/** Draws the first-page header and returns the y where the drills start. */
export function drawSheetHeader(doc: PDFKit.PDFDocument, input: HandoutInput): number {
  const x = STYLE.margin.left;
  const width = contentWidth(doc);
  let y: number = STYLE.margin.top;
  if (input.studioName) {
    doc.font(FONT.bold).fontSize(STYLE.size.studio).fillColor(STYLE.accent);
    doc.text(input.studioName.toUpperCase(), x, y, { width, characterSpacing: 1.4, lineBreak: false });
    y += 16;
  }
  doc.font(FONT.bold).fontSize(STYLE.size.title).fillColor(STYLE.ink);
  doc.text(input.sheetTitle, x, y, { width });
  y += doc.heightOfString(input.sheetTitle, { width }) + 3;
  const subtitle = `${input.pieceTitle} · ${input.bars}`;
  doc.font(FONT.regular).fontSize(STYLE.size.subtitle).fillColor(STYLE.muted);
  doc.text(subtitle, x, y, { width });
  y += doc.heightOfString(subtitle, { width }) + 9;
  y = drawMetaRow(doc, input, x, y, width);
  doc.moveTo(x, y).lineTo(x + width, y).lineWidth(1.2).strokeColor(STYLE.accent).stroke();
  return y + 18;
}

function drawMetaRow(doc: PDFKit.PDFDocument, input: HandoutInput, x: number, y: number, width: number): number {
  // A copy printed without a student gets a blank line to write the name on.
  const cells: [string, string | null][] = [["Student", input.studentName ?? null], ["Date", input.date]];
  let cx = x;
  for (const [label, value] of cells) {
    doc.font(FONT.regular).fontSize(STYLE.size.meta - 1.5).fillColor(STYLE.faint);
    const lw = doc.widthOfString(label.toUpperCase(), { characterSpacing: 0.8 });
    doc.text(label.toUpperCase(), cx, y + 1.5, { characterSpacing: 0.8, lineBreak: false });
    let vw: number = STYLE.blankNameWidth;
    if (value === null) {
      const ly = y + STYLE.size.meta + 1;
      doc.moveTo(cx + lw + 6, ly).lineTo(cx + lw + 6 + vw, ly).lineWidth(0.5).strokeColor(STYLE.faint).stroke();
    } else {
      doc.font(FONT.regular).fontSize(STYLE.size.meta).fillColor(STYLE.ink);
      vw = Math.min(doc.widthOfString(value), width / 2);
      doc.text(value, cx + lw + 6, y, { width: vw + 1, lineBreak: false, ellipsis: true });
    }
    cx += lw + 6 + vw + 26;
  }
  return y + 18;
}

/** Draws the slim header of pages after the first and returns the y where the drills start. */
export function drawRunningHeader(doc: PDFKit.PDFDocument, input: HandoutInput): number {
  const x = STYLE.margin.left;
  const width = contentWidth(doc);
  const y = STYLE.margin.top;
  const right = input.studentName ?? input.date;
  doc.font(FONT.regular).fontSize(STYLE.size.running).fillColor(STYLE.muted);
  const rw = doc.widthOfString(right);
  doc.text(right, x + width - rw, y, { width: rw + 1, lineBreak: false });
  doc.font(FONT.bold).fontSize(STYLE.size.running).fillColor(STYLE.muted);
  doc.text(`${input.sheetTitle} · ${input.pieceTitle}`, x, y, { width: width - rw - 20, lineBreak: false, ellipsis: true });
  const ry = y + 14;
  doc.moveTo(x, ry).lineTo(x + width, ry).lineWidth(0.5).strokeColor(STYLE.faint).stroke();
  return y + STYLE.runningHeader;
}

/** The lowest y a drill may reach on a page. */
export function contentBottom(doc: PDFKit.PDFDocument): number {
  return doc.page.height - STYLE.margin.bottom;
}

/** Writes the caution and "page n of m" at the foot of every buffered page. */
export function drawFooters(doc: PDFKit.PDFDocument): void {
  const range = doc.bufferedPageRange();
  for (let i = range.start; i < range.start + range.count; i++) {
    doc.switchToPage(i);
    const saved = doc.page.margins.bottom;
    doc.page.margins.bottom = 0; // writing inside the bottom margin must not open a new page
    const x = STYLE.margin.left;
    const width = contentWidth(doc);
    const y = doc.page.height - STYLE.margin.bottom + 16;
    doc.moveTo(x, y).lineTo(x + width, y).lineWidth(0.5).strokeColor(STYLE.faint).stroke();
    const pageLabel = `page ${i - range.start + 1} of ${range.count}`;
    doc.font(FONT.regular).fontSize(STYLE.size.footer + 0.5).fillColor(STYLE.muted);
    const pw = doc.widthOfString(pageLabel);
    doc.text(pageLabel, x + width - pw, y + 6, { width: pw + 1, lineBreak: false });
    doc.font(FONT.bold).fontSize(STYLE.size.footer).fillColor(STYLE.ink);
    doc.text("Caution. ", x, y + 6, { width: width - pw - 30, lineGap: 1, continued: true });
    doc.font(FONT.regular).fillColor(STYLE.ink);
    doc.text(HANDOUT_CAUTION, { width: width - pw - 30, lineGap: 1 });
    doc.page.margins.bottom = saved;
  }
}
