import fc from "fast-check";
import { describe, expect, test } from "vitest";
import { makeContext } from "../build";
import { makePassage } from "../test-passages";
import type { Drill } from "../types";
import { barProblems } from "./shared-2-layout";
import { generateVoiceIsolation, voiceIsolationOptions } from "./voice-isolation";

const ctx = makeContext();
const line = (d: Drill, staff: number) =>
  d.score.events.filter((e) => e.staff === staff && !e.chord).map((e) => `${e.pitch ? `${e.pitch.step}${e.pitch.octave}` : "r"}:${e.duration.toFraction()}`);

// Melody on top of held thirds in the right hand; a bass in the left.
const p = makePassage({ right: "[C4,E4,G4]/2@1,3,5 [D4,F4]/4 [E4,G4,C5]/4", left: "C3/1" });

describe("voice-isolation", () => {
  test("top line alone: G4 half, F4 quarter, C5 quarter", () => {
    const o = voiceIsolationOptions.parse({ otherHand: "without" });
    const r = generateVoiceIsolation({ ...p, hand: "right" }, o, ctx);
    const top = r.drills.find((d) => d.variant === "top")!;
    expect(line(top, 1)).toEqual(["G4:2", "F4:1", "C5:1"]);
    expect(top.score.events[0].fingering?.[0].finger).toBe(5);
    const low = r.drills.find((d) => d.variant === "lower")!;
    expect(line(low, 1)).toEqual(["C4:2", "D4:1", "E4:1"]);
    expect(low.score.events[0].fingering?.[0].finger).toBe(1);
  });

  test("with the other hand: the left hand's C3 whole note as written on staff 2", () => {
    const o = voiceIsolationOptions.parse({ otherHand: "with" });
    const d = generateVoiceIsolation({ ...p, hand: "right" }, o, ctx).drills.find((x) => x.variant === "top-with-other-hand")!;
    expect(line(d, 1)).toEqual(["G4:2", "F4:1", "C5:1"]);
    expect(line(d, 2)).toEqual(["C3:4"]);
  });

  test("two voices on one staff are separated by voice", () => {
    const base = makePassage({ right: "E5/4 D5/4 C5/2" });
    const lower = makePassage({ right: "C4/1" }).events.map((e) => ({ ...e, id: "v2", voice: "2" }));
    const two = { ...base, events: [...base.events, ...lower] };
    const r = generateVoiceIsolation(two, voiceIsolationOptions.parse({}), ctx);
    expect(line(r.drills.find((d) => d.variant === "top")!, 1)).toEqual(["E5:1", "D5:1", "C5:2"]);
    expect(line(r.drills.find((d) => d.variant === "lower")!, 1)).toEqual(["C4:4"]);
  });

  test("skips a single line", () => {
    expect(generateVoiceIsolation(makePassage({ right: "C4/4 D4/4" }), voiceIsolationOptions.parse({}), ctx).skipped).toBeTruthy();
  });

  test("property: random chords give exact bars; the lines are the top and bottom notes", () => {
    fc.assert(
      fc.property(
        fc.array(fc.tuple(fc.integer({ min: 0, max: 6 }), fc.integer({ min: 1, max: 3 }), fc.constantFrom("4", "8", "8t", "4.")), { minLength: 1, maxLength: 8 }),
        (cells) => {
          const L = ["C", "D", "E", "F", "G", "A", "B"];
          const text = cells.map(([s, w, v]) => `[${L[s]}4,${L[(s + 2 * w) % 7]}${s + 2 * w >= 7 ? 5 : 4}]/${v}`).join(" ");
          const pass = makePassage({ right: text });
          const r = generateVoiceIsolation(pass, voiceIsolationOptions.parse({}), ctx);
          for (const d of r.drills) expect(barProblems(d.score)).toEqual([]);
          const top = r.drills.find((d) => d.variant === "top")!;
          const sounding = top.score.events.filter((e) => e.pitch && e.tie !== "stop" && e.tie !== "continue").map((e) => e.pitch!.midi);
          expect(sounding).toEqual(pass.sonorities.right.map((s) => s.notes[s.notes.length - 1].pitch!.midi));
        },
      ),
      { numRuns: 40 },
    );
  });

  // Rubric (voice-isolation; common practice): every line of a multi-voice hand, then two lines together.
  test("chords of three keys: the inner line alone, then top and lower together, dynamics never stacked", () => {
    const p = makePassage({ right: "[C4,E4,G4]/2 [D4,F4,A4]/2" });
    const r = generateVoiceIsolation(p, voiceIsolationOptions.parse({ otherHand: "without" }), makeContext());
    expect(r.drills.map((d) => d.variant)).toEqual(["top", "lower", "inner", "top-and-lower"]);
    expect(line(r.drills.find((d) => d.variant === "inner")!, 1)).toEqual(["E4:2", "F4:2"]);
    const both = r.drills.find((d) => d.variant === "top-and-lower")!;
    // Both lines start together, so only the top line's "mf" is written there (rubric: never two dynamics on one note).
    expect(both.score.events.filter((e) => e.dynamic).map((e) => `${e.voice}:${e.dynamic}`)).toEqual(["1:mf"]);
  });
});
