import fs from "node:fs";
import path from "node:path";
import { describe, expect, test } from "vitest";
import { handsOfPart, pianoCandidates, pianoPart } from "./parts";
import { selectPassage } from "./passage";
import { readScore } from "./read";
import { writeMusicXML } from "./write";

const scores = path.resolve(__dirname, "../../fixtures/reference/scores");

describe("the piano part of a score", () => {
  test("every real song (voice + piano, fixtures/reference/scores/SOURCES.md) finds its piano part, not the voice", () => {
    for (const file of fs.readdirSync(scores).filter((f) => f.endsWith(".mxl"))) {
      const { score } = readScore(new Uint8Array(fs.readFileSync(path.join(scores, file))));
      const piano = pianoPart(score)!;
      // SOURCES.md: "a vocal part plus a two-staff piano part"; the piano is the part with two staves.
      expect(piano.staves, file).toBe(2);
      expect(piano.id, file).not.toBe(score.parts[0].id);
      const knot = selectPassage(score, { hand: "right", from: 0, to: 3 });
      expect(knot.part, file).toBe(piano.id);
      expect(knot.events.every((e) => e.part === piano.id)).toBe(true);
    }
  });

  test("a part named piano outranks an unnamed grand staff; several candidates are all offered", () => {
    const parts = [
      { id: "P1", name: "Voice", staves: 1 },
      { id: "P2", name: "Harp", staves: 2 },
      { id: "P3", name: "Pianoforte", staves: 2 },
    ];
    expect(pianoCandidates({ parts }).map((c) => c.part.id)).toEqual(["P3", "P2"]);
    expect(pianoPart({ parts: [{ id: "V", name: "Soprano", staves: 1 }, { id: "F", name: "Flute", staves: 1 }] })).toBeUndefined();
    expect(pianoPart({ parts: [{ id: "S", name: "", staves: 1 }] })?.id).toBe("S");
  });

  test("a cross-staff note follows its voice's hand", () => {
    const note = (step: string, octave: number, voice: number, staff: number) =>
      `<note><pitch><step>${step}</step><octave>${octave}</octave></pitch><duration>1</duration><voice>${voice}</voice><type>quarter</type><staff>${staff}</staff></note>`;
    const xml = `<?xml version="1.0"?><score-partwise version="4.0"><part-list><score-part id="P1"><part-name>Piano</part-name></score-part></part-list>
<part id="P1"><measure number="1"><attributes><divisions>1</divisions><time><beats>4</beats><beat-type>4</beat-type></time><staves>2</staves></attributes>
${note("C", 5, 1, 1)}${note("D", 5, 1, 1)}${note("E", 5, 1, 1)}${note("F", 5, 1, 1)}<backup><duration>4</duration></backup>
${note("C", 3, 5, 2)}${note("D", 3, 5, 2)}${note("E", 3, 5, 2)}${note("G", 4, 5, 1)}</measure></part></score-partwise>`;
    const { score } = readScore(xml);
    const handOf = handsOfPart(score.events, "P1");
    const g4 = score.events.find((e) => e.pitch?.midi === 67)!;
    expect(g4.staff).toBe(1);
    expect(handOf(g4)).toBe("left");
    const left = selectPassage(score, { hand: "left", from: 0, to: 0 });
    expect(left.events.map((e) => e.pitch!.midi).sort()).toEqual([48, 50, 52, 67]);
  });
});

describe("each part keeps its own clefs", () => {
  test("a song's piano part is written with its own clefs, not the voice's", () => {
    // fixtures/reference/scores/varied-01 (Holmès, Journée fleurie), read from the file: the piano's first
    // <attributes> gives staff 1 a G clef, then an F clef on line 4 (after-barline), and staff 2 an F clef
    // on line 4; the voice part has a G clef.
    const { score } = readScore(new Uint8Array(fs.readFileSync(path.join(scores, "varied-01_holmes_journee-fleurie.mxl"))));
    const piano = pianoPart(score)!;
    const knot = selectPassage(score, { hand: "right", from: 0, to: 1 });
    expect(knot.measures[0].clefs.map((c) => [c.staff, c.sign, c.line])).toEqual([[1, "F", 4], [2, "F", 4]]);
    const xml = writeMusicXML({ ...score, parts: [piano], events: score.events.filter((e) => e.part === piano.id) });
    const first = xml.slice(xml.indexOf("<measure"), xml.indexOf("</attributes>"));
    expect(first).toContain('<clef number="1"><sign>F</sign><line>4</line></clef>');
  });
});
