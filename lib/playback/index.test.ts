import { describe, expect, test } from "vitest";
import { playbackOf } from "../knots/dto";
import { playbackEvents } from "./index";
import { readScore } from "../score/read";

// Two bars of 4/4, divisions 1 (one division per quarter). Bar 1: C4 C4 quarters, then E4 half
// tied over the barline to an E4 quarter in bar 2; then G4 quarter and a half rest.
// MusicXML 4.0 <tie type="start|stop"> marks the sounding tie (spec: the tie element);
// MIDI numbers: C4 = 60, E4 = 64, G4 = 67 (MIDI 1.0, middle C = 60 — common practice).
const note = (step: string, dur: number, type: string, tie?: "start" | "stop") =>
  `<note><pitch><step>${step}</step><octave>4</octave></pitch><duration>${dur}</duration>` +
  `${tie ? `<tie type="${tie}"/>` : ""}<voice>1</voice><type>${type}</type>` +
  `${tie ? `<notations><tied type="${tie}"/></notations>` : ""}</note>`;
const XML = `<?xml version="1.0" encoding="UTF-8"?>
<score-partwise version="4.0"><part-list><score-part id="P1"><part-name>Piano</part-name></score-part></part-list>
<part id="P1">
<measure number="1"><attributes><divisions>1</divisions><key><fifths>0</fifths></key><time><beats>4</beats><beat-type>4</beat-type></time><clef><sign>G</sign><line>2</line></clef></attributes>
<direction placement="above"><direction-type><metronome><beat-unit>quarter</beat-unit><per-minute>90</per-minute></metronome></direction-type><sound tempo="90"/></direction>
${note("C", 1, "quarter")}${note("C", 1, "quarter")}${note("E", 2, "half", "start")}</measure>
<measure number="2">${note("E", 1, "quarter", "stop")}${note("G", 1, "quarter")}<note><rest/><duration>2</duration><voice>1</voice><type>half</type></note></measure>
</part></score-partwise>`;

describe("playbackEvents", () => {
  const { score } = readScore(XML);

  test("a note tied over the barline sounds once, for the half plus the quarter", () => {
    const p = playbackEvents(score);
    const shape = p.events.map((e) => [e.midi, e.onsetQ, e.durationQ]);
    expect(shape).toEqual([
      [60, 0, 1],
      [60, 1, 1],
      [64, 2, 3],
      [67, 5, 1],
    ]);
  });

  test("metre, tempo mark, range and bars come with the events", () => {
    const p = playbackEvents(score);
    expect(p.beatsPerBar).toBe(4);
    expect(p.beatUnitQ).toBe(1);
    expect(p.initialBpm).toBe(90);
    expect([p.startQ, p.endQ, p.barAnchorQ]).toEqual([0, 8, 0]);
    expect(p.bars).toEqual([{ number: 1, startQ: 0 }, { number: 2, startQ: 4 }]);
  });

  test("a range of bars plays the notes that start inside it", () => {
    const p = playbackEvents(score, { fromMeasure: 1, toMeasure: 1 });
    expect(p.events.map((e) => [e.midi, e.onsetQ, e.durationQ])).toEqual([[67, 5, 1]]);
    expect([p.startQ, p.endQ]).toEqual([4, 8]);
    expect(p.bars).toEqual([{ number: 2, startQ: 4 }]);
  });

  test("a drill's playback keeps the tied length too", () => {
    const tied = playbackOf(score).events.find((e) => e.midi === 64);
    expect(tied?.durationQ).toBe(3);
  });
});

describe("playbackEvents on hostile numbers", () => {
  // fixtures/hostile/huge-duration.xml (scripts/make-hostile-bounds.ts): four bars at divisions 4,
  // bar 3 holds one note of 10^15 divisions. Before the bound, playback made one metronome click per
  // beat of that note (2.5 × 10^14 of them) and the server ran out of memory.
  test("the 10^15-duration file: one event per note, built in well under a second", async () => {
    const { boundsCorpus } = await import("../../scripts/make-hostile-bounds");
    const c = boundsCorpus().find((x) => x.file === "huge-duration.xml")!;
    const { score } = readScore(c.bytes);
    const heap = process.memoryUsage().heapUsed;
    const t0 = performance.now();
    const p = playbackEvents(score);
    expect(performance.now() - t0).toBeLessThan(1000);
    expect(p.events).toHaveLength(score.events.filter((e) => e.pitch).length);
    expect(p.events[2].durationQ).toBe(1e15 / 4);
    expect(process.memoryUsage().heapUsed - heap).toBeLessThan(64 * 1024 * 1024);
  });
});
