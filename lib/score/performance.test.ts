import Fraction from "fraction.js";
import { describe, expect, test } from "vitest";
import { GRACE_QUARTERS, ROLL_QUARTERS, toPerformance, VELOCITY } from "./performance";
import { readScore } from "./read";
import { buildScore } from "./test-builders";

const scale = buildScore({
  bars: 2,
  notes: ["C4", "D4", "E4", "F4", "G4", "A4", "B4", "C5"].map((p, i) => ({ pitch: p, onset: i, duration: 1 })),
});

describe("toPerformance", () => {
  test.each([60, 90, 120, 208])("onset in seconds = onset in quarters × 60 / bpm (definition of bpm) at %i bpm", (bpm) => {
    const perf = toPerformance(scale, { bpm });
    expect(perf.bpm).toBe(bpm);
    perf.notes.forEach((n, i) => {
      expect(n.start).toBeCloseTo((i * 60) / bpm, 9);
      expect(n.duration).toBeCloseTo(60 / bpm, 9);
    });
    expect(perf.durationSeconds).toBeCloseTo((8 * 60) / bpm, 9);
  });

  test("middle C is MIDI 60 (FACTS §2) and notes keep their staff", () => {
    const perf = toPerformance(scale, { bpm: 60 });
    expect(perf.notes.map((n) => n.midi)).toEqual([60, 62, 64, 65, 67, 69, 71, 72]);
    expect(perf.notes.every((n) => n.staff === 1)).toBe(true);
  });

  test("tied notes sound once, for their whole length", () => {
    const score = buildScore({
      bars: 2,
      notes: [
        { pitch: "G4", onset: 2, duration: 2, extra: { tie: "start" } },
        { pitch: "G4", onset: 4, duration: 1, extra: { tie: "stop" } },
      ],
    });
    const perf = toPerformance(score, { bpm: 120 });
    expect(perf.notes).toHaveLength(1);
    expect(perf.notes[0].start).toBeCloseTo(1, 9);
    expect(perf.notes[0].duration).toBeCloseTo(1.5, 9);
    expect(perf.notes[0].eventIds).toHaveLength(2);
  });

  test("the score's metronome marks set the tempo unless bpm overrides", () => {
    const score = buildScore({
      bars: 2,
      notes: [{ pitch: "C4", onset: 0, duration: 4 }, { pitch: "D4", onset: 4, duration: 4 }],
      barExtras: { 0: { tempo: 60 }, 1: { tempo: 120 } },
    });
    const marked = toPerformance(score);
    expect(marked.bpm).toBe(60);
    expect(marked.notes[1].start).toBeCloseTo(4, 9); // 4 quarters at 60
    expect(marked.notes[1].duration).toBeCloseTo(2, 9); // 4 quarters at 120
    const fixed = toPerformance(score, { bpm: 100 });
    expect(fixed.notes[1].start).toBeCloseTo(2.4, 9);
  });

  test("without a mark the tempo is 120, the Standard MIDI File default (500,000 µs per quarter, from memory)", () => {
    expect(toPerformance(scale).bpm).toBe(120);
  });

  test("grace notes sound just before their main note, which stays on the beat", () => {
    const score = buildScore({
      bars: 1,
      notes: [
        { pitch: "C4", onset: 0, duration: 1 },
        { pitch: "E4", onset: 1, duration: 0, extra: { grace: true } },
        { pitch: "F4", onset: 1, duration: 0, extra: { grace: true } },
        { pitch: "D4", onset: 1, duration: 1 },
      ],
    });
    const perf = toPerformance(score, { bpm: 60 });
    const at = (midi: number) => perf.notes.find((n) => n.midi === midi)!;
    expect(at(62).start).toBeCloseTo(1, 9);
    expect(at(64).start).toBeCloseTo(1 - 2 * GRACE_QUARTERS, 9);
    expect(at(65).start).toBeCloseTo(1 - GRACE_QUARTERS, 9);
    expect(at(65).start + at(65).duration).toBeCloseTo(1, 9);
  });

  test("dynamics set velocity until the next one (common practice table); accents add weight", () => {
    const score = buildScore({
      bars: 1,
      notes: [
        { pitch: "C4", onset: 0, duration: 1 },
        { pitch: "D4", onset: 1, duration: 1, extra: { dynamic: "pp" } },
        { pitch: "E4", onset: 2, duration: 1, extra: { marks: ["accent"] } },
        { pitch: "F4", onset: 3, duration: 1, extra: { dynamic: "ff" } },
      ],
    });
    const v = toPerformance(score).notes.map((n) => n.velocity);
    expect(v[0]).toBe(VELOCITY.mf);
    expect(v[1]).toBe(VELOCITY.pp);
    expect(v[2]).toBeGreaterThan(VELOCITY.pp);
    expect(v[3]).toBe(VELOCITY.ff);
    // louder marks give larger velocities
    const ladder = ["pp", "p", "mp", "mf", "f", "ff"].map((d) => VELOCITY[d]);
    expect([...ladder].sort((a, b) => a - b)).toEqual(ladder);
  });

  test("clicks fall on every beat, bar starts flagged; 6/8 clicks dotted quarters", () => {
    const perf = toPerformance(scale, { bpm: 60 });
    expect(perf.beats.map((b) => b.time)).toEqual([0, 1, 2, 3, 4, 5, 6, 7]);
    expect(perf.beats.filter((b) => b.barStart).map((b) => b.time)).toEqual([0, 4]);
    const sixEight = buildScore({ bars: 1, time: { beats: 6, beatType: 8 }, notes: [{ pitch: "C4", onset: 0, duration: new Fraction(3) }] });
    expect(toPerformance(sixEight, { bpm: 60 }).beats.map((b) => b.time)).toEqual([0, 1.5]);
  });
});

