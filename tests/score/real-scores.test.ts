// The real-score corpus (fixtures/reference/scores: 12 OpenScore Lieder songs, CC0) through the reader:
// every file reads, keeps its piano part, and keeps every printed fingering. Counts are from the corpus's
// own SOURCES.md ("How the features were counted": piano part only, `<fingering>` inside `<technical>`).
import fs from "node:fs";
import path from "node:path";
import { describe, expect, test } from "vitest";
import { readScore } from "../../lib/score/read";
import { referenceDir } from "./reference";

const dir = path.join(referenceDir, "scores");
const files = fs.readdirSync(dir).filter((f) => f.endsWith(".mxl")).sort();

/** Printed fingerings in the piano part, per fingered file (scores/SOURCES.md, summary table). */
const PRINTED_FINGERINGS: Record<string, number> = {
  "fingered-01_jaell_les-petits-oiseaux.mxl": 69,
  "fingered-02_brahms_op58-4_o-komme-holde-sommernacht.mxl": 63,
  "fingered-03_lang_op26-1_wiegenlied.mxl": 43,
  "fingered-04_holmes_dans-les-bois.mxl": 36,
};

describe("real-score corpus", () => {
  test("all 12 scores are present", () => {
    expect(files).toHaveLength(12);
  });

  test.each(files)("%s reads with a two-staff piano part", (file) => {
    const { score } = readScore(new Uint8Array(fs.readFileSync(path.join(dir, file))));
    expect(score.measures.length).toBeGreaterThan(20);
    // SOURCES.md: "a vocal part plus a two-staff piano part" in every file.
    expect(score.parts.some((p) => p.staves === 2)).toBe(true);
    const piano = score.parts.find((p) => p.staves === 2)!;
    const pianoNotes = score.events.filter((e) => e.part === piano.id && e.pitch);
    expect(pianoNotes.length).toBeGreaterThan(100);
    const expected = PRINTED_FINGERINGS[file];
    if (expected !== undefined) {
      const marks = pianoNotes.reduce((n, e) => n + (e.fingering?.length ?? 0), 0);
      expect(marks).toBe(expected);
    }
  });
});
