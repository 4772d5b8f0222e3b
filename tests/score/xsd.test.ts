/**
 * Hand-built scores with every feature the writer knows, written and checked against the
 * MusicXML 4.0 XSD (xmllint) and against verovio, an independent reader, note for note.
 */
import Fraction from "fraction.js";
import { beforeAll, describe, expect, test } from "vitest";
import { buildScore, type ScoreSpec } from "../../lib/score/test-builders";
import { mergeTies } from "../../lib/score/ties";
import type { Score } from "../../lib/score/types";
import { writeMusicXML } from "../../lib/score/write";
import { verovioNotes, verovioToolkit } from "../support/verovio";
import { hasXmllint, validateMusicXml } from "../support/xmllint";

const triplet = { written: { type: null, dots: 0, tuplet: { actual: 3, normal: 2 } } };

const cases: Record<string, ScoreSpec> = {
  "notes across barlines, odd lengths": {
    bars: 3,
    notes: [
      { pitch: "C4", onset: 0, duration: "5/4" },
      { pitch: "D4", onset: "5/4", duration: "11/4" },
      { pitch: "E4", onset: 4, duration: 6 },
      { pitch: "C3", onset: 2, duration: 7, staff: 2 },
    ],
  },
  "triplets, sixteenths and a quintuplet": {
    bars: 1,
    notes: [
      ...[0, 1, 2].map((i) => ({ pitch: "G4", onset: new Fraction(i, 3), duration: "1/3", extra: triplet })),
      ...[0, 1, 2, 3].map((i) => ({ pitch: "A4", onset: new Fraction(4 + i, 4), duration: "1/4" })),
      ...[0, 1, 2, 3, 4].map((i) => ({
        pitch: "B4",
        onset: new Fraction(2).add(new Fraction(i, 5)),
        duration: "1/5",
        extra: { written: { type: "16th", dots: 0, tuplet: { actual: 5, normal: 4 } } },
      })),
      { pitch: "C5", onset: 3, duration: "2/3", extra: triplet },
      { pitch: "D5", onset: "11/3", duration: "1/3", extra: triplet },
    ],
  },
  "two voices, chords and grace notes": {
    bars: 2,
    staves: 2,
    notes: [
      { pitch: "E5", onset: 0, duration: 2, voice: "1" },
      { pitch: "G5", onset: 0, duration: 2, voice: "1" },
      { pitch: "F5", onset: 2, duration: 0, voice: "1", extra: { grace: true } },
      { pitch: "E5", onset: 2, duration: 2, voice: "1" },
      { pitch: "C4", onset: 1, duration: 3, voice: "2" },
      { pitch: "C3", onset: 0, duration: "3/2", staff: 2 },
      { pitch: "G3", onset: "3/2", duration: "1/2", staff: 2 },
      { pitch: "B2", onset: 6, duration: 2, staff: 2 },
    ],
  },
  "6/8 with marks, fingering, dynamics, words, tempo, repeats and a mid-bar clef change": {
    bars: 3,
    time: { beats: 6, beatType: 8 },
    key: { fifths: -3, mode: "minor" },
    notes: [
      ...[0, 1, 2, 3, 4, 5].map((i) => ({
        pitch: ["C5", "Eb5", "G5", "C6", "G5", "Eb5"][i],
        onset: new Fraction(i, 2),
        duration: "1/2",
        extra: { fingering: [{ finger: (i % 5) + 1 }], marks: i === 0 ? (["accent"] as const) : (["staccato"] as const), dynamic: i === 0 ? "p" : undefined },
      })),
      { pitch: "D5", onset: 3, duration: 3, extra: { marks: ["fermata", "tenuto"], words: "Hold, then release" } },
      { pitch: "Ab4", onset: 6, duration: 3, extra: { marks: ["diamond"] } },
      { pitch: "C2", onset: 0, duration: 3, staff: 2 },
      { pitch: "C4", onset: "9/2", duration: "3/2", staff: 2 },
    ],
    barExtras: {
      0: { tempo: 66, repeat: { forward: true } },
      1: { repeat: { backward: true, ending: { number: "1", type: "start" } }, changes: [{ offset: new Fraction(3, 2), clef: { staff: 2, sign: "G", line: 2 } }] },
      2: { repeat: { ending: { number: "2", type: "discontinue" } } },
    },
  },
};

/** (staff, midi, onset) of the model's sounding notes, as verovio reports them. */
const modelTriples = (score: Score): string[] =>
  mergeTies(score.events)
    .filter((e) => e.pitch && !e.grace)
    .map((e) => `${e.staff} ${e.pitch!.midi} ${e.onset.valueOf().toFixed(3)}`)
    .sort();

describe("written MusicXML is valid and verovio hears the model's notes", () => {
  beforeAll(async () => {
    await verovioToolkit();
  });

  for (const [name, spec] of Object.entries(cases)) {
    test(name, async () => {
      const score = buildScore(spec);
      const xml = writeMusicXML(score);
      // MusicXML 4.0 XSD (w3c-musicxml-4.0/schema), via xmllint --schema
      if (hasXmllint()) expect(validateMusicXml(xml).errors).toEqual([]);
      // verovio 6.3 timemap (independent reader); ties merged so split notes count once
      const heard = (await verovioNotes(xml, { mergeTies: true })).map((n) => `${n.staff} ${n.midi} ${n.onset.toFixed(3)}`).sort();
      const expected = modelTriples(score);
      if (score.events.some((e) => e.grace)) {
        // verovio gives grace notes time of their own and delays the note after them: compare
        // pitches everywhere, onsets more than a quarter away from the grace note.
        const graceOnsets = new Set(score.events.filter((e) => e.grace).map((e) => e.onset.valueOf().toFixed(3)));
        const away = (xs: string[]) => xs.filter((x) => ![...graceOnsets].some((g) => Math.abs(Number(x.split(" ")[2]) - Number(g)) <= 1 + 1e-9));
        expect(heard.map((x) => x.split(" ").slice(0, 2).join(" ")).sort()).toEqual(expected.map((x) => x.split(" ").slice(0, 2).join(" ")).sort());
        expect(away(heard)).toEqual(away(expected));
      } else {
        expect(heard).toEqual(expected);
      }
    });
  }

  test("a validation failure is reported (the check can fail)", () => {
    if (!hasXmllint()) return;
    const broken = writeMusicXML(buildScore(cases["notes across barlines, odd lengths"])).replace("<voice>1</voice><type>", "<type>quarter</type><voice>1</voice><type>");
    expect(validateMusicXml(broken).valid).toBe(false);
  });
});
