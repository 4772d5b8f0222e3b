// A song's piano part on the piece page: parts in engraving order, only piano candidates pickable, and a
// knot refused on the voice part. The corpus song (fixtures/reference/scores, SOURCES.md) has a voice
// part and a two-staff piano part ("Parts: Singstimme / Voice, Pianoforte" for the Brahms file).
import fs from "node:fs";
import path from "node:path";
import { describe, expect, test } from "vitest";
import { engravedParts, knotPart } from "../../app/(teacher)/pieces/[pieceId]/piece-data";
import { readScore } from "../../lib/score";

const song = path.resolve(__dirname, "../../fixtures/reference/scores/fingered-02_brahms_op58-4_o-komme-holde-sommernacht.mxl");

describe("parts of a song on the piece page", () => {
  const { score } = readScore(new Uint8Array(fs.readFileSync(song)));

  test("the voice is engraved first and is not a piano candidate; the piano's two staves follow", () => {
    const parts = engravedParts(score);
    expect(parts.map((p) => [p.staves, p.firstStaff, p.piano])).toEqual([[1, 0, false], [2, 1, true]]);
    expect(parts[1].name).toMatch(/piano/i);
  });

  test("a knot goes on the piano part; the voice part is refused", () => {
    const [voice, piano] = engravedParts(score);
    expect(knotPart(score, undefined)).toBe(piano.id);
    expect(knotPart(score, piano.id)).toBe(piano.id);
    expect(knotPart(score, voice.id)).toBeNull();
  });
});
