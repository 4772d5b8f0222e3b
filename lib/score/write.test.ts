import Fraction from "fraction.js";
import { describe, expect, test } from "vitest";
import { readScore } from "./read";
import { buildScore } from "./test-builders";
import { mergeTies } from "./ties";
import { writeMusicXML } from "./write";

const notesOf = (xml: string): string[] => xml.match(/<note>.*?<\/note>/g) ?? [];
const measuresOf = (xml: string): string[] => xml.match(/<measure [^>]*>.*?<\/measure>/g) ?? [];
const triplet = { written: { type: null, dots: 0, tuplet: { actual: 3, normal: 2 } } };

/** Child element names of a <note>, in document order. */
const childOrder = (note: string): string[] => {
  const inner = note.replace(/^<note>/, "").replace(/<\/note>$/, "");
  const names: string[] = [];
  let depth = 0;
  for (const m of inner.matchAll(/<(\/?)([a-z-]+)[^>]*?(\/?)>/g)) {
    if (m[1]) depth--;
    else {
      if (depth === 0) names.push(m[2]);
      if (!m[3]) depth++;
    }
  }
  return names;
};

// Order of <note> children in the MusicXML 4.0 XSD (complexType "note").
const XSD_NOTE_ORDER = ["grace", "chord", "pitch", "rest", "duration", "tie", "voice", "type", "dot", "accidental", "time-modification", "stem", "notehead", "staff", "beam", "notations"];

