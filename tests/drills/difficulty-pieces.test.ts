/**
 * Difficulty map and fingering on real files: the demo pieces in fixtures/pieces and the piano files
 * of the reference corpus (lilypond-testsuite, vendored in fixtures/reference).
 */
import fs from "node:fs";
import path from "node:path";
import { describe, expect, test } from "vitest";
import { readScore } from "@/lib/score/read";
import { difficultyMap, hardestBars } from "@/lib/drills/difficulty";
import { handsOf } from "@/lib/drills/difficulty-bars";
import { estimateFingering } from "@/lib/drills/fingering";
import { referenceDir } from "../support/xmllint";

const piecesDir = path.resolve(__dirname, "../../fixtures/pieces");
const pieces = fs.readdirSync(piecesDir).filter((f) => f.endsWith(".musicxml")).sort();
const readPiece = (name: string) => readScore(fs.readFileSync(path.join(piecesDir, name), "utf8")).score;

describe("demo pieces", () => {
  test.each(pieces)("%s: a 0–1 value per bar for each hand, and hardest bars with reasons", (name) => {
    const score = readPiece(name);
    const map = difficultyMap(score);
    expect(map.right).toHaveLength(score.measures.length);
    expect(map.left).toHaveLength(score.measures.length);
    for (const v of [...map.right, ...map.left]) expect(v >= 0 && v <= 1).toBe(true);
    expect(map.right.some((v) => v > 0)).toBe(true);
    expect(map.left.some((v) => v > 0)).toBe(true);
    const top = hardestBars(score, 3);
    expect(top.length).toBeGreaterThan(0);
    for (const h of top) expect(h.reasons.length).toBeGreaterThan(0);
  });

  test("Lantern Waltz: the right-hand tenth A4 → C6 (fixtures/pieces/README.md) is named, 212 mm (FACTS.md §1)", () => {
    const score = readPiece("lantern-waltz.musicxml");
    const top = hardestBars(score, score.measures.length * 2);
    const tenth = top.find((h) => h.hand === "right" && h.reasons.includes("stretch of a tenth (212 mm)"));
    expect(tenth).toBeDefined();
    expect(["9", "10"]).toContain(tenth!.number);
  });

  test("written fingerings in the demo pieces are kept by the estimator", () => {
    for (const name of pieces) {
      const score = readPiece(name);
      for (const hands of handsOf(score).values()) {
        for (const hand of ["right", "left"] as const) {
          const events = hands[hand];
          const { fingers } = estimateFingering(events, hand);
          events.forEach((e, i) => {
            const written = e.fingering?.[0]?.finger;
            if (written && e.pitch) expect(fingers[i]).toBe(written);
            if (!e.pitch) expect(fingers[i]).toBeNull();
          });
        }
      }
    }
  });
});

describe("reference piano files (lilypond-testsuite)", () => {
  const dir = path.join(referenceDir(), "musicxml", "lilypond-testsuite");
  test.each(["43a-PianoStaff.xml", "43e-Multistaff-ClefDynamics.xml", "21d-Chords-SchubertStabatMater.xml", "24e-GraceNote-StaffChange.xml"])(
    "%s: map has one 0–1 value per bar",
    (file) => {
      const { score } = readScore(fs.readFileSync(path.join(dir, file), "utf8"));
      const map = difficultyMap(score);
      expect(map.right).toHaveLength(score.measures.length);
      for (const v of [...map.right, ...map.left]) expect(v >= 0 && v <= 1).toBe(true);
    },
  );
  test("43a-PianoStaff: F4 is the right hand and B2 the left (FACTS.md §3: staff 1 above staff 2)", () => {
    const { score } = readScore(fs.readFileSync(path.join(dir, "43a-PianoStaff.xml"), "utf8"));
    const hands = handsOf(score).values().next().value!;
    expect(hands.right.map((e) => e.pitch?.midi)).toContain(65); // F4 (FACTS.md §2 MIDI formula)
    expect(hands.left.map((e) => e.pitch?.midi)).toContain(47); // B2
  });
});
