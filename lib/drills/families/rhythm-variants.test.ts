import { describe, expect, test } from "vitest";
import { makeContext } from "../build";
import { drillText, makePassage } from "../test-passages";
import { equalRuns, rhythmVariants, rhythmVariantsOptions } from "./rhythm-variants";

// Hand-written expectations. Durations in quarter notes: dotted eighth = 3/4, sixteenth = 1/4.
const passage = makePassage({ right: "C4/8 D4/8 E4/8 F4/8 G4/8 A4/8 B4/8 C5/8 D5/1" });
const run = (v: string) => rhythmVariants.generate(passage, rhythmVariantsOptions.parse({ variants: [v] }), makeContext()).drills;

describe("rhythm-variants", () => {
  test("options parse with defaults", () => {
    expect(rhythmVariantsOptions.parse({})).toEqual({ variants: ["long-short", "short-long", "regroup", "accent-3", "accent-4"], minRun: 4 });
    // The old option name still parses.
    expect(rhythmVariantsOptions.parse({ variants: ["triplets"] }).variants).toEqual(["regroup"]);
  });

  test("runs of equal values are found; the whole note is not part of them", () => {
    expect(equalRuns(passage.sonorities.right, 4).map((r) => r.length)).toEqual([8]);
  });

  test("long-short and short-long dotted pairs", () => {
    expect(drillText(run("long-short")[0].score.events).slice(0, 4)).toEqual(["C4:3/4", "D4:1/4", "E4:3/4", "F4:1/4"]);
    expect(drillText(run("short-long")[0].score.events).slice(0, 4)).toEqual(["C4:1/4", "D4:3/4", "E4:1/4", "F4:3/4"]);
    expect(drillText(run("short-long")[0].score.events).slice(8)).toEqual(["D5:4"]);
  });

  test("triplets: 3 eighths in the time of 2 (MusicXML time-modification 3:2), padded with triplet rests", () => {
    const d = run("regroup")[0];
    expect(d.variant).toBe("triplets");
    // Eight notes → three triplet groups (nine places): the last place is a triplet rest, then the bar is completed.
    expect(drillText(d.score.events)).toEqual([
      "C4:1/3", "D4:1/3", "E4:1/3", "F4:1/3", "G4:1/3", "A4:1/3", "B4:1/3", "C5:1/3", "r:1/3", "r:1",
    ]);
    const notes = d.score.events.filter((e) => e.written.tuplet);
    expect(notes).toHaveLength(9);
    for (const n of notes) expect(n.written).toEqual({ type: "eighth", dots: 0, tuplet: { actual: 3, normal: 2 } });
  });

  test("accents every 3 and every 4 notes of the run", () => {
    const three = drillText(run("accent-3")[0].score.events);
    expect(three.filter((t) => t.endsWith("!accent"))).toEqual(["C4:1/2!accent", "F4:1/2!accent", "B4:1/2!accent"]);
    const four = drillText(run("accent-4")[0].score.events);
    expect(four.filter((t) => t.endsWith("!accent"))).toEqual(["C4:1/2!accent", "G4:1/2!accent"]);
  });

  test("6/8 eighths move in threes: regrouped as 2:3 duplets and 4:3 quadruplets, never 3:2 triplets (common practice)", () => {
    const p = makePassage({ time: { beats: 6, beatType: 8 }, right: "C4/8 D4/8 E4/8 F4/8 G4/8 A4/8 B4/4." });
    const drills = rhythmVariants.generate(p, rhythmVariantsOptions.parse({ variants: ["regroup"] }), makeContext()).drills;
    expect(drills.map((d) => d.variant)).toEqual(["duplets", "quadruplets"]);
    // Duplets: two notes to the dotted-quarter beat, each 3/4 of a quarter (hand-computed: 3/2 ÷ 2).
    expect(drillText(drills[0].score.events).slice(0, 6)).toEqual(["C4:3/4", "D4:3/4", "E4:3/4", "F4:3/4", "G4:3/4", "A4:3/4"]);
    for (const e of drills[0].score.events.filter((x) => x.pitch)) expect(e.written.tuplet).toEqual({ actual: 2, normal: 3 });
    // Quadruplets: four to the beat (3/8 each), the sixth note followed by two rests to end the beat.
    expect(drillText(drills[1].score.events).slice(0, 8)).toEqual(["C4:3/8", "D4:3/8", "E4:3/8", "F4:3/8", "G4:3/8", "A4:3/8", "r:3/8", "r:3/8"]);
    for (const d of drills) for (const e of d.score.events) expect(e.written.tuplet?.actual === 3 && e.written.tuplet.normal === 2).toBe(false);
  });

  test("6/8 dotted rhythm stays inside each dotted-quarter beat (♪. 𝅘𝅥𝅯 ♪, common practice)", () => {
    const p = makePassage({ time: { beats: 6, beatType: 8 }, right: "C4/8 D4/8 E4/8 F4/8 G4/8 A4/8" });
    const [ls] = rhythmVariants.generate(p, rhythmVariantsOptions.parse({ variants: ["long-short"] }), makeContext()).drills;
    expect(drillText(ls.score.events)).toEqual(["C4:3/4", "D4:1/4", "E4:1/2", "F4:3/4", "G4:1/4", "A4:1/2"]);
  });

  test("a run that starts off the beat pairs from the next even place; chords keep their value", () => {
    const p = makePassage({ right: "C4/8 D4/8 E4/8 F4/8 G4/8 [A4,C5]/8 B4/8 C5/8" });
    const [ls] = rhythmVariants.generate(p, rhythmVariantsOptions.parse({ variants: ["long-short"], minRun: 4 }), makeContext()).drills;
    // Beats 1, 2 and 4 dotted; beat 3 holds a chord and is left as written.
    expect(drillText(ls.score.events)).toEqual(["C4:3/4", "D4:1/4", "E4:3/4", "F4:1/4", "G4:1/2", "A4+C5:1/2", "B4:3/4", "C5:1/4"]);
  });

  test("triplet runs are drillable: regrouped in plain eighths and sixteenths, accented; no dotted figure inside a tuplet", () => {
    const p = makePassage({ time: { beats: 2, beatType: 4 }, right: "C4/8t D4/8t E4/8t F4/8t G4/8t A4/8t" });
    const drills = rhythmVariants.generate(p, rhythmVariantsOptions.parse({}), makeContext()).drills;
    expect(drills.map((d) => d.variant)).toEqual(["duplets", "quadruplets", "accent-3", "accent-4"]);
    // Six eighths fill three beats; the second 2/4 bar is completed with a quarter rest.
    expect(drillText(drills[0].score.events)).toEqual(["C4:1/2", "D4:1/2", "E4:1/2", "F4:1/2", "G4:1/2", "A4:1/2", "r:1"]);
    expect(drills[0].score.events.every((e) => e.written.tuplet === null)).toBe(true);
  });

  test("no run of equal values: skipped with a reason", () => {
    const r = rhythmVariants.generate(makePassage({ right: "C4/4 D4/8 E4/8 F4/2" }), rhythmVariantsOptions.parse({}), makeContext());
    expect(r.drills).toHaveLength(0);
    expect(r.skipped).toMatch(/No run/);
  });
});
