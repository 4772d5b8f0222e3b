import { describe, expect, test } from "vitest";
import { readScore } from "./read";
import { barIndex, barNumbers, beatLength, selectPassage } from "./passage";
import { ScoreError } from "./errors";

const N = (step: string, octave: number, duration: number, staff: number, extra = "") =>
  `<note>${extra}<pitch><step>${step}</step><octave>${octave}</octave></pitch><duration>${duration}</duration><staff>${staff}</staff></note>`;
const piano = (measures: string[]) => `<?xml version="1.0"?><score-partwise version="4.0">
<part-list><score-part id="P1"><part-name>Piano</part-name></score-part></part-list><part id="P1">${measures
  .map((m, i) => `<measure number="${i}"${i === 0 ? ' implicit="yes"' : ""}>${m}</measure>`).join("")}</part></score-partwise>`;
const attrs = "<attributes><divisions>2</divisions><time><beats>4</beats><beat-type>4</beat-type></time><staves>2</staves></attributes>";
// Left hand: an accompaniment figure C3-G3-E3-G3 in eighths, twice per bar; right hand: a chord then a melody.
const figure = ["C", "G", "E", "G", "C", "G", "E", "G"].map((s) => N(s, 3, 1, 2)).join("");
const score = readScore(piano([
  attrs + N("G", 4, 2, 1),
  N("E", 5, 4, 1) + N("C", 5, 4, 1, "<chord/>") + N("G", 4, 4, 1, "<chord/>") + N("F", 5, 2, 1) + N("D", 5, 2, 1) +
    "<backup><duration>8</duration></backup>" + figure,
  N("C", 5, 8, 1) + "<backup><duration>8</duration></backup>" + figure,
])).score;

describe("selectPassage", () => {
  test("sonorities per hand: chord notes grouped by onset, sorted low to high", () => {
    const p = selectPassage(score, { hand: "both", from: 1, to: 1 });
    expect(p.sonorities.right.map((s) => s.notes.map((n) => n.pitch!.midi))).toEqual([[67, 72, 76], [77], [74]]);
    expect(p.sonorities.left).toHaveLength(8);
    expect(p.staffOf).toEqual({ right: 1, left: 2 });
  });

  test("beat groups follow the quarter beat in 4/4; the repeated figure is found", () => {
    const p = selectPassage(score, { hand: "left", from: 1, to: 2 });
    const beats = p.groups.left.filter((g) => g.kind === "beat");
    expect(beats).toHaveLength(8);
    expect(beats.every((g) => g.sonorities.length === 2)).toBe(true);
    const figures = p.groups.left.filter((g) => g.kind === "figure");
    expect(figures.map((g) => g.sonorities.length)).toEqual([4, 4, 4, 4]);
    expect(figures[1].onset.valueOf()).toBe(3); // bar 1 starts at 1 (after the one-beat pickup), + 2 quarters
    expect(p.sonorities.right).toEqual([]);
  });

  test("compound meters group by the dotted beat (common practice)", () => {
    expect(beatLength({ beats: 6, beatType: 8 }).toFraction()).toBe("3/2");
    expect(beatLength({ beats: 12, beatType: 8 }).toFraction()).toBe("3/2");
    expect(beatLength({ beats: 3, beatType: 4 }).toFraction()).toBe("1");
    expect(beatLength({ beats: 2, beatType: 2 }).toFraction()).toBe("2");
  });

  test("a range outside the score is a ScoreError", () => {
    expect(() => selectPassage(score, { hand: "right", from: 2, to: 5 })).toThrow(ScoreError);
    expect(() => selectPassage(score, { hand: "right", from: 2, to: 1 })).toThrow(ScoreError);
  });
});

describe("bar numbers", () => {
  test("printed numbers map to indexes, pickup included", () => {
    expect(barNumbers(score)).toEqual(["0", "1", "2"]);
    expect(barIndex(score, 0)).toBe(0);
    expect(barIndex(score, "2")).toBe(2);
    expect(barIndex(score, "7")).toBeUndefined();
  });
});