describe("tremolos and arpeggios are played", () => {
  // MusicXML 4.0 <tremolo>: the number of marks (1 = eighths, 2 = sixteenths, 3 = 32nds); type "single" repeats
  // one note, "start"/"stop" alternate two notes whose <time-modification> 2:1 halves their written value.
  const file = (notes: string) => `<?xml version="1.0"?><score-partwise version="4.0"><part-list><score-part id="P1"><part-name>P</part-name></score-part></part-list>
<part id="P1"><measure number="1"><attributes><divisions>4</divisions><time><beats>4</beats><beat-type>4</beat-type></time></attributes>${notes}</measure></part></score-partwise>`;
  const n = (step: string, dur: number, type: string, extra = "", notations = "") =>
    `<note>${extra.includes("<chord/>") ? "<chord/>" : ""}<pitch><step>${step}</step><octave>4</octave></pitch><duration>${dur}</duration><type>${type}</type>${extra.replace("<chord/>", "")}${notations ? `<notations>${notations}</notations>` : ""}</note>`;

  test("a single-note tremolo with two marks plays sixteenths for its whole length", () => {
    const { score } = readScore(file(n("C", 4, "quarter", "", "<ornaments><tremolo type=\"single\">2</tremolo></ornaments>") + n("D", 12, "half", "<dot/>")));
    const c = toPerformance(score).notes.filter((x) => x.midi === 60);
    expect(c.map((x) => [x.startQuarters, x.quarters])).toEqual([[0, 0.25], [0.25, 0.25], [0.5, 0.25], [0.75, 0.25]]);
  });

  test("a two-note tremolo alternates its two notes across the pair's span", () => {
    const tm = "<time-modification><actual-notes>2</actual-notes><normal-notes>1</normal-notes></time-modification>";
    const { score } = readScore(file(
      n("C", 4, "half", tm, "<ornaments><tremolo type=\"start\">1</tremolo></ornaments>") +
      n("E", 4, "half", tm, "<ornaments><tremolo type=\"stop\">1</tremolo></ornaments>") + n("G", 8, "half")));
    const played = toPerformance(score).notes.filter((x) => x.midi !== 67).map((x) => [x.midi, x.startQuarters]);
    expect(played).toEqual([[60, 0], [64, 0.5], [60, 1], [64, 1.5]]);
  });

  test("an arpeggiated chord is rolled from the bottom up; a non-arpeggio chord is not", () => {
    const arp = "<arpeggiate/>";
    const rolled = readScore(file(n("C", 16, "whole", "", arp) + n("E", 16, "whole", "<chord/>", arp) + n("G", 16, "whole", "<chord/>", arp))).score;
    expect(toPerformance(rolled).notes.map((x) => [x.midi, x.startQuarters])).toEqual([[60, 0], [64, ROLL_QUARTERS], [67, 2 * ROLL_QUARTERS]]);
    const flat = readScore(file(n("C", 16, "whole", "", "<non-arpeggiate type=\"bottom\"/>") + n("G", 16, "whole", "<chord/>", "<non-arpeggiate type=\"top\"/>"))).score;
    expect(toPerformance(flat).notes.map((x) => x.startQuarters)).toEqual([0, 0]);
  });
});
