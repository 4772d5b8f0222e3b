/**
 * A minimal 2-D canvas context for the engraver running in jsdom: only `font` and `measureText`,
 * measured with the same TTF metrics that the PDF later embeds, so text widths in the SVG match
 * the printed handout.
 */
import PDFDocument from "pdfkit";
import { FONT, handoutFontPath, registerHandoutFonts } from "./fonts";

let measurer: PDFKit.PDFDocument | null = null;
/** Width at size 1 per face and text; engravings repeat the same few strings (fingerings, numbers). */
const widths = new Map<string, number>();

function getMeasurer(): PDFKit.PDFDocument {
  if (!measurer) {
    measurer = new PDFDocument({ autoFirstPage: false, font: handoutFontPath("regular") });
    registerHandoutFonts(measurer);
  }
  return measurer;
}

/** Parses the size in px and the weight/style out of a CSS font shorthand such as "bold 12px Times". */
export function parseCssFont(font: string): { size: number; bold: boolean; italic: boolean } {
  const m = /(\d+(?:\.\d+)?)(px|pt)/.exec(font);
  const raw = m ? parseFloat(m[1]) : 10;
  const size = m && m[2] === "pt" ? (raw * 4) / 3 : raw;
  return { size, bold: /\bbold\b|\b[6-9]00\b/.test(font), italic: /\bitalic\b|\boblique\b/.test(font) };
}

/** Width and vertical extents of `text` in the given CSS font, from the handout TTF metrics. */
export function measureCssText(text: string, font: string) {
  const { size, bold, italic } = parseCssFont(font);
  const face = bold ? FONT.bold : italic ? FONT.italic : FONT.regular;
  const key = `${face}\u0000${text}`;
  let unit = widths.get(key);
  if (unit === undefined) {
    const doc = getMeasurer();
    unit = doc.font(face).fontSize(1).widthOfString(text);
    if (widths.size > 20_000) widths.clear();
    widths.set(key, unit);
  }
  const width = unit * size;
  return {
    width,
    actualBoundingBoxLeft: 0,
    actualBoundingBoxRight: width,
    actualBoundingBoxAscent: size * 0.76,
    actualBoundingBoxDescent: size * 0.24,
    fontBoundingBoxAscent: size * 0.93,
    fontBoundingBoxDescent: size * 0.24,
  };
}

/** The stub returned by `HTMLCanvasElement.prototype.getContext("2d")` in the server DOM. */
export function createMeasureContext(): { font: string; measureText(text: string): ReturnType<typeof measureCssText> } {
  return {
    font: "10px sans-serif",
    measureText(text: string) {
      return measureCssText(text, this.font);
    },
  };
}
