// The three demo pieces in fixtures/pieces: valid MusicXML 4.0, full bars, and the features the
// demo studio and the drill tests rely on.
import { describe, expect, test } from "vitest";
import { demoPiece } from "../handout/sample-sheet";
import { hasXmllint, validateMusicXml } from "../support/xmllint";
import { verovioNotes } from "../support/verovio";

const NAMES = ["lantern-waltz", "pebble-study", "two-ribbons"] as const;
const pieces = NAMES.map((name) => ({ name, xml: demoPiece(name) }));

const measures = (xml: string) => [...xml.matchAll(/<measure\b([^>]*)>([\s\S]*?)<\/measure>/g)].map((m) => ({ attrs: m[1], body: m[2] }));
const notes = (body: string) => [...body.matchAll(/<note>([\s\S]*?)<\/note>/g)].map((m) => m[1]);
const num = (s: string, tag: string) => Number(new RegExp(`<${tag}>(\\d+)</${tag}>`).exec(s)?.[1]);

describe("demo pieces", () => {
  test.runIf(hasXmllint()).each(pieces)("$name validates against the MusicXML 4.0 XSD", ({ xml }) => {
    const r = validateMusicXml(xml); // W3C MusicXML 4.0 schema, vendored copy in fixtures/reference
    expect(r.errors).toEqual([]);
    expect(r.valid).toBe(true);
  });

  test.each(pieces)("$name: one piano part on two staves, treble and bass clef, with encoding, tempo, dynamics, fingering", ({ xml }) => {
    expect(xml.match(/<score-part\b/g)).toHaveLength(1);
    expect(xml).toContain("<staves>2</staves>");
    expect(xml).toMatch(/<clef number="1">\s*<sign>G<\/sign>\s*<line>2<\/line>/);
    expect(xml).toMatch(/<clef number="2">\s*<sign>F<\/sign>\s*<line>4<\/line>/);
    expect(xml).toMatch(/<identification>[\s\S]*<encoding>[\s\S]*<\/encoding>/);
    expect(xml).toMatch(/<sound tempo="\d+"/);
    expect(xml).toContain("<dynamics>");
    expect(xml).toMatch(/<technical>\s*<fingering>[1-5]<\/fingering>/);
    expect(xml).toContain('<creator type="composer">Knotwork demo</creator>');
  });

  test.each(pieces)("$name: every voice of every bar fills the bar exactly", ({ xml }) => {
    // MusicXML 4.0 <divisions>: durations count divisions per quarter note (FACTS.md §3);
    // a bar of beats/beat-type lasts beats × 4 / beat-type quarters; <chord/> notes add no time.
    const divisions = num(xml, "divisions");
    const bar = (num(xml, "beats") * 4 * divisions) / num(xml, "beat-type");
    const ms = measures(xml);
    expect(ms.length - (ms[0].attrs.includes('implicit="yes"') ? 1 : 0)).toBeGreaterThanOrEqual(8);
    expect(ms.length).toBeLessThanOrEqual(17);
    for (const m of ms) {
      const sums = new Map<string, number>();
      for (const n of notes(m.body)) {
        if (n.includes("<chord/>")) continue;
        const key = `${num(n, "staff")}/${/<voice>(\w+)<\/voice>/.exec(n)![1]}`;
        sums.set(key, (sums.get(key) ?? 0) + num(n, "duration"));
      }
      const expected = m.attrs.includes('implicit="yes"') ? Math.min(...sums.values()) : bar;
      expect(sums.size, m.attrs).toBeGreaterThanOrEqual(2);
      for (const [voice, sum] of sums) expect(sum, `${m.attrs} voice ${voice}`).toBe(expected);
    }
  });

  test.each(pieces)("$name: verovio reads as many notes as the file holds", async ({ xml }) => {
    const written = measures(xml).flatMap((m) => notes(m.body)).filter((n) => n.includes("<pitch>")).length;
    const read = await verovioNotes(xml, { mergeTies: false }); // verovio 6.3.0 as reference reader
    expect(read.length).toBe(written);
  });

  test("between them: pickup, triplets, Alberti-like figure, two voices, ties over the barline, a leap", () => {
    const [waltz, study, ribbons] = pieces.map((p) => p.xml);
    expect(waltz).toMatch(/<measure number="0" implicit="yes">/);
    expect(study).toContain("<actual-notes>3</actual-notes>");
    expect(study).toContain('<tuplet type="start" bracket="yes"');
    expect(study).toMatch(/<chord\/>[\s\S]*<staff>1<\/staff>/);
    // left-hand figure returning to C4: in bar 1 of the waltz, C4 is every second eighth
    const bar1 = measures(waltz)[1].body;
    const lh = notes(bar1).filter((n) => n.includes("<staff>2</staff>")).map((n) => /<step>(\w)<\/step>[\s\S]*<octave>(\d)/.exec(n)!.slice(1).join(""));
    expect(lh).toEqual(["F3", "C4", "A3", "C4", "A3", "C4"]);
    expect(ribbons).toContain("<backup>");
    expect(ribbons).toMatch(/<voice>2<\/voice>/);
    // a tie that starts in one bar and stops in the next
    const ms = measures(ribbons);
    const tieBar = ms.findIndex((m) => m.body.includes('<tie type="start"/>'));
    expect(ms[tieBar + 1].body).toContain('<tie type="stop"/>');
  });

  test("the waltz's right hand leaps more than an octave (A4 → C6)", async () => {
    const rh = (await verovioNotes(demoPiece("lantern-waltz"))).filter((n) => n.staff === 1);
    const leaps = rh.slice(1).map((n, i) => Math.abs(n.midi - rh[i].midi));
    expect(Math.max(...leaps)).toBeGreaterThan(12); // A4 = MIDI 69, C6 = 84 (FACTS.md §2: C4 = 60)
  });
});
