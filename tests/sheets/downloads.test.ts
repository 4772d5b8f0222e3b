import { Midi } from "@tonejs/midi";
import { unzipSync } from "fflate";
import fs from "node:fs";
import path from "node:path";
import { describe, expect, test } from "vitest";
import { CONTENT_TYPES, drillFile, sheetZip } from "../../lib/knots/files";
import { GenerateRequest } from "../../lib/knots/generate-request";
import { generateForKnot } from "../../lib/knots/generate";
import { readScore, writeMusicXML } from "../../lib/score";
import type { Score } from "../../lib/score/types";

const piece = fs.readFileSync(path.resolve(__dirname, "../../fixtures/pieces/pebble-study.musicxml"), "utf8");
const out = generateForKnot({ musicxml: piece, part: "P1", hand: "right", fromBar: 1, toBar: 2 }, GenerateRequest.parse({ families: ["blocking"] }));
const drills = out.drills.map(({ drill }) => ({ title: drill.title, score: drill.score, musicxml: writeMusicXML(drill.score) }));

/** Pitched notes as "midi@onset/duration", sorted — what "the same notes" means here. */
function notes(score: Score): string[] {
  const first = score.measures[0].start;
  return score.events
    .filter((e) => e.pitch)
    .map((e) => `${e.pitch!.midi}@${e.onset.sub(first).toFraction()}/${e.duration.toFraction()}`)
    .sort();
}

/** Sounding notes: pitched, not grace, not the continuation of a tie (Standard MIDI File: one note-on per sounding note). */
function sounding(score: Score) {
  return score.events.filter((e) => e.pitch && !e.grace && e.tie !== "stop" && e.tie !== "continue");
}

describe("drill downloads", () => {
  test("content types are the MusicXML 4.0 recommended media types and audio/midi", () => {
    // MusicXML 4.0 container.xsd: compressed application/vnd.recordare.musicxml, uncompressed …+xml.
    expect(drillFile(drills[0].musicxml, drills[0].title, "musicxml").contentType).toBe("application/vnd.recordare.musicxml+xml");
    expect(drillFile(drills[0].musicxml, drills[0].title, "mxl").contentType).toBe("application/vnd.recordare.musicxml");
    // audio/midi: the registered type for Standard MIDI Files (from memory).
    expect(CONTENT_TYPES.midi).toBe("audio/midi");
  });

  test.each(drills.map((d) => [d.title, d] as const))("%s: MusicXML and .mxl read back with the same notes", (_t, d) => {
    for (const format of ["musicxml", "mxl"] as const) {
      const file = drillFile(d.musicxml, d.title, format);
      expect(file.filename.endsWith(format === "mxl" ? ".mxl" : ".musicxml")).toBe(true);
      expect(notes(readScore(file.bytes).score)).toEqual(notes(d.score));
    }
  });

  test.each(drills.map((d) => [d.title, d] as const))("%s: MIDI reads back in @tonejs/midi with every sounding note", (_t, d) => {
    const file = drillFile(d.musicxml, d.title, "midi");
    expect(file.filename.endsWith(".mid")).toBe(true);
    const midi = new Midi(file.bytes);
    const read = midi.tracks.flatMap((tr) => tr.notes.map((n) => n.midi)).sort((a, b) => a - b);
    // MIDI note numbers equal the model's (FACTS §2: middle C = 60, the model uses the same numbering).
    expect(read).toEqual(sounding(d.score).map((e) => e.pitch!.midi).sort((a, b) => a - b));
    expect(read.length).toBeGreaterThan(0);
  });

  test("a sheet zip holds each drill in the three formats, numbered in order", () => {
    const zip = sheetZip("Even thumbs", drills.map((d) => ({ title: d.title, musicxml: d.musicxml })));
    expect(zip.contentType).toBe("application/zip");
    expect(zip.filename).toBe("even-thumbs.zip");
    const files = unzipSync(zip.bytes);
    const names = Object.keys(files).sort();
    expect(names).toHaveLength(drills.length * 3);
    expect(names.filter((n) => n.startsWith("01-"))).toHaveLength(3);
    const first = names.find((n) => n.startsWith("01-") && n.endsWith(".musicxml"))!;
    expect(notes(readScore(files[first]).score)).toEqual(notes(drills[0].score));
  });
});
