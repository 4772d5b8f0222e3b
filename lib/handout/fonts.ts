/**
 * The TTF files embedded in handouts. They ship with the app in assets/fonts/handout, so PDFs render
 * text, ♭, ♯ and ♩ the same on every server, whatever fonts the system has.
 */
import path from "node:path";

export type HandoutFontStyle = "regular" | "bold" | "italic";

const FILES: Record<HandoutFontStyle, string> = {
  regular: "DejaVuSans.ttf",
  bold: "DejaVuSans-Bold.ttf",
  italic: "DejaVuSans-Oblique.ttf",
};

/** Names under which the handout fonts are registered in every pdfkit document. */
export const FONT: Record<HandoutFontStyle, string> = {
  regular: "Handout",
  bold: "Handout-Bold",
  italic: "Handout-Italic",
};

/** Folder holding the handout fonts: `KNOTWORK_FONT_DIR`, else assets/fonts/handout under the app root. */
export function handoutFontDir(): string {
  return process.env.KNOTWORK_FONT_DIR ?? path.resolve(process.cwd(), "assets/fonts/handout");
}

/** Absolute path of one handout font file. */
export function handoutFontPath(style: HandoutFontStyle): string {
  return path.join(handoutFontDir(), FILES[style]);
}

/** Registers the three handout fonts on a pdfkit document under the names in `FONT`. */
export function registerHandoutFonts(doc: PDFKit.PDFDocument): void {
  for (const style of Object.keys(FILES) as HandoutFontStyle[]) {
    doc.registerFont(FONT[style], handoutFontPath(style));
  }
}

/** Picks the handout font for a CSS-like family/weight/style, as found in an engraving's SVG text. */
export function fontForSvgText(bold: boolean, italic: boolean): string {
  if (bold) return FONT.bold;
  if (italic) return FONT.italic;
  return FONT.regular;
}
