// Handout PDFs, checked from the outside: text read back with pdfjs-dist 5.6.205, pages rendered
// with poppler's pdftoppm, page sizes against ISO 216 (A4) and ANSI/ASME Y14.1 (Letter).
import { beforeAll, describe, expect, test } from "vitest";
import PDFDocument from "pdfkit";
import { CAUTION } from "@/lib/caution";
import { handoutFontPath, renderHandoutPdf, type HandoutInput } from "@/lib/handout";
import { hasPdftoppm, inkShare, readPdfPages, renderPages, squash, type PdfPageText } from "./pdf-tools";
import { eightDrillSheet } from "./sample-sheet";

const MM_TO_PT = 72 / 25.4;

let a4Input: HandoutInput;
let a4: Uint8Array;
let a4Pages: PdfPageText[];
let letterInput: HandoutInput;
let letter: Uint8Array;
let letterPages: PdfPageText[];

beforeAll(async () => {
  a4Input = eightDrillSheet("a4");
  a4 = await renderHandoutPdf(a4Input);
  a4Pages = await readPdfPages(a4);
  const full = eightDrillSheet("letter");
  letterInput = { ...full, studentName: undefined, studioName: undefined, drills: full.drills.slice(4, 7) };
  letter = await renderHandoutPdf(letterInput);
  letterPages = await readPdfPages(letter);
});

describe("renderHandoutPdf", () => {
  test("is a PDF document", () => {
    expect(new TextDecoder().decode(a4.subarray(0, 5))).toBe("%PDF-");
  });

  test("text holds the sheet title, piece, bars, student, date and every drill title", () => {
    const all = a4Pages.map((p) => p.text).join(" ");
    for (const s of [a4Input.sheetTitle, a4Input.pieceTitle, a4Input.bars, a4Input.studentName!, a4Input.date]) {
      expect(all).toContain(s);
    }
    for (const d of a4Input.drills) expect(all).toContain(d.title);
    expect(squash(a4Pages[0].text)).toContain(a4Input.sheetTitle);
  });

  test("every page carries the caution and 'page n of m'", () => {
    const caution = squash(CAUTION.text);
    for (const [i, pages] of [a4Pages, letterPages].entries()) {
      expect(pages.length, `document ${i}`).toBeGreaterThan(0);
      pages.forEach((p, n) => {
        expect(p.text).toContain(caution);
        expect(p.text).toContain(`page ${n + 1} of ${pages.length}`);
      });
    }
  });

  test("eight drills need more than one page and the tempo goals print with ♩", () => {
    expect(a4Pages.length).toBeGreaterThan(1);
    const all = a4Pages.map((p) => p.text).join(" ");
    for (const d of a4Input.drills) expect(all).toContain(`♩ = ${d.tempo.start} → ${d.tempo.target}`);
  });

  test("a drill is never split: its title, note and warning are on one page", () => {
    for (const d of a4Input.drills) {
      const page = a4Pages.findIndex((p) => p.text.includes(d.title));
      expect(page, d.title).toBeGreaterThanOrEqual(0);
      expect(a4Pages[page].text).toContain(squash(d.studentNote));
      if (d.spanWarning) expect(a4Pages[page].text).toContain(squash(d.spanWarning));
    }
  });

  test("drill numbers follow the sheet order across pages", () => {
    const pageOf = a4Input.drills.map((d) => a4Pages.findIndex((p) => p.text.includes(d.title)));
    expect([...pageOf].sort((a, b) => a - b)).toEqual(pageOf);
  });

  test("A4 pages are 595 × 842 pt and Letter pages 612 × 792 pt", () => {
    // ISO 216: A4 is 210 × 297 mm; 1 pt = 1/72 in = 25.4/72 mm → 595.28 × 841.89 pt
    for (const p of a4Pages) {
      expect(p.width).toBeCloseTo(210 * MM_TO_PT, 0);
      expect(p.height).toBeCloseTo(297 * MM_TO_PT, 0);
      expect([Math.round(p.width), Math.round(p.height)]).toEqual([595, 842]);
    }
    // ANSI/ASME Y14.1: Letter (size A) is 8.5 × 11 in → 612 × 792 pt
    for (const p of letterPages) expect([p.width, p.height]).toEqual([8.5 * 72, 11 * 72]);
  });

  test("a copy without a student has an empty name line; a student's copy carries the name", () => {
    // nothing written between the STUDENT label and the DATE label: the name goes on the blank line by hand
    expect(squash(letterPages[0].text)).toMatch(/STUDENT\s*DATE/);
    expect(squash(a4Pages[0].text)).toContain(`STUDENT ${a4Input.studentName}`);
  });

  test("♭ and ♯ in a drill's note come through as text, from an embedded font that has them", () => {
    const all = a4Pages.map((p) => p.text).join(" ");
    expect(a4Input.drills.some((d) => d.studentNote.includes("♭"))).toBe(true);
    expect(all).toContain("B♭ takes finger 2");
    expect(all).toContain("F♯ in bar 2");
    // the shipped TTF itself has the glyphs (fontkit, through pdfkit)
    const doc = new PDFDocument({ autoFirstPage: false, font: handoutFontPath("regular") });
    const font = (doc as unknown as { _font: { font: { hasGlyphForCodePoint(c: number): boolean } } })._font.font;
    for (const ch of ["♭", "♯", "♮", "♩", "→", "⚠"]) expect(font.hasGlyphForCodePoint(ch.codePointAt(0)!), ch).toBe(true);
    // and the PDF embeds it (a FontFile2 stream, PDF 1.7 §9.9), so no system font is needed to print
    expect(Buffer.from(a4).toString("latin1")).toMatch(/\/FontFile2/);
  });

  test.runIf(hasPdftoppm())("pdftoppm renders every page and none is blank", () => {
    for (const [pdf, pages] of [[a4, a4Pages], [letter, letterPages]] as const) {
      const images = renderPages(pdf, 40, process.env.KNOTWORK_HANDOUT_PNG_DIR);
      expect(images.length).toBe(pages.length);
      for (const img of images) {
        // a page with a footer alone inks well under 1 %; a page with a drill on it inks more
        expect(inkShare(img)).toBeGreaterThan(0.01);
        expect(inkShare(img)).toBeLessThan(0.5);
      }
    }
  });

  test("refuses a sheet without drills or with an out-of-range tempo", async () => {
    const base = eightDrillSheet();
    await expect(renderHandoutPdf({ ...base, drills: [] })).rejects.toThrow();
    await expect(
      renderHandoutPdf({ ...base, drills: [{ ...base.drills[0], tempo: { start: 0, target: 500 } }] }),
    ).rejects.toThrow();
  });
});
