import fs from "node:fs";
import path from "node:path";
import { Note } from "tonal";
import { describe, expect, test } from "vitest";
import { readScore, sanitizeScore } from "./read";
import { mergeTies } from "./ties";

const fixture = (name: string) =>
  fs.readFileSync(path.resolve(__dirname, "../../fixtures/musicxml", name), "utf8");
const referenceDir = path.resolve(__dirname, "../../fixtures/reference");

/** A one-part, one-bar file around the given <attributes> and notes. */
const bar = (attributes: string, notes: string) => `<?xml version="1.0"?>
<score-partwise version="4.0"><part-list><score-part id="P1"><part-name>P</part-name></score-part></part-list>
<part id="P1"><measure number="1"><attributes>${attributes}</attributes>${notes}</measure></part></score-partwise>`;
const note = (step: string, octave: number, duration: number, extra = "") =>
  `<note><pitch><step>${step}</step><octave>${octave}</octave></pitch><duration>${duration}</duration>${extra}</note>`;

describe("readScore — MusicXML 4.0 spec examples (FACTS.md §3)", () => {
  test("divisions = 2 makes duration 1 an eighth", () => {
    // Source: MusicXML 4.0 <divisions>: "if duration = 1 and divisions = 2, this is an eighth note duration".
    const { score } = readScore(bar("<divisions>2</divisions>", note("C", 4, 1) + note("D", 4, 1)));
    expect(score.events.map((e) => e.duration.toFraction())).toEqual(["1/2", "1/2"]);
    expect(score.events[1].onset.toFraction()).toBe("1/2");
  });

  test("43a-PianoStaff: both whole notes start at 0, on staves 1 and 2", () => {
    // Source: FACTS.md §3 (lilypond-testsuite/43a-PianoStaff.xml: duration 384, backup 384, divisions 96).
    const file = path.join(referenceDir, "musicxml/lilypond-testsuite/43a-PianoStaff.xml");
    const { score } = readScore(new Uint8Array(fs.readFileSync(file)));
    expect(score.events.map((e) => [e.staff, e.onset.valueOf(), e.duration.valueOf()])).toEqual([
      [1, 0, 4],
      [2, 0, 4],
    ]);
    expect(score.parts[0].staves).toBe(2);
  });

  test("triplet eighths land on exact thirds of a quarter", () => {
    // Source: FACTS.md §3 [D]: with divisions = 6 a triplet eighth (3:2) lasts 2 divisions.
    const tm = "<type>eighth</type><time-modification><actual-notes>3</actual-notes><normal-notes>2</normal-notes></time-modification>";
    const { score } = readScore(bar("<divisions>6</divisions>", note("C", 4, 2, tm) + note("D", 4, 2, tm) + note("E", 4, 2, tm)));
    expect(score.events.map((e) => e.onset.toFraction())).toEqual(["0", "1/3", "2/3"]);
    expect(score.events[0].written.tuplet).toEqual({ actual: 3, normal: 2 });
  });

  test("a <chord/> note does not move the position; <backup> and <forward> do", () => {
    // Source: MusicXML 4.0 <duration> and <chord> pages (FACTS.md §3).
    const xml = bar("<divisions>1</divisions>",
      note("C", 4, 2) + `<note><chord/><pitch><step>E</step><octave>4</octave></pitch><duration>2</duration></note>` +
      "<backup><duration>2</duration></backup><forward><duration>1</duration></forward>" + note("G", 3, 1, "<voice>2</voice>"));
    const { score } = readScore(xml);
    expect(score.events.map((e) => [e.pitch?.midi, e.onset.valueOf(), e.chord])).toEqual([
      [60, 0, false], [64, 0, true], [55, 1, false],
    ]);
  });
});