describe("writeMusicXML", () => {
  test("divisions = LCM of the denominators in use, in the first bar (MusicXML 4.0 <divisions>: must take tuplets into account)", () => {
    const score = buildScore({
      bars: 1,
      notes: [
        { pitch: "C4", onset: 0, duration: "1/3", extra: triplet },
        { pitch: "D4", onset: "1/3", duration: "1/3", extra: triplet },
        { pitch: "E4", onset: "2/3", duration: "1/3", extra: triplet },
        { pitch: "F4", onset: 1, duration: "1/4" },
      ],
    });
    const xml = writeMusicXML(score);
    expect(xml).toContain("<divisions>12</divisions>");
    expect(measuresOf(xml)[0].match(/<divisions>/g)).toHaveLength(1);
    // triplet eighth = 4 divisions at 12 per quarter
    expect(notesOf(xml)[0]).toContain("<duration>4</duration>");
  });

  test("a note crossing the barline is split into tied notes that read back as one sounding note", () => {
    const score = buildScore({ bars: 2, notes: [{ pitch: "G4", onset: 3, duration: 2 }] });
    const xml = writeMusicXML(score);
    const [m1, m2] = measuresOf(xml);
    expect(m1).toMatch(/<tie type="start"\/>.*<tied type="start"\/>/);
    expect(m2).toMatch(/<tie type="stop"\/>.*<tied type="stop"\/>/);
    const back = mergeTies(readScore(xml).score.events).filter((e) => e.pitch);
    expect(back).toHaveLength(1);
    expect(back[0].onset.toFraction()).toBe("3");
    expect(back[0].duration.toFraction()).toBe("2");
  });

  test("every <note> keeps the XSD child order", () => {
    const score = buildScore({
      bars: 1,
      notes: [
        { pitch: "C4", onset: 0, duration: "1/3", extra: { ...triplet, fingering: [{ finger: 1 }], marks: ["diamond", "accent"], tie: "start" } },
        { pitch: "C4", onset: "1/3", duration: "1/3", extra: { ...triplet, tie: "stop" } },
        { pitch: "E4", onset: "2/3", duration: "1/3", extra: triplet },
        { pitch: "F#4", onset: 1, duration: "3/4" },
        { pitch: "A4", onset: "7/4", duration: "1/4" },
        { pitch: "B4", onset: 2, duration: 0, extra: { grace: true, written: { type: "eighth", dots: 0, tuplet: null } } },
        { pitch: "C5", onset: 2, duration: 2 },
        { pitch: "E5", onset: 2, duration: 2 },
      ],
    });
    for (const note of notesOf(writeMusicXML(score))) {
      const order = childOrder(note).map((n) => XSD_NOTE_ORDER.indexOf(n));
      expect(order.every((i) => i >= 0)).toBe(true);
      expect([...order].sort((a, b) => a - b)).toEqual(order);
    }
  });

  test("grand staff: two staves, treble and bass clefs, backup between the hands (43a-PianoStaff pattern)", () => {
    const score = buildScore({
      bars: 1,
      notes: [
        { pitch: "F4", onset: 0, duration: 4 },
        { pitch: "B2", onset: 0, duration: 4, staff: 2 },
      ],
    });
    const xml = writeMusicXML(score);
    expect(xml).toContain("<staves>2</staves>");
    expect(xml).toContain('<clef number="1"><sign>G</sign><line>2</line></clef>');
    expect(xml).toContain('<clef number="2"><sign>F</sign><line>4</line></clef>');
    expect(xml).toMatch(/<staff>1<\/staff>.*<backup><duration>4<\/duration><\/backup>.*<staff>2<\/staff>/);
    const back = readScore(xml).score.events.filter((e) => e.pitch);
    // FACTS §3: in 43a-PianoStaff both whole notes start at 0
    expect(back.map((e) => e.onset.valueOf())).toEqual([0, 0]);
  });

  test("triplets get <time-modification> and a bracket from the first to the third note", () => {
    const score = buildScore({
      bars: 1,
      notes: [0, 1, 2, 3, 4, 5].map((i) => ({ pitch: "C5", onset: new Fraction(i, 3), duration: "1/3", extra: triplet })),
    });
    const notes = notesOf(writeMusicXML(score)).slice(0, 6);
    for (const n of notes) expect(n).toContain("<time-modification><actual-notes>3</actual-notes><normal-notes>2</normal-notes></time-modification>");
    const marks = notes.map((n) => (n.match(/<tuplet type="(\w+)"/g) ?? []).join());
    expect(marks).toEqual(['<tuplet type="start"', "", '<tuplet type="stop"', '<tuplet type="start"', "", '<tuplet type="stop"']);
  });

  test("beams follow the beat: four 16ths share two beams; an eighth and two 16ths hook the second level", () => {
    const score = buildScore({
      bars: 1,
      notes: [
        ...[0, 1, 2, 3].map((i) => ({ pitch: "D5", onset: new Fraction(i, 4), duration: "1/4" })),
        { pitch: "E5", onset: 1, duration: "1/2" },
        { pitch: "F5", onset: "3/2", duration: "1/4" },
        { pitch: "G5", onset: "7/4", duration: "1/4" },
      ],
    });
    const beams = notesOf(writeMusicXML(score))
      .slice(0, 7)
      .map((n) => [...n.matchAll(/<beam number="(\d)">([a-z ]+)<\/beam>/g)].map((m) => `${m[1]}:${m[2]}`).join(" "));
    expect(beams).toEqual([
      "1:begin 2:begin",
      "1:continue 2:continue",
      "1:continue 2:continue",
      "1:end 2:end",
      "1:begin",
      "1:continue 2:begin",
      "1:end 2:end",
    ]);
  });

  test("type and dot come from the duration when the model has none", () => {
    const score = buildScore({ bars: 1, notes: [{ pitch: "C4", onset: 0, duration: 3 }, { pitch: "D4", onset: 3, duration: 1 }] });
    const [n1, n2] = notesOf(writeMusicXML(score));
    expect(n1).toContain("<type>half</type><dot/>");
    expect(n2).toContain("<type>quarter</type>");
  });

  test("fingering, marks, grace notes, dynamics and words", () => {
    const score = buildScore({
      bars: 1,
      notes: [
        { pitch: "A4", onset: 0, duration: 0, extra: { grace: true, written: { type: "16th", dots: 0, tuplet: null } } },
        { pitch: "G4", onset: 0, duration: 1, extra: { fingering: [{ finger: 3 }, { finger: 1, substitution: true }], dynamic: "pp", words: "Lift & land" } },
        { pitch: "E4", onset: 1, duration: 1, extra: { marks: ["staccato", "tenuto"], fingering: [{ finger: 2, alternate: true }] } },
        { pitch: "D4", onset: 2, duration: 1, extra: { marks: ["diamond"], dynamic: "cresc. poco" } },
        { pitch: "C4", onset: 3, duration: 1, extra: { marks: ["fermata", "accent"] } },
      ],
    });
    const xml = writeMusicXML(score);
    const [grace, g, e, d, c] = notesOf(xml);
    expect(grace).toMatch(/^<note><grace\/><pitch>/);
    expect(grace).not.toContain("<duration>");
    expect(g).toContain('<technical><fingering>3</fingering><fingering substitution="yes">1</fingering></technical>');
    expect(e).toContain('<fingering alternate="yes">2</fingering>');
    expect(e).toContain("<articulations><staccato/><tenuto/></articulations>");
    expect(d).toContain("<notehead>diamond</notehead>");
    expect(c).toContain("<accent/>");
    expect(c).toContain('<fermata type="upright"/>');
    expect(xml).toContain("<dynamics><pp/></dynamics>");
    expect(xml).toContain("<dynamics><other-dynamics>cresc. poco</other-dynamics></dynamics>");
    expect(xml).toContain("<words>Lift &amp; land</words>");
    const back = readScore(xml).score.events.filter((ev) => ev.pitch);
    expect(back.find((ev) => ev.pitch!.midi === 67)!.fingering).toEqual([{ finger: 3 }, { finger: 1, substitution: true }]);
    expect(back.find((ev) => ev.pitch!.midi === 69)!.grace).toBe(true);
  });

  test("tempo, title, composer, subtitle, repeats and endings", () => {
    const score = buildScore({
      title: "Rotation drill",
      composer: "Studio",
      subtitle: "Slowly, then faster",
      bars: 3,
      notes: [0, 4, 8].map((t) => ({ pitch: "C4", onset: t, duration: 4 })),
      barExtras: {
        0: { tempo: 72, repeat: { forward: true } },
        1: { repeat: { backward: true, ending: { number: "1", type: "start" } } },
        2: { repeat: { ending: { number: "2", type: "discontinue" } } },
      },
    });
    const xml = writeMusicXML(score);
    expect(xml).toContain("<work><work-title>Rotation drill</work-title></work>");
    expect(xml).toContain('<creator type="composer">Studio</creator>');
    expect(xml).toContain("<credit-words>Slowly, then faster</credit-words>");
    expect(xml).toMatch(/<metronome><beat-unit>quarter<\/beat-unit><per-minute>72<\/per-minute><\/metronome>.*<sound tempo="72"\/>/);
    const [m1, m2, m3] = measuresOf(xml);
    expect(m1).toContain('<barline location="left"><bar-style>heavy-light</bar-style><repeat direction="forward"/></barline>');
    expect(m2).toContain('<ending number="1" type="start"/>');
    expect(m2).toMatch(/<barline location="right"><bar-style>light-heavy<\/bar-style><ending number="1" type="stop"\/><repeat direction="backward"\/><\/barline>/);
    expect(m3).toContain('<ending number="2" type="discontinue"/>');
    const back = readScore(xml).score;
    expect(back.meta.title).toBe("Rotation drill");
    expect(back.measures[0].tempo).toBe(72);
    expect(back.measures[1].repeat?.backward).toBe(true);
  });

  test("key, time and clef changes: at a bar start and in mid-bar", () => {
    const score = buildScore({
      bars: 2,
      time: [{ beats: 4, beatType: 4 }, { beats: 3, beatType: 4 }],
      notes: [0, 1, 2, 3].map((t) => ({ pitch: "C4", onset: t, duration: 1 })),
      barExtras: {
        0: { changes: [{ offset: new Fraction(2), clef: { staff: 1, sign: "F", line: 4 } }] },
        1: { key: { fifths: 2, mode: "major" }, clefs: [{ staff: 1, sign: "F", line: 4 }, { staff: 2, sign: "F", line: 4 }] },
      },
    });
    const xml = writeMusicXML(score);
    const [m1, m2] = measuresOf(xml);
    // the clef change sits between the second and third note
    expect(m1).toMatch(/(<note>.*?<\/note>){2}<attributes><clef number="1"><sign>F<\/sign><line>4<\/line><\/clef><\/attributes><note>/);
    expect(m2).toContain("<attributes><key><fifths>2</fifths><mode>major</mode></key><time><beats>3</beats><beat-type>4</beat-type></time></attributes>");
    expect(m2).not.toContain("<clef");
    const back = readScore(xml).score;
    expect(back.measures[1].key.fifths).toBe(2);
    expect(back.measures[1].time).toEqual({ beats: 3, beatType: 4 });
    expect(back.measures[0].changes.some((c) => c.clef?.sign === "F" && c.offset.equals(2))).toBe(true);
  });

  test("gaps: rests in the first voice of a staff, <forward> in a second voice", () => {
    const score = buildScore({
      bars: 1,
      staves: 1,
      notes: [
        { pitch: "E5", onset: 1, duration: 1, voice: "1" },
        { pitch: "C4", onset: 2, duration: 2, voice: "2" },
      ],
    });
    const xml = writeMusicXML(score);
    expect(xml).toMatch(/^.*<measure [^>]*>(<attributes>.*?<\/attributes>)<note><rest\/><duration>1<\/duration><voice>1<\/voice><type>quarter<\/type>/s);
    expect(xml).toContain("<forward><duration>2</duration><voice>2</voice><staff>1</staff></forward>");
    const notes = readScore(xml).score.events.filter((e) => e.pitch);
    expect(notes.map((e) => [e.pitch!.midi, e.onset.valueOf(), e.voice])).toEqual([
      [76, 1, "1"],
      [60, 2, "2"],
    ]);
  });

  test("an empty staff gets a whole-bar rest", () => {
    const xml = writeMusicXML(buildScore({ bars: 1, notes: [{ pitch: "C4", onset: 0, duration: 4 }] }));
    expect(xml).toContain('<rest measure="yes"/><duration>4</duration><voice>5</voice><staff>2</staff>');
  });
});
