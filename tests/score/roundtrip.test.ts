/**
 * The writer against the reference corpus: for every file in fixtures/reference/musicxml/,
 * read → write → (a) validates against the MusicXML 4.0 XSD, (b) reads back with the same sounding
 * notes, (c) verovio, an independent reader, hears the same notes in the written file.
 */
import fs from "node:fs";
import path from "node:path";
import { beforeAll, describe, expect, test } from "vitest";
import { readScore, scoreText } from "../../lib/score/read";
import { mergeTies } from "../../lib/score/ties";
import type { NoteEvent, Score } from "../../lib/score/types";
import { writeMusicXML } from "../../lib/score/write";
import { verovioNotes, verovioToolkit } from "../support/verovio";
import { withoutHalfTies } from "./notated-events";
import { hasXmllint, referenceDir, validateMusicXml } from "../support/xmllint";

const corpus = path.join(referenceDir(), "musicxml");
const files = ["lilypond-testsuite", "w3c-musicxml-4.0"].flatMap((dir) =>
  fs
    .readdirSync(path.join(corpus, dir))
    .filter((f) => /\.(xml|mxl|musicxml)$/.test(f))
    .map((f) => path.join(dir, f)),
);

/**
 * Files whose verovio timemap cannot be compared note for note with the model, and why.
 * Grace-note files are still checked: verovio(written) must equal verovio(original).
 */
const VEROVIO_LEFT_OUT: Record<string, string> = {
  "lilypond-testsuite/33i-Ties-NotEnded.xml":
    "ties deliberately left open (a start with no matching stop); verovio joins the open tie to a " +
    "later note of the same pitch, the model keeps them apart because MusicXML marks a tie's end with " +
    "an explicit <tie type=\"stop\"> (spec, <tie> element). The written-note comparison still runs.",
};

/** Sounding notes (ties merged) as comparable keys: pitch, onset, duration, staff, voice, tie, fingering. */
function soundingKeys(events: readonly NoteEvent[]): string[] {
  return mergeTies(events)
    .filter((e) => e.pitch && !e.grace)
    .map((e) =>
      [e.part, e.staff, e.voice, e.pitch!.midi, e.onset.toFraction(), e.duration.toFraction(), e.tie, JSON.stringify(e.fingering ?? [])].join(" "),
    )
    .sort();
}

const graceKeys = (events: readonly NoteEvent[]): string[] =>
  events.filter((e) => e.grace && e.pitch).map((e) => `${e.staff} ${e.pitch!.midi} ${e.onset.toFraction()}`).sort();

/** (global staff, midi, onset) of the model's sounding notes; verovio numbers staves across parts. */
function modelTriples(score: Score, events: readonly NoteEvent[]): string[] {
  const offset = new Map<string, number>();
  let acc = 0;
  for (const p of score.parts) {
    offset.set(p.id, acc);
    acc += p.staves;
  }
  return events
    .filter((e) => e.pitch && !e.grace)
    .map((e) => `${offset.get(e.part)! + e.staff} ${e.pitch!.midi} ${e.onset.valueOf().toFixed(3)}`)
    .sort();
}

const triples = (notes: { staff: number; midi: number; onset: number }[]): string[] =>
  notes.map((n) => `${n.staff} ${n.midi} ${n.onset.toFixed(3)}`).sort();

describe("writeMusicXML round trip over the reference corpus", () => {
  beforeAll(async () => {
    await verovioToolkit();
  });

  test("the corpus is there", () => {
    expect(files.length).toBeGreaterThan(50);
  });

  for (const file of files) {
    test(file, async () => {
      const bytes = new Uint8Array(fs.readFileSync(path.join(corpus, file)));
      const original = readScore(bytes).score;
      const xml = writeMusicXML(original);

      // MusicXML 4.0 XSD (w3c-musicxml-4.0/schema), via xmllint.
      if (hasXmllint()) {
        const { valid, errors } = validateMusicXml(xml);
        expect(errors.slice(0, 5), "XSD errors").toEqual([]);
        expect(valid).toBe(true);
      }

      // Our reader on the written file: same sounding notes (ties merged, since splitting at
      // barlines may change the tie structure) and the same grace notes.
      const back = readScore(xml).score;
      expect(soundingKeys(back.events)).toEqual(soundingKeys(withoutHalfTies(original.events)));
      expect(graceKeys(back.events)).toEqual(graceKeys(original.events));
      expect(back.measures.length).toBe(original.measures.length);

      // verovio on the written file (independent reader).
      const written = await verovioNotes(xml, { mergeTies: true });
      if (original.events.some((e) => e.grace)) {
        // verovio's timemap gives grace notes time of their own and moves the notes around them
        // (differently for slashed and unslashed graces, which the model does not keep), so in bars
        // with grace notes (and the beat and a half after them, where verovio may push a note) only
        // pitch and staff are compared; other bars are compared in full.
        const graceBars = new Set(original.events.filter((e) => e.grace).map((e) => e.measure));
        const inGraceBar = (onset: number): boolean =>
          original.measures.some((m) => graceBars.has(m.index) && onset >= m.start.valueOf() - 1e-9 && onset < m.start.add(m.length).valueOf() + 1.5);
        const model = mergeTies(original.events).filter((e) => e.pitch && !e.grace);
        const pitchOnly = (xs: string[]): string[] => xs.map((x) => x.split(" ").slice(0, 2).join(" ")).sort();
        expect(pitchOnly(triples(written))).toEqual(pitchOnly(modelTriples(original, model)));
        expect(triples(written.filter((n) => !inGraceBar(n.onset)))).toEqual(
          modelTriples(original, model.filter((e) => !inGraceBar(e.onset.valueOf()))),
        );
      } else if (original.events.some((e) => e.arpeggio && e.arpeggio !== "non-arpeggiate")) {
        // verovio rolls arpeggiated chords in its timemap (a performance map); the written file must give
        // verovio the same rolled onsets as the original does (same signs on the same chords).
        expect(triples(written)).toEqual(triples(await verovioNotes(scoreText(bytes), { mergeTies: true })));
      } else if (VEROVIO_LEFT_OUT[file]) {
        expect(triples(await verovioNotes(xml))).toEqual(modelTriples(back, back.events));
      } else {
        expect(triples(written)).toEqual(modelTriples(original, mergeTies(original.events)));
      }
    });
  }
});