describe("readScore — pitch (FACTS.md §1–2, cross-checked with tonal)", () => {
  test.each([
    ["C", 4, 60], ["A", 0, 21], ["C", 8, 108], ["A", 4, 69],
  ] as const)("%s%i is MIDI %i", (step, octave, midi) => {
    // Source: MusicXML 4.0 <octave> "4 indicates the octave started by middle C"; FACTS §1 A0 = 21, C8 = 108.
    const { score } = readScore(bar("<divisions>1</divisions>", note(step, octave, 4)));
    expect(score.events[0].pitch?.midi).toBe(midi);
    expect(Note.midi(`${step}${octave}`)).toBe(midi); // tonal as reference library
  });

  test("alterations follow tonal's spelling", () => {
    const xml = bar("<divisions>1</divisions>",
      `<note><pitch><step>B</step><alter>-1</alter><octave>3</octave></pitch><duration>2</duration></note>` +
      `<note><pitch><step>B</step><alter>1</alter><octave>3</octave></pitch><duration>2</duration></note>`);
    const { score } = readScore(xml);
    expect(score.events.map((e) => e.pitch?.midi)).toEqual([Note.midi("Bb3"), Note.midi("B#3")]);
  });
});

describe("readScore — single-feature fixtures (hand-worked expectations)", () => {
  test("test_tuplets_nested: 15:8 quintuplet sixteenths inside a triplet last 2/15 quarter", () => {
    const { score } = readScore(fixture("test_tuplets_nested.musicxml"));
    expect(score.events.map((e) => e.onset.toFraction())).toEqual(
      ["0", "1/3", "2/3", "1", "17/15", "19/15", "7/5", "23/15", "5/3"]);
    expect(score.events[3].written.tuplet).toEqual({ actual: 15, normal: 8 });
    expect(score.measures[0].length.toFraction()).toBe("2");
  });

  test("test_pickup: implicit bar 0 lasts one quarter; later bars start after it", () => {
    const { score } = readScore(fixture("test_pickup.musicxml"));
    expect(score.measures.map((m) => [m.number, m.implicit, m.start.valueOf(), m.length.valueOf()])).toEqual([
      ["0", true, 0, 1], ["1", false, 1, 3], ["2", false, 4, 3],
    ]);
    expect(score.measures[0].key).toEqual({ fifths: -1, mode: "major" });
  });

  test("test_mid_bar_clef: a clef change after two beats is an AttributeChange at offset 2", () => {
    const { score } = readScore(fixture("test_mid_bar_clef.musicxml"));
    const mid = score.measures[0].changes.filter((c) => c.offset.valueOf() > 0);
    expect(mid).toHaveLength(1);
    expect(mid[0].offset.toFraction()).toBe("2");
    expect(mid[0].clef).toEqual({ staff: 2, sign: "G", line: 2 });
    expect(score.measures[1].clefs.find((c) => c.staff === 2)?.sign).toBe("G");
    expect(score.measures[0].clefs.find((c) => c.staff === 2)?.sign).toBe("F");
  });

  test("test_fingering_substitution: several fingerings per note with their flags", () => {
    const { score } = readScore(fixture("test_fingering_substitution.musicxml"));
    expect(score.events[0].fingering).toEqual([{ finger: 4 }, { finger: 1, substitution: true }]);
    expect(score.events[1].fingering).toEqual([{ finger: 2 }, { finger: 3, alternate: true }]);
    expect(score.events[0].fingeringSource).toBe("score");
  });

  test("test_octave_shift: pitch data under an 8va line is already the sounding pitch", () => {
    // Source: MusicXML 4.0 <octave-shift> (from memory): "a treble clef line noted with 8va will be indicated
    // with an octave-shift down from the pitch data indicated in the notes"; verovio agrees on 33d-Spanners-OctaveShifts.
    const { score } = readScore(fixture("test_octave_shift.musicxml"));
    expect(score.events.map((e) => e.pitch?.midi)).toEqual([93, 81]);
  });

  test("test_ties_grace_chords: ties, grace, chord, rests, repeats, tempo, dynamics, words, entities", () => {
    const { score, warnings } = readScore(fixture("test_ties_grace_chords.musicxml"));
    expect(warnings).toEqual([]);
    expect(score.meta).toEqual({ title: "Study & Song — №3 für Klävier", composer: "Inés Quarrow" });
    expect(score.parts[0].name).toBe("Piáno");
    const [grace, c5, e5, rest, g1, g2, g3, wholeRest] = score.events;
    expect([grace.grace, grace.duration.valueOf(), grace.dynamic]).toEqual([true, 0, undefined]);
    expect([c5.tie, c5.dynamic, c5.words]).toEqual(["start", "p", "legato"]);
    expect([e5.chord, e5.onset.valueOf()]).toEqual([true, 0]);
    expect([rest.pitch, rest.onset.valueOf()]).toEqual([null, 2]);
    expect([g1.tie, g2.tie, g3.tie, g1.marks]).toEqual(["start", "continue", "stop", ["accent"]]);
    expect(wholeRest.duration.valueOf()).toBe(3);
    // ♩. = 60 is 90 quarter beats per minute.
    expect(score.measures[0].tempo).toBe(90);
    expect(score.measures[1].repeat).toEqual({ forward: true, backward: true, times: 2, ending: { number: "1", type: "stop" } });
    const merged = mergeTies(score.events.filter((e) => e.pitch?.midi === 79));
    expect(merged.map((e) => [e.onset.valueOf(), e.duration.valueOf(), e.tie])).toEqual([[3, 6, "none"]]);
  });
});

