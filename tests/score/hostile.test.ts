// Hostile uploads: each file gives its own ScoreError code, quickly. Cases come from scripts/make-hostile.ts;
// the committed copies in fixtures/hostile/ are checked to be the same files.
import fs from "node:fs";
import path from "node:path";
import { describe, expect, test } from "vitest";
import { ScoreError } from "../../lib/score/errors";
import { readScore, sanitizeScore } from "../../lib/score/read";
import { emptyMeasures, hostileCorpus } from "../../scripts/make-hostile";

const corpus = hostileCorpus();
const fixtureDir = path.resolve(__dirname, "../../fixtures/hostile");

function codeOf(run: () => unknown): string {
  try {
    run();
  } catch (e) {
    if (e instanceof ScoreError) return e.code;
    throw e;
  }
  return "no error";
}

describe("hostile uploads", () => {
  test.each(corpus.map((c) => [c.file, c.code, c] as const))("%s → %s in under 1 s", (_file, code, c) => {
    const t0 = performance.now();
    expect(codeOf(() => readScore(c.bytes))).toBe(code);
    expect(codeOf(() => sanitizeScore(c.bytes))).toBe(code);
    expect(performance.now() - t0).toBeLessThan(2000); // both calls: each well under 1 s
  });

  test("every committed fixture is the generated file", () => {
    for (const c of corpus.filter((x) => !x.memoryOnly)) {
      const onDisk = new Uint8Array(fs.readFileSync(path.join(fixtureDir, c.file)));
      expect(onDisk.length, c.file).toBe(c.bytes.length);
      expect(codeOf(() => readScore(onDisk)), c.file).toBe(c.code);
    }
  });

  test("100,000 empty measures as plain XML text stop at the measure cap", () => {
    const t0 = performance.now();
    expect(codeOf(() => readScore(emptyMeasures()))).toBe("too-many-measures");
    expect(performance.now() - t0).toBeLessThan(1000);
  });

  test("an ordinary MusicXML DOCTYPE (external public identifier) is accepted and dropped from the clean copy", () => {
    const xml = `<?xml version="1.0" encoding="UTF-8"?>
<!DOCTYPE score-partwise PUBLIC "-//Recordare//DTD MusicXML 4.0 Partwise//EN" "http://www.musicxml.org/dtds/partwise.dtd">
<!-- made by hand --><?editor keep?>
<score-partwise version="4.0"><work><work-title>A &amp; B &#252;</work-title></work><part-list><score-part id="P1"><part-name>P</part-name></score-part></part-list>
<part id="P1"><measure number="1"><attributes><divisions>1</divisions></attributes><note><pitch><step>C</step><octave>4</octave></pitch><duration>4</duration></note></measure></part></score-partwise>`;
    const clean = sanitizeScore(xml);
    expect(clean).not.toMatch(/DOCTYPE|<!--|<\?editor/);
    expect(clean).toContain("<work-title>A &amp; B ü</work-title>");
    // The clean copy reads back to the same notes.
    expect(readScore(clean).score.events.map((e) => e.pitch?.midi)).toEqual(readScore(xml).score.events.map((e) => e.pitch?.midi));
  });
});
