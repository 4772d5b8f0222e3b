import { describe, expect, test } from "vitest";
import { DEFAULT_PROFILE } from "./hand";
import { handPositions, isChordShape, orderedFingers } from "./hand-position";
import { makePassage } from "./test-passages";

// Positions follow the fingering (common practice): the hand moves when a key changes finger, a finger
// takes a new key, the thumb passes under or a finger crosses over, or the span grows past the hand.
describe("hand positions", () => {
  test("a thumb passing under starts a new position", () => {
    const scale = makePassage({ right: "C4/8@1 D4/8@2 E4/8@3 F4/8@1 G4/8@2 A4/8@3 B4/8@4 C5/8@5" });
    const pos = handPositions(scale, "right", DEFAULT_PROFILE);
    expect(pos.map((p) => p.notes.length)).toEqual([3, 5]);
    expect(pos[1]!.fingers).toEqual([1, 2, 3, 4, 5]);
    expect(pos.every((p) => !p.chordal)).toBe(true); // runs of steps are not chord shapes
    expect(pos[0]!.duration.toFraction()).toBe("3/2"); // until the next position starts
  });

  test("a left-hand figure keeps one position while its fingers fall with pitch", () => {
    const alberti = makePassage({ left: "C3/8@5 G3/8@1 E3/8@3 G3/8@1 C3/8@5 G3/8@1 E3/8@3 G3/8@1" });
    const [pos] = handPositions(alberti, "left", DEFAULT_PROFILE);
    expect(pos!.notes.map((n) => n.pitch!.midi)).toEqual([48, 52, 55]);
    expect(pos!.fingers).toEqual([5, 3, 1]);
    expect(pos!.chordal).toBe(true);
  });

  test("a new key for a finger already in use moves the hand", () => {
    const p = makePassage({ right: "C4/4@1 G4/4@5 A4/4@5 C4/4@1" });
    expect(handPositions(p, "right", DEFAULT_PROFILE).map((x) => x.sonorities.length)).toEqual([2, 2]);
  });

  test("forced breaks split a position (blocking by beat)", () => {
    const p = makePassage({ right: "C4/8@1 E4/8@3 G4/8@5 E4/8@3" });
    expect(handPositions(p, "right", DEFAULT_PROFILE, undefined, new Set([1])).length).toBe(2);
  });

  test("ordered fingers repair a crossed or doubled chord, keeping fixed fingers", () => {
    expect(orderedFingers([2, 2, 5], "right")).toEqual([1, 2, 5]);
    expect(orderedFingers([1, 3], "left")).toEqual([4, 3]); // one finger changed, not two
    expect(orderedFingers([null, null], "right", [5, null])).toBeNull(); // 5 cannot sit below another finger
    expect(orderedFingers([1, 2, 3, 4, 5, 5], "right")).toBeNull();
  });

  test("chord shapes: no semitone clusters, no runs of steps", () => {
    expect(isChordShape([60, 64, 67])).toBe(true);
    expect(isChordShape([60, 62])).toBe(true);
    expect(isChordShape([60, 62, 64])).toBe(false);
    expect(isChordShape([64, 65])).toBe(false);
    expect(isChordShape([60])).toBe(false);
  });
});
