// Reading handout PDFs back for checks: text and page sizes through pdfjs-dist, pixels through
// poppler's pdftoppm (Debian poppler-utils) rendering greyscale PGM, which is trivial to parse.
import { spawnSync } from "node:child_process";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";

export interface PdfPageText {
  text: string;
  width: number;
  height: number;
}

const squash = (s: string) => s.replace(/\s+/g, " ").trim();

/** Text (whitespace collapsed) and size in points of every page, read with pdfjs-dist. */
export async function readPdfPages(pdf: Uint8Array): Promise<PdfPageText[]> {
  const pdfjs = await import("pdfjs-dist/legacy/build/pdf.mjs");
  const doc = await pdfjs.getDocument({ data: pdf.slice(), isEvalSupported: false, disableFontFace: true, useSystemFonts: false }).promise;
  const pages: PdfPageText[] = [];
  for (let n = 1; n <= doc.numPages; n++) {
    const page = await doc.getPage(n);
    const content = await page.getTextContent();
    const text = content.items.map((it) => ("str" in it ? it.str + (it.hasEOL ? " " : "") : "")).join("");
    const [x0, y0, x1, y1] = page.view;
    pages.push({ text: squash(text), width: x1 - x0, height: y1 - y0 });
  }
  await doc.destroy();
  return pages;
}

export { squash };

/** True when poppler's pdftoppm is on the PATH. */
export function hasPdftoppm(): boolean {
  return spawnSync("pdftoppm", ["-v"], { encoding: "utf8" }).error === undefined;
}

/** A greyscale page image. */
export interface GreyImage {
  width: number;
  height: number;
  pixels: Uint8Array;
}

/** Parses a binary PGM (P5, maxval 255). */
export function parsePgm(buf: Buffer): GreyImage {
  const header: string[] = [];
  let i = 0;
  while (header.length < 4) {
    while (/\s/.test(String.fromCharCode(buf[i]))) i++;
    if (buf[i] === 0x23) {
      while (buf[i] !== 0x0a) i++;
      continue;
    }
    let tok = "";
    while (!/\s/.test(String.fromCharCode(buf[i]))) tok += String.fromCharCode(buf[i++]);
    header.push(tok);
  }
  i++; // the single whitespace after maxval
  const [magic, w, h, max] = header;
  if (magic !== "P5" || max !== "255") throw new Error(`Unsupported PGM ${magic} ${max}`);
  const width = Number(w);
  const height = Number(h);
  return { width, height, pixels: new Uint8Array(buf.subarray(i, i + width * height)) };
}

/** Renders every page of a PDF to greyscale images with pdftoppm at `dpi`, also keeping PNGs in `pngDir` when given. */
export function renderPages(pdf: Uint8Array, dpi = 40, pngDir?: string): GreyImage[] {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), "knotwork-handout-"));
  try {
    const file = path.join(dir, "handout.pdf");
    fs.writeFileSync(file, pdf);
    const r = spawnSync("pdftoppm", ["-gray", "-r", String(dpi), file, path.join(dir, "page")], { encoding: "utf8" });
    if (r.status !== 0) throw new Error(`pdftoppm failed: ${r.stderr}`);
    if (pngDir) {
      fs.mkdirSync(pngDir, { recursive: true });
      spawnSync("pdftoppm", ["-png", "-r", "80", file, path.join(pngDir, "page")]);
    }
    return fs
      .readdirSync(dir)
      .filter((f) => f.endsWith(".pgm"))
      .sort()
      .map((f) => parsePgm(fs.readFileSync(path.join(dir, f))));
  } finally {
    fs.rmSync(dir, { recursive: true, force: true });
  }
}

/** Share of pixels darker than `threshold` (0–255). */
export function inkShare(img: GreyImage, threshold = 160): number {
  let dark = 0;
  for (const p of img.pixels) if (p < threshold) dark++;
  return dark / img.pixels.length;
}
