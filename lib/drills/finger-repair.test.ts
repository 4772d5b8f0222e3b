import Fraction from "fraction.js";
import { describe, expect, test } from "vitest";
import type { NoteEvent } from "../score/types";
import { repairWithReport } from "./finger-repair";
import { buildNotes } from "./note-builder";

/** Mark given fingers as estimates (a repair may change them). */
const estimated = (events: NoteEvent[], fingers: (number | null)[]) =>
  events.map((e, i) => (fingers[i] == null ? e : { ...e, fingering: [{ finger: fingers[i]! }], fingeringSource: "estimated" as const }));
const fingers = (events: readonly NoteEvent[]) => events.map((e) => e.fingering?.[0]?.finger ?? null);

// Rubric "Fingered so it can be played" (DRILL-RUBRIC.md; common practice).
describe("fingering repair", () => {
  test("crossed chord fingers are put in order with the pitch (right hand rising, left falling)", () => {
    const right = estimated(buildNotes(["C4+E4+G4"]), [3, 1, 5]);
    expect(fingers(repairWithReport(right, () => "right").events)).toEqual([3, 4, 5]); // the fewest changes: one finger
    const left = estimated(buildNotes(["C3+G3"]), [1, 5]);
    expect(fingers(repairWithReport(left, () => "left").events)).toEqual([2, 1]); // falling with pitch, one change
  });

  test("the same finger on two nearby keys in a row is changed; a printed finger stays", () => {
    const line = estimated(buildNotes(["C4", "D4/2", "E4"]), [2, null, 3]);
    const out = repairWithReport(line, () => "right").events;
    expect(fingers(out)[1]).toBe(2); // printed, kept
    expect(fingers(out)[0]).not.toBe(2); // the estimate before it moves off the repeated finger
  });

  test("a moving note never takes the finger of a held note, and the left thumb stays above it", () => {
    // Left hand: C3 held for the bar (finger 5), G3 then E3 struck over it.
    const held = buildNotes(["C3"], { step: new Fraction(4), staff: 2 });
    const moving = buildNotes(["G3", "E3"], { step: new Fraction(2), staff: 2, id: "m" });
    const events = estimated([...held, ...moving], [5, 5, 1]);
    const out = repairWithReport(events, () => "left");
    const [c3, g3, e3] = fingers(out.events);
    expect(c3).toBe(5); // the held note keeps its finger
    expect(g3).not.toBe(5);
    expect(g3! < c3! && e3! < c3!).toBe(true); // left hand: higher keys take lower finger numbers
    expect(out.unsettled).toBe(0);
  });

  test("printed fingers that leave no ordered choice are kept and reported", () => {
    const printed = buildNotes(["C4/5+E4/1"]);
    const out = repairWithReport(printed, () => "right");
    expect(fingers(out.events)).toEqual([5, 1]);
    expect(out.unsettled).toBe(1);
  });
});
