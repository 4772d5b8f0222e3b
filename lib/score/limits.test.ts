// Bounds on a score's numbers (lib/score/limits.ts): every reference file passes, every case of the
// bounds corpus (scripts/make-hostile-bounds.ts) is refused naming its bar, and fast.
import fs from "node:fs";
import path from "node:path";
import { describe, expect, test } from "vitest";
import { boundsCorpus } from "../../scripts/make-hostile-bounds";
import { ScoreError } from "./errors";
import { checkScoreBounds, clickCount, SCORE_BOUNDS } from "./limits";
import { readScore } from "./read";

const root = path.resolve(__dirname, "../..");
function scoreFiles(dir: string): string[] {
  return fs.readdirSync(dir, { withFileTypes: true }).flatMap((e) =>
    e.isDirectory() ? scoreFiles(path.join(dir, e.name)) : /\.(xml|musicxml|mxl)$/.test(e.name) ? [path.join(dir, e.name)] : [],
  );
}

describe("checkScoreBounds", () => {
  test("every readable file of the reference corpus and the demo pieces is within bounds", () => {
    // Sources: fixtures/reference (the MusicXML test suite, W3C 4.0 samples, 12 real CC0 scores) and fixtures/pieces.
    const files = [...scoreFiles(path.join(root, "fixtures/reference")), ...scoreFiles(path.join(root, "fixtures/pieces"))];
    let read = 0;
    for (const f of files) {
      let score;
      try {
        score = readScore(new Uint8Array(fs.readFileSync(f))).score;
      } catch {
        continue; // files the reader refuses on purpose (e.g. timewise) are the reader's tests' business
      }
      read++;
      expect(() => checkScoreBounds(score), path.relative(root, f)).not.toThrow();
    }
    expect(read).toBeGreaterThan(50);
  });

  test.each(boundsCorpus().map((c) => [c.file, c] as const))("%s is refused with a message naming its bar", (_f, c) => {
    const { score } = readScore(c.bytes);
    const t0 = performance.now();
    let error: unknown;
    try {
      checkScoreBounds(score);
    } catch (e) {
      error = e;
    }
    expect(performance.now() - t0).toBeLessThan(500);
    expect(error).toBeInstanceOf(ScoreError);
    const message = (error as ScoreError).message;
    expect(message).toMatch(c.says);
    expect(message).toContain(`(bar ${c.bar}`);
  });

  test("every committed bounds fixture is the generated file", () => {
    for (const c of boundsCorpus()) {
      const onDisk = new Uint8Array(fs.readFileSync(path.join(root, "fixtures/hostile", c.file)));
      // Zip entries carry the time they were made, so an .mxl is compared by length (as tests/score/hostile.test.ts does).
      if (c.file.endsWith(".mxl")) expect(onDisk.length, c.file).toBe(c.bytes.length);
      else expect(Buffer.from(onDisk).equals(Buffer.from(c.bytes)), c.file).toBe(true);
    }
  });

  test("a score just inside every bound passes; one step past a bound fails", () => {
    const xml = (divisions: number, beats: number) =>
      `<?xml version="1.0"?><score-partwise version="4.0"><part-list><score-part id="P1"><part-name>P</part-name></score-part></part-list>` +
      `<part id="P1"><measure number="1"><attributes><divisions>${divisions}</divisions><time><beats>${beats}</beats><beat-type>4</beat-type></time></attributes>` +
      `<note><pitch><step>C</step><octave>4</octave></pitch><duration>${divisions * beats}</duration><type>whole</type></note></measure></part></score-partwise>`;
    expect(() => checkScoreBounds(readScore(xml(SCORE_BOUNDS.maxDivisions, 4)).score)).not.toThrow();
    expect(() => checkScoreBounds(readScore(xml(SCORE_BOUNDS.maxDivisions + 1, 4)).score)).toThrow(/divisions/);
    expect(() => checkScoreBounds(readScore(xml(1, SCORE_BOUNDS.maxBarQuarters)).score)).not.toThrow();
  });

  test("clickCount counts beats as the performance does: 4 in 4/4, 2 dotted quarters in 6/8", async () => {
    // Compound metre beats in dotted quarters: common practice.
    const Fraction = (await import("fraction.js")).default;
    expect(clickCount({ time: { beats: 4, beatType: 4 }, length: new Fraction(4) })).toBe(4);
    expect(clickCount({ time: { beats: 6, beatType: 8 }, length: new Fraction(3) })).toBe(2);
    expect(clickCount({ time: { beats: 3, beatType: 4 }, length: new Fraction(1) })).toBe(1);
  });
});
