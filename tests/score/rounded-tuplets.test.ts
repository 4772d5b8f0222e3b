/**
 * Rounded tuplet durations (issue #16): fixtures/musicxml/test_rounded_tuplets.musicxml has
 * <divisions>1024</divisions> with triplet, 5:4 and 13:8 groups whose <duration>s are rounded.
 * Expected values follow the MusicXML 4.0 documentation of `divisions` ("they must be chosen to take
 * tuplets into account") and `time-modification` (actual-notes of the written type in the time of
 * normal-notes): a triplet eighth lasts 1/3 quarter, a 5:4 sixteenth 1/5, a 13:8 sixteenth 2/13, a
 * 3:2 sixteenth 1/6 and a 3:2 quarter 2/3.
 */
import fs from "node:fs";
import path from "node:path";
import { describe, expect, test } from "vitest";
import { readScore } from "../../lib/score/read";
import { writeMusicXML } from "../../lib/score/write";
import { hasXmllint, validateMusicXml } from "../support/xmllint";

const xml = fs.readFileSync(path.resolve(__dirname, "../../fixtures/musicxml/test_rounded_tuplets.musicxml"), "utf8");

const voice1 = (events: ReturnType<typeof readScore>["score"]["events"], measure: number) =>
  events.filter((e) => e.measure === measure && e.voice === "1");

describe("rounded tuplet durations", () => {
  const { score, warnings } = readScore(xml);

  test("bar 1 reads to exact thirds, fifths and thirteenths", () => {
    const bar = voice1(score.events, 0);
    // time-modification 3:2 on eighths, 5:4 and 13:8 on sixteenths (MusicXML 4.0 time-modification).
    expect(bar.slice(0, 3).map((e) => e.duration.toFraction())).toEqual(["1/3", "1/3", "1/3"]);
    expect(bar.slice(3, 8).map((e) => e.duration.toFraction())).toEqual(Array(5).fill("1/5"));
    expect(bar.slice(8).map((e) => e.duration.toFraction())).toEqual(Array(13).fill("2/13"));
    expect(bar.map((e) => e.onset.toFraction())).toEqual([
      "0", "1/3", "2/3",
      "1", "6/5", "7/5", "8/5", "9/5",
      ...Array.from({ length: 13 }, (_, k) => (k === 0 ? "2" : `${26 + 2 * k}/13`)),
    ]);
    expect(score.measures[0].length.toFraction()).toBe("4");
  });

  test("a rounded <backup> lands on the bar start; the second voice starts on the beat", () => {
    expect(score.events.filter((e) => e.voice === "2").map((e) => [e.measure, e.onset.toFraction(), e.duration.toFraction()]))
      .toEqual([[0, "0", "4"], [1, "4", "4"]]);
    // Bar 2's triplet sixteenths are rounded one by one (171 × 3 = 513), yet the bar still ends on 4/4.
    expect(score.measures[1].length.toFraction()).toBe("4");
    expect(warnings.filter((w) => w.code === "backup-before-bar" || w.code === "duration-mismatch")).toEqual([]);
  });

  test("bar 2: an eighth tied to a triplet sixteenth, a quarter triplet with a rest, a quarter", () => {
    const bar = voice1(score.events, 1);
    expect(bar.map((e) => [e.onset.sub(4).toFraction(), e.duration.toFraction(), e.tie])).toEqual([
      ["0", "1/2", "start"], ["1/2", "1/6", "stop"], ["2/3", "1/6", "none"], ["5/6", "1/6", "none"],
      ["1", "2/3", "none"], ["5/3", "2/3", "none"], ["7/3", "2/3", "none"], ["3", "1", "none"],
    ]);
    expect(bar[5].pitch).toBeNull();
  });

  test("a duration far from its type is kept, with a warning", () => {
    const off = xml.replace("<duration>512</duration>", "<duration>600</duration>");
    const read = readScore(off);
    expect(voice1(read.score.events, 1)[0].duration.toFraction()).toBe("75/128");
    expect(read.warnings.some((w) => w.code === "duration-mismatch" && w.measure === 1)).toBe(true);
  });

  test("writes back without splinters: divisions = LCM of 3, 5, 13, 6; every note typed; tuplets bracketed", () => {
    const out = writeMusicXML(score);
    // MusicXML 4.0 divisions: chosen so every tuplet value is a whole number of divisions: lcm(3, 5, 13, 6) = 390.
    expect(out).toContain("<divisions>390</divisions>");
    const notes = out.match(/<note\b[\s\S]*?<\/note>/g)!;
    expect(notes).toHaveLength(31);
    for (const n of notes) expect(n).toMatch(/<type>(eighth|16th|quarter|whole)<\/type>/);
    expect(out.match(/<tuplet type="start"/g)).toHaveLength(5);
    expect(out.match(/<tuplet type="stop"/g)).toHaveLength(5);
    const again = readScore(out).score;
    const key = (s: typeof score) => s.events.map((e) => [e.measure, e.voice, e.pitch?.midi ?? null, e.onset.toFraction(), e.duration.toFraction(), e.written.type, JSON.stringify(e.written.tuplet), e.tie].join(" "));
    expect(key(again)).toEqual(key(score));
    if (hasXmllint()) expect(validateMusicXml(out).errors).toEqual([]);
  });
});
