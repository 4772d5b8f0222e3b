/**
 * A song's voice part is not a hand: the difficulty map, the hardest bars and one-hand playback read
 * only the piano part (found by staves and name, lib/score/parts), never `parts[0]`. The song is a real
 * voice + piano score of the vendored corpus (fixtures/reference/scores/easy-01, OpenScore Lieder, CC0),
 * whose first part is the voice ("Singstimme", one staff) and second the piano ("Pianoforte", two
 * staves; MusicXML 4.0 <staves>: "2 staves for typical piano parts", FACTS.md).
 */
import fs from "node:fs";
import path from "node:path";
import { describe, expect, test } from "vitest";
import { difficultyMap, hardestBars } from "@/lib/drills/difficulty";
import { playbackEvents } from "@/lib/playback";
import { toPerformance } from "@/lib/score/performance";
import { pianoPart } from "@/lib/score/parts";
import { readScore } from "@/lib/score/read";
import type { Score } from "@/lib/score/types";

const file = path.resolve(__dirname, "../../fixtures/reference/scores/easy-01_schroter_der-eistanz.mxl");
const song = readScore(new Uint8Array(fs.readFileSync(file))).score;
const piano = pianoPart(song)!;
const voice = song.parts.find((p) => p.id !== piano.id)!;
/** The song with one part's notes taken out (its part entry stays, as an empty staff would). */
const without = (part: string): Score => ({ ...song, events: song.events.filter((e) => e.part !== part) });

describe("a voice + piano song from the corpus", () => {
  test("the voice comes first and sings; the piano is the second, two-staff part", () => {
    expect(song.parts[0]!.id).toBe(voice.id);
    expect(piano.staves).toBe(2);
    expect(song.events.filter((e) => e.part === voice.id && e.pitch).length).toBeGreaterThan(20);
  });

  test("difficultyMap and hardestBars count the piano's staves only: the voice's notes change nothing", () => {
    expect(difficultyMap(song)).toEqual(difficultyMap(without(voice.id)));
    expect(hardestBars(song, 5)).toEqual(hardestBars(without(voice.id), 5));
    // With the piano's notes gone, the voice alone gives no difficulty at all.
    const voiceOnly = difficultyMap(without(piano.id));
    expect([...voiceOnly.right, ...voiceOnly.left].every((v) => v === 0)).toBe(true);
    expect(hardestBars(without(piano.id), 5).every((h) => h.score === 0)).toBe(true);
  });

  test("playbackEvents with a hand plays that staff of the piano part, not the voice", () => {
    const notes = toPerformance(song, { clicks: false }).notes;
    for (const [hand, staff] of [["right", 1], ["left", 2]] as const) {
      const p = playbackEvents(song, { fromMeasure: 2, toMeasure: 6, hand });
      const expected = notes
        .filter((n) => n.part === piano.id && n.staff === staff && n.startQuarters >= p.startQ && n.startQuarters < p.endQ)
        .map((n) => [n.midi, n.startQuarters]);
      expect(expected.length).toBeGreaterThan(0);
      expect(p.events.map((e) => [e.midi, e.onsetQ])).toEqual(expected);
      expect(p.events.every((e) => e.staff === staff)).toBe(true);
    }
    // Without a hand the whole song plays, voice included.
    const all = playbackEvents(song, { fromMeasure: 2, toMeasure: 6 });
    const inRange = notes.filter((n) => n.startQuarters >= all.startQ && n.startQuarters < all.endQ);
    expect(all.events).toHaveLength(inRange.length);
    expect(inRange.some((n) => n.part === voice.id)).toBe(true);
  });
});
