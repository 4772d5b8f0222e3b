import Fraction from "fraction.js";
import { describe, expect, test } from "vitest";
import { barLength, buildDrill, defaultTempo, leadOf, makeContext, restSlot, sonoritySlot, writtenPieces } from "./build";
import { estimateFingering } from "./fingering";
import { generateThumbPairs, thumbPairsOptions } from "./families/thumb-pairs";
import { generateScaleRhythm, scaleRhythmOptions } from "./families/scale-rhythm";
import { pitchFromName } from "./spell";
import { makePassage } from "./test-passages";
import type { Drill } from "./types";

const q = (n: number, d = 1) => new Fraction(n, d);
const note = (name: string, dur: Fraction) => ({ duration: dur, notes: [{ pitch: pitchFromName(name) }] });
const spec = { family: "test", variant: "v", title: "T", teacherNote: "why", studentNote: "how" };

/** Every staff of every bar sums to the bar length (MusicXML 4.0 <time>: beats × 4 / beat-type quarters). */
function expectFullBars(d: Drill) {
  for (const m of d.score.measures) {
    for (let staff = 1; staff <= d.score.parts[0].staves; staff++) {
      const sum = d.score.events
        .filter((e) => e.measure === m.index && e.staff === staff && !e.chord)
        .reduce((s, e) => s.add(e.duration), q(0));
      expect(sum.toFraction(), `bar ${m.number} staff ${staff}`).toBe(barLength(m.time).toFraction());
    }
  }
}

describe("writtenPieces", () => {
  test("note values and dots (MusicXML <type>/<dot>)", () => {
    expect(writtenPieces(q(3, 2)).map((p) => [p.written.type, p.written.dots])).toEqual([["quarter", 1]]);
    expect(writtenPieces(q(7, 4)).map((p) => [p.written.type, p.written.dots])).toEqual([["quarter", 2]]);
    expect(writtenPieces(q(5, 4)).map((p) => p.written.type)).toEqual(["quarter", "16th"]);
    expect(writtenPieces(q(3)).map((p) => [p.written.type, p.written.dots])).toEqual([["half", 1]]);
  });
  test("triplet eighth: sounds 1/3 quarter, written as an eighth with 3:2 (MusicXML <time-modification>)", () => {
    const [p] = writtenPieces(q(1, 3), { actual: 3, normal: 2 });
    expect(p.written).toEqual({ type: "eighth", dots: 0, tuplet: { actual: 3, normal: 2 } });
    expect(p.duration.toFraction()).toBe("1/3");
  });
});

describe("buildDrill", () => {
  test("a note across the barline is split and tied; the last bar is completed with rests", () => {
    const p = makePassage({ right: "C4/4" });
    const d = buildDrill(p, { ...spec, segments: [{ right: [note("E4", q(3)), note("G4", q(2))] }] }, makeContext());
    expectFullBars(d);
    const g = d.score.events.filter((e) => e.pitch?.midi === 67);
    expect(g.map((e) => [e.onset.toFraction(), e.duration.toFraction(), e.tie])).toEqual([
      ["3", "1", "start"],
      ["4", "1", "stop"],
    ]);
    const rests = d.score.events.filter((e) => !e.pitch && e.measure === 1);
    expect(rests.reduce((s, e) => s.add(e.duration), q(0)).toFraction()).toBe("3");
    expect(d.score.measures).toHaveLength(2);
  });

  test("source fingering is kept and marked as from the score; clefs follow the range", () => {
    const p = makePassage({ right: "C5/4@1 E5/4@3", left: "C3/2@5" });
    const d = buildDrill(p, { ...spec, segments: [{ right: p.sonorities.right.map((s) => sonoritySlot(s)), left: p.sonorities.left.map((s) => sonoritySlot(s)) }] }, makeContext());
    expectFullBars(d);
    const e5 = d.score.events.find((e) => e.pitch?.midi === 76)!;
    expect(e5.fingering?.[0].finger).toBe(3);
    expect(d.fingeringSource[e5.id]).toBe("score");
    expect(e5.staff).toBe(1);
    expect(d.score.events.find((e) => e.pitch?.midi === 48)!.staff).toBe(2);
    expect(d.score.measures[0].clefs).toEqual([{ staff: 1, sign: "G", line: 2 }, { staff: 2, sign: "F", line: 4 }]);
    expect(d.hands).toBe("both");
  });

  test("unfingered notes get an estimated finger 1–5, marked estimated; written ones stay", () => {
    const p = makePassage({ right: "C4/8@1 D4/8 E4/8 F4/8 G4/2" });
    const d = buildDrill(p, { ...spec, segments: [{ right: p.sonorities.right.map((s) => sonoritySlot(s)) }] }, makeContext());
    const notes = d.score.events.filter((e) => e.pitch);
    expect(d.fingeringSource[notes[0].id]).toBe("score");
    expect(notes[0].fingering?.[0].finger).toBe(1);
    for (const n of notes.slice(1)) {
      expect(d.fingeringSource[n.id]).toBe("estimated");
      expect(n.fingering?.[0].finger).toBeGreaterThanOrEqual(1);
      expect(n.fingering?.[0].finger).toBeLessThanOrEqual(5);
    }
  });

  test("a left-hand drill sits on one staff, in treble clef when it lies high", () => {
    const p = makePassage({ left: "C6/4 D6/4" });
    const d = buildDrill(p, { ...spec, segments: [{ left: p.sonorities.left.map((s) => sonoritySlot(s)) }] }, makeContext());
    expect(d.score.parts[0].staves).toBe(1);
    expect(d.score.measures[0].clefs[0].sign).toBe("G");
  });

  test("span: a tenth is over the default comfortable span (FACTS.md §1: 10th = 212.3 mm), an octave is not", () => {
    const p = makePassage({ right: "C4/4" });
    const tenth = buildDrill(p, { ...spec, segments: [{ right: [{ duration: q(4), notes: [{ pitch: pitchFromName("C4") }, { pitch: pitchFromName("E5") }] }] }] }, makeContext());
    expect(tenth.maxSpan.right?.semitones).toBe(16);
    expect(tenth.maxSpan.right?.mm).toBeCloseTo(212.3, 1);
    expect(tenth.warnings.map((w) => w.code)).toContain("span");
    const octave = buildDrill(p, { ...spec, segments: [{ right: [{ duration: q(4), notes: [{ pitch: pitchFromName("C4") }, { pitch: pitchFromName("C5") }] }] }] }, makeContext());
    expect(octave.warnings.map((w) => w.code)).not.toContain("span");
  });

  test("notes outside A0–C8 (FACTS.md §1: MIDI 21–108) give a range warning", () => {
    const p = makePassage({ right: "C4/4" });
    const d = buildDrill(p, { ...spec, segments: [{ right: [note("D8", q(1))] }] }, makeContext());
    expect(d.warnings.map((w) => w.code)).toContain("range");
  });

  test("segments start on new bars and carry metronome marks; a pickup keeps its place", () => {
    const p = makePassage({ right: "G4/4 C5/1", pickup: q(1) });
    expect(leadOf(p).toFraction()).toBe("3");
    const slots = p.sonorities.right.map((s) => sonoritySlot(s));
    const d = buildDrill(p, { ...spec, segments: [{ right: slots, lead: leadOf(p), tempo: 60 }, { right: slots, lead: leadOf(p), tempo: 80 }] }, makeContext());
    expectFullBars(d);
    expect(d.score.measures.map((m) => m.tempo)).toEqual([60, undefined, 80, undefined]);
    expect(d.score.events.filter((e) => e.pitch?.midi === 67).map((e) => e.onset.toFraction())).toEqual(["3", "11"]);
  });

  test("tempo defaults: the score's mark as target, 60 % to start (common practice)", () => {
    expect(defaultTempo(makePassage({ right: "C4/4", tempo: 100 }))).toEqual({ start: 60, target: 100 });
    expect(defaultTempo(makePassage({ right: "C4/4" })).target).toBe(80);
    expect(restSlot(q(1, 2)).notes).toEqual([]);
  });
});