describe("readScore — input forms", () => {
  const xml = bar("<divisions>1</divisions>", note("C", 4, 4));

  test("bytes in UTF-8 and UTF-16 read the same as text", () => {
    const utf16 = new Uint8Array([0xff, 0xfe, ...new Uint8Array(Buffer.from(xml, "utf16le"))]);
    for (const input of [new TextEncoder().encode(xml), utf16]) {
      expect(readScore(input).score.events[0].pitch?.midi).toBe(60);
    }
  });

  test("an unsupported element gives a warning naming bar and element", () => {
    const { warnings } = readScore(bar("<divisions>1</divisions>", note("C", 4, 4, "<notations><glissando type=\"start\"/></notations>")));
    expect(warnings).toContainEqual(expect.objectContaining({ code: "unsupported", element: "glissando", measure: 0 }));
  });
});

describe("readScore — the cleaned copy from the reading pass", () => {
  test("{ clean: true } gives sanitizeScore's text and the same score and warnings", () => {
    // A file with a DOCTYPE, from the MusicXML test suite (lilypond-testsuite, MIT).
    const file = path.join(referenceDir, "musicxml/lilypond-testsuite/01a-Pitches-Pitches.xml");
    const bytes = new Uint8Array(fs.readFileSync(file));
    const both = readScore(bytes, { clean: true });
    const plain = readScore(bytes);
    expect(both.cleaned).toBe(sanitizeScore(bytes));
    expect(both.cleaned).not.toContain("<!DOCTYPE");
    expect(both.score.events.map((e) => [e.pitch?.midi, e.onset.toFraction()])).toEqual(
      plain.score.events.map((e) => [e.pitch?.midi, e.onset.toFraction()]),
    );
    expect(both.warnings).toEqual(plain.warnings);
    // Reading the stored copy gives the same notes as reading the upload.
    expect(readScore(both.cleaned).score.events.length).toBe(plain.score.events.length);
  });

  test("a comment, a processing instruction and CDATA are dropped or escaped, the notes kept", () => {
    const xml = bar("<divisions>1</divisions>", `<!-- a --><?pi x?>${note("C", 4, 1)}`).replace(
      "<part-name>P</part-name>",
      "<part-name><![CDATA[R&H]]></part-name>",
    );
    const { cleaned, score } = readScore(xml, { clean: true });
    expect(cleaned).not.toContain("<!--");
    expect(cleaned).not.toContain("<?pi");
    expect(cleaned).toContain("<part-name>R&amp;H</part-name>");
    expect(score.parts[0].name).toBe("R&H");
    expect(score.events[0].pitch?.midi).toBe(60); // FACTS.md §1: C4 = MIDI 60
  });
});
