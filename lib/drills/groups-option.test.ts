import { describe, expect, test } from "vitest";
import { makeContext } from "./build";
import { barProblems } from "./families/shared-2-layout";
import { generateOctaveShift, octaveShiftOptions } from "./families/octave-shift";
import { applyLightEndings, lightEndingsOption, withEndings, withLightEndings } from "./groups-option";
import { generateVoiceIsolation, voiceIsolationOptions } from "./families/voice-isolation";
import { makePassage } from "./test-passages";

const ctx = makeContext();

describe("light endings", () => {
  test("a run of eighths ending on a half note ends on an eighth, staccato, then rests", () => {
    const p = makePassage({ right: "[C4,E4]/8 [D4,F4]/8 [E4,G4]/8 [F4,A4]/8 [G4,B4]/2" });
    const d = generateVoiceIsolation(p, voiceIsolationOptions.parse({ otherHand: "without" }), ctx).drills[0];
    const light = applyLightEndings(d);
    const seq = light.score.events.map((e) => `${e.pitch ? e.pitch.step + e.pitch.octave : "r"}:${e.duration.toFraction()}`);
    // 4 eighths, then B4 as an eighth, then 3/2 quarters of rest (a dotted quarter): 4/4 exact.
    expect(seq).toEqual(["E4:1/2", "F4:1/2", "G4:1/2", "A4:1/2", "B4:1/2", "r:3/2"]);
    expect(light.score.events[4].marks).toContain("staccato");
    expect(barProblems(light.score)).toEqual([]);
  });

  test("even runs are unchanged; the option is off by default", () => {
    const d = generateOctaveShift(makePassage({ right: "C4/8 E4/8" }), octaveShiftOptions.parse({}), ctx).drills;
    expect(withLightEndings(d, lightEndingsOption.parse({}))).toEqual(d);
    expect(applyLightEndings(d[0]).score.events.map((e) => e.duration.toFraction())).toEqual(d[0].score.events.map((e) => e.duration.toFraction()));
  });
});

// Rubric "endings (option)": a short, light last note, and the long ending as its contrast (common practice).
describe("short versus long endings", () => {
  test("short-and-long writes the short ending first, then the drill as written", () => {
    const p = makePassage({ right: "[C4,E4]/8 [D4,F4]/8 [E4,G4]/8 [F4,A4]/8 [G4,B4]/2" });
    const drills = generateVoiceIsolation(p, voiceIsolationOptions.parse({ otherHand: "without" }), ctx).drills.slice(0, 1);
    const [short, long] = withEndings(drills, "short-and-long");
    expect(short.variant).toBe("top-short-ending");
    expect(short.score.events.find((e) => e.pitch?.midi === 71)!.duration.toFraction()).toBe("1/2");
    expect(long.variant).toBe("top");
    expect(long.score.events.find((e) => e.pitch?.midi === 71)!.duration.toFraction()).toBe("2");
    expect(barProblems(short.score)).toEqual([]);
    expect(withEndings(drills, "written")).toEqual(drills);
  });

  test("a drill with no long ending is written once", () => {
    const d = generateOctaveShift(makePassage({ right: "C4/8 E4/8" }), octaveShiftOptions.parse({}), ctx).drills;
    expect(withEndings(d, "short-and-long")).toHaveLength(d.length);
  });
});
