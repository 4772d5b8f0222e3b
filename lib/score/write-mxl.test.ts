import { unzipSync, strFromU8 } from "fflate";
import { describe, expect, test } from "vitest";
import { readScore } from "./read";
import { buildScore } from "./test-builders";
import { MXL_MIME_TYPE, writeMxl } from "./write-mxl";

const score = buildScore({ bars: 2, notes: [{ pitch: "E4", onset: 0, duration: 8 }] });

describe("writeMxl", () => {
  test("the first zip entry is `mimetype`, stored uncompressed", () => {
    // MusicXML 4.0 spec, "Compressed MusicXML files" (quoted from memory, the reference folder has
    // no copy of that page): the archive's first file is "mimetype", stored without compression,
    // holding "application/vnd.recordare.musicxml". Zip layout (PKWARE APPNOTE, from memory):
    // local file header signature 0x04034b50 at offset 0, method at offset 8, name length at 26,
    // extra length at 28, name at 30.
    const bytes = writeMxl(score);
    const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
    expect(view.getUint32(0, true)).toBe(0x04034b50);
    expect(view.getUint16(8, true)).toBe(0); // method 0 = stored
    const nameLength = view.getUint16(26, true);
    const extraLength = view.getUint16(28, true);
    expect(strFromU8(bytes.subarray(30, 30 + nameLength))).toBe("mimetype");
    const size = view.getUint32(18, true); // compressed size = stored size
    const content = strFromU8(bytes.subarray(30 + nameLength + extraLength, 30 + nameLength + extraLength + size));
    expect(content).toBe("application/vnd.recordare.musicxml");
    expect(MXL_MIME_TYPE).toBe(content);
  });

  test("META-INF/container.xml names the score as the root file", () => {
    const files = unzipSync(writeMxl(score));
    const container = strFromU8(files["META-INF/container.xml"]);
    const root = /<rootfile full-path="([^"]+)"/.exec(container)?.[1];
    expect(root).toBe("score.musicxml");
    expect(strFromU8(files[root!])).toContain('<score-partwise version="4.0">');
  });

  test("the reader opens the archive and finds the same notes", () => {
    const back = readScore(writeMxl(score)).score;
    const notes = back.events.filter((e) => e.pitch);
    expect(notes.map((e) => [e.pitch!.midi, e.onset.valueOf(), e.tie])).toEqual([
      [64, 0, "start"],
      [64, 4, "stop"],
    ]);
  });

  test("the same score gives the same bytes", () => {
    expect(writeMxl(score)).toEqual(writeMxl(score));
  });
});
