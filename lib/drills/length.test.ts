import Fraction from "fraction.js";
import { describe, expect, test } from "vitest";
import { makeContext } from "./build";
import { barCap, capDrill, countOf, firstWithin, shownLabel } from "./length";
import { beatUnit, dottedFactors, inBeats, isCompound, markText, runFeel, toQuarters } from "./meter";
import { makePassage } from "./test-passages";
import { tempoLadder, tempoLadderOptions } from "./families/tempo-ladder";

describe("length", () => {
  test("the cap is 8 bars or twice the passage, whichever is larger (DRILL-RUBRIC 6, common practice)", () => {
    const two = makePassage({ right: "C4/1 D4/1" });
    const six = makePassage({ right: "C4/1 D4/1 E4/1 F4/1 G4/1 A4/1" });
    expect(barCap(two)).toBe(8);
    expect(barCap(six)).toBe(12);
    expect(barCap(two, makeContext({ maxBars: 3 }))).toBe(3);
  });

  test("counts agree in grammar and shown counts read 'n of N shown' (DRILL-RUBRIC 7)", () => {
    expect(countOf(1, "step")).toBe("1 step");
    expect(countOf(2, "step")).toBe("2 steps");
    expect(countOf(0, "repetition")).toBe("0 repetitions");
    expect(shownLabel(3, 12)).toBe("3 of 12 shown");
  });

  test("capDrill keeps the first bars, closes ties into the cut and says how much is shown", () => {
    const p = makePassage({ right: "C4/1 D4/1 E4/1 F4/1", tempo: 100 });
    const d = tempoLadder.generate(p, tempoLadderOptions.parse({ startPercent: 80, stepPercent: 10 }), makeContext({ maxBars: 100 })).drills[0];
    expect(d.score.measures).toHaveLength(12);
    const cut = capDrill(d, 5);
    expect(cut.score.measures).toHaveLength(5);
    expect(cut.score.events.every((e) => e.measure < 5)).toBe(true);
    expect(cut.title).toMatch(/\(first 5 of 12 bars shown\)$/);
    expect(Object.keys(cut.fingeringSource).every((id) => cut.score.events.some((e) => e.id === id))).toBe(true);
    expect(capDrill(d, 12)).toBe(d);
    let built = 0;
    const pick = firstWithin(8, [() => (built++, d), () => (built++, cut)]);
    expect([pick, built]).toEqual([cut, 2]);
  });
});

describe("meter", () => {
  test("compound meters beat in dotted values; marks in that beat (common practice; MusicXML beat-unit names)", () => {
    expect(isCompound({ beats: 6, beatType: 8 })).toBe(true);
    expect(isCompound({ beats: 3, beatType: 8 })).toBe(false);
    expect(beatUnit({ beats: 6, beatType: 8 })).toMatchObject({ type: "quarter", dots: 1, symbol: "♩." });
    expect(beatUnit({ beats: 12, beatType: 16 })).toMatchObject({ type: "eighth", dots: 1 });
    expect(beatUnit({ beats: 2, beatType: 2 })).toMatchObject({ type: "half", dots: 0 });
    // Hand-computed: quarter 90 = dotted quarter 60 (90 ÷ 1.5).
    expect(inBeats(90, { beats: 6, beatType: 8 })).toBe(60);
    expect(toQuarters(60, { beats: 6, beatType: 8 })).toBe(90);
    expect(markText(90, { beats: 9, beatType: 8 })).toBe("♩. = 60");
  });

  test("runs in threes, and dotted figures that stay inside the beat", () => {
    expect(runFeel(new Fraction(1, 2), { beats: 6, beatType: 8 })).toEqual({ perBeat: 3, threes: true });
    expect(runFeel(new Fraction(1, 3), { beats: 2, beatType: 4 })).toEqual({ perBeat: 3, threes: true });
    expect(runFeel(new Fraction(1, 4), { beats: 4, beatType: 4 })).toEqual({ perBeat: 4, threes: false });
    expect(runFeel(new Fraction(1), { beats: 6, beatType: 8 })).toEqual({ perBeat: null, threes: false });
    expect(dottedFactors(3, "long-short")!.map(String)).toEqual(["1.5", "0.5", "1"]);
    expect(dottedFactors(4, "short-long")!.map(String)).toEqual(["0.5", "1.5", "0.5", "1.5"]);
    expect(dottedFactors(5, "long-short")).toBeNull();
  });
});
