import { describe, expect, test } from "vitest";
import { makePitch } from "../score/pitch";
import { writeMusicXML } from "../score/write";
import { makeContext } from "./build";
import { generateOctaveShift, octaveShiftOptions } from "./families/octave-shift";
import { ledgerLines, withOctaveLines } from "./octave-lines";
import { pitchName } from "./spell";
import { makePassage } from "./test-passages";

const treble = { staff: 1, sign: "G", line: 2 } as const;
const bass = { staff: 1, sign: "F", line: 4 } as const;

describe("ledgerLines", () => {
  // Common practice: the treble staff runs E4–F5, the bass staff G2–A3; A5 and C4 sit on one ledger line.
  test("treble and bass staves", () => {
    expect(ledgerLines(makePitch("A", 0, 5), treble, 0)).toBe(1);
    expect(ledgerLines(makePitch("E", 0, 6), treble, 0)).toBe(3);
    expect(ledgerLines(makePitch("G", 0, 6), treble, 0)).toBe(4);
    expect(ledgerLines(makePitch("C", 0, 4), treble, 0)).toBe(-1);
    expect(ledgerLines(makePitch("D", 0, 3), treble, 0)).toBe(-4);
    expect(ledgerLines(makePitch("D", 0, 3), bass, 0)).toBe(0);
    expect(ledgerLines(makePitch("E", 0, 1), bass, 0)).toBe(-4);
  });
  test("an 8va line (12) draws the note an octave lower", () => {
    expect(ledgerLines(makePitch("G", 0, 6), treble, 12)).toBe(0);
    expect(ledgerLines(makePitch("D", 0, 3), treble, -12)).toBe(0);
  });
});

describe("withOctaveLines", () => {
  const passage = makePassage({ right: "C5/8 E5/8 G5/8 E5/8 C5/2" });
  const up = generateOctaveShift(passage, octaveShiftOptions.parse({ octaves: 2 }), makeContext()).drills.find((d) => d.variant === "up")!;
  const lined = withOctaveLines(up);

  test("notes two octaves up (G7 …) go under a line; the home octave does not", () => {
    const shifted = lined.score.events.filter((e) => e.pitch && e.octaveShift);
    expect(shifted.length).toBeGreaterThan(0);
    for (const e of lined.score.events) {
      if (!e.pitch) continue;
      const clef = lined.score.measures[e.measure]!.clefs[0]!;
      expect(Math.abs(ledgerLines(e.pitch, clef, e.octaveShift ?? 0)), pitchName(e.pitch)).toBeLessThanOrEqual(3);
    }
    expect(lined.score.events.filter((e) => e.pitch && pitchName(e.pitch) === "C5").every((e) => !e.octaveShift)).toBe(true);
    // The pitch data stays the sounding pitch (MusicXML 4.0 <octave-shift> changes only the display).
    expect(lined.score.events.map((e) => e.pitch?.midi)).toEqual(up.score.events.map((e) => e.pitch?.midi));
  });

  test("the writer draws the line: <octave-shift type=\"down\"> before the high notes and a stop after", () => {
    const xml = writeMusicXML(lined.score);
    expect(xml).toMatch(/<octave-shift type="down" size="(8|15)"\/>/);
    expect(xml.match(/<octave-shift type="stop"/g)?.length).toBe(xml.match(/<octave-shift type="down"/g)?.length);
  });

  test("a drill within three ledger lines is returned as it is", () => {
    const plain = generateOctaveShift(passage, octaveShiftOptions.parse({ octaves: 1 }), makeContext()).drills[0]!;
    expect(withOctaveLines(plain)).toBe(plain);
  });
});