describe("fingering carried from the passage", () => {
  test("a drill that plays the passage as written is fingered as the passage's own estimate", () => {
    const p = makePassage({ right: "E4/8 F4/8 G4/8 A4/8 B4/8 C5/8 D5/8 E5/8" });
    const slots = p.sonorities.right.map((s) => sonoritySlot(s));
    const d = buildDrill(p, { ...spec, segments: [{ right: slots }, { right: slots }] }, makeContext());
    const own = estimateFingering(p.events, "right", { keyOf: () => p.key }).fingers; // the passage estimate knows its key
    const drillFingers = d.score.events.filter((e) => e.pitch).map((e) => e.fingering?.[0]?.finger);
    expect(drillFingers).toEqual([...own, ...own]);
  });
});

describe("fingering sources", () => {
  test("a fingering the drill prescribes is marked drill; the score's stays score; the rest estimated", () => {
    const p = makePassage({ right: "C4/8@1 D4/8 E4/8 F4/8 G4/2" });
    const prescribed = { pitch: pitchFromName("A4"), fingering: [{ finger: 4 }] };
    const slots = [...p.sonorities.right.map((s) => sonoritySlot(s)), { duration: q(1), notes: [prescribed] }];
    const d = buildDrill(p, { ...spec, segments: [{ right: slots }] }, makeContext());
    const notes = d.score.events.filter((e) => e.pitch);
    expect(notes.map((n) => d.fingeringSource[n.id])).toEqual(["score", "estimated", "estimated", "estimated", "estimated", "drill"]);
    expect(notes[5].fingering).toEqual([{ finger: 4 }]);
    expect(notes[5].fingeringSource).toBe("drill");
  });

  test("thumb-pairs and scale-rhythm fingerings are the drill's own, never the score's", () => {
    const p = makePassage({ right: "E4/4@3 G4/4 C5/4 G4/4" });
    for (const d of [
      ...generateThumbPairs(p, thumbPairsOptions.parse({}), makeContext()).drills,
      ...generateScaleRhythm(p, scaleRhythmOptions.parse({}), makeContext()).drills,
    ]) {
      const sources = d.score.events.filter((e) => e.pitch && e.tie !== "stop" && e.tie !== "continue").map((e) => d.fingeringSource[e.id]);
      expect(sources, `${d.family}/${d.variant}`).not.toContain("score");
      if (d.family === "thumb-pairs") expect(new Set(sources), d.variant).toEqual(new Set(["drill"]));
      else expect(sources, d.variant).toContain("drill");
    }
  });
});
