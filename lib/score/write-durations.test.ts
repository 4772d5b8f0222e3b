import Fraction from "fraction.js";
import { describe, expect, test } from "vitest";
import { divisionsFor, noteValues, toDivisions, typeFor, typeLength } from "./write-durations";

const f = (s: string | number): Fraction => new Fraction(s);

describe("write-durations", () => {
  test("type lengths follow the note-value ladder: a dot adds half, two dots add three quarters (common practice)", () => {
    expect(typeLength("quarter", 0)!.toFraction()).toBe("1");
    expect(typeLength("half", 1)!.toFraction()).toBe("3");
    expect(typeLength("eighth", 2)!.toFraction()).toBe("7/8");
    expect(typeLength("whole", 0)!.toFraction()).toBe("4");
    expect(typeLength("16th", 0)!.toFraction()).toBe("1/4");
    expect(typeLength("nonsense", 0)).toBeNull();
  });

  test.each([
    ["1", "quarter", 0],
    ["3/2", "quarter", 1],
    ["3/4", "eighth", 1],
    ["6", "whole", 1],
    ["1/8", "32nd", 0],
    ["7/4", "quarter", 2],
    ["7/2", "half", 2],
  ])("typeFor(%s) = %s with %i dots", (len, type, dots) => {
    expect(typeFor(f(len))).toEqual({ type, dots });
  });

  test("no single value shows five sixteenths or a third", () => {
    expect(typeFor(f("5/4"))).toBeNull();
    expect(typeFor(f("1/3"))).toBeNull();
  });

  test("a triplet eighth lasts a third of a quarter and is written as an eighth (MusicXML 4.0 <time-modification>, FACTS §3)", () => {
    const [v] = noteValues(f("1/3"), { type: null, dots: 0, tuplet: { actual: 3, normal: 2 } });
    expect(v.type).toBe("eighth");
    expect(v.tuplet).toEqual({ actual: 3, normal: 2 });
  });

  test("a given type that no longer fits the duration is replaced", () => {
    const [v] = noteValues(f("1/2"), { type: "quarter", dots: 0, tuplet: null });
    expect(v.type).toBe("eighth");
  });

  test("five sixteenths split into a quarter and a sixteenth that add back up", () => {
    const vs = noteValues(f("5/4"), { type: null, dots: 0, tuplet: null });
    expect(vs.map((v) => v.type)).toEqual(["quarter", "16th"]);
    expect(vs.reduce((s, v) => s.add(v.duration), f(0)).toFraction()).toBe("5/4");
  });

  test("a tuplet ratio that does not fit is dropped when the plain value fits", () => {
    // a quarter under 5:4 would be written as 5/4 of a quarter, which no single value shows
    const [v] = noteValues(f(1), { type: null, dots: 0, tuplet: { actual: 5, normal: 4 } });
    expect(v).toMatchObject({ type: "quarter", dots: 0, tuplet: null });
  });

  test("divisions are the LCM of the denominators: thirds and quarters need 12", () => {
    expect(divisionsFor([f("1/3"), f("1/4"), f(2)])).toBe(12);
    expect(divisionsFor([f(1), f(4)])).toBe(1);
    expect(divisionsFor([f("1/5"), f("1/6")])).toBe(30);
  });

  test("with divisions = 2, an eighth is duration 1 (MusicXML 4.0 <divisions>, FACTS §3)", () => {
    expect(toDivisions(f("1/2"), 2)).toBe(1);
    // divisions = 6: a triplet eighth lasts 2 divisions, a triplet quarter 4 (FACTS §3, derived)
    expect(toDivisions(f("1/3"), 6)).toBe(2);
    expect(toDivisions(f("2/3"), 6)).toBe(4);
  });
});
