/**
 * MIDI files read back with @tonejs/midi, a reader that is not ours.
 */
import fs from "node:fs";
import path from "node:path";
import { Midi } from "@tonejs/midi";
import Fraction from "fraction.js";
import { describe, expect, test } from "vitest";
import { microsecondsPerQuarter, TICKS_PER_QUARTER, writeMidi } from "../../lib/score/midi";
import { readScore } from "../../lib/score/read";
import { buildScore } from "../../lib/score/test-builders";
import { mergeTies } from "../../lib/score/ties";
import type { Score } from "../../lib/score/types";
import { referenceDir } from "../support/xmllint";

/** Sounding notes of the model: ties merged, rests left out, grace notes kept. */
const soundingNotes = (score: Score) => mergeTies(score.events).filter((e) => e.pitch);

const drill = buildScore({
  title: "Left-hand leap drill",
  bars: 3,
  time: [{ beats: 4, beatType: 4 }, { beats: 3, beatType: 4 }, { beats: 3, beatType: 4 }],
  notes: [
    { pitch: "C4", onset: 0, duration: 1, extra: { fingering: [{ finger: 1 }] } },
    { pitch: "E4", onset: 1, duration: 1 },
    { pitch: "G4", onset: 2, duration: 1 },
    { pitch: "C5", onset: 3, duration: 2, extra: { tie: "start" } },
    { pitch: "C5", onset: 5, duration: 2, extra: { tie: "stop" } },
    { pitch: "D5", onset: 7, duration: 0, extra: { grace: true } },
    { pitch: "C5", onset: 7, duration: 3 },
    { pitch: "C3", onset: 0, duration: 4, staff: 2 },
    { pitch: "G3", onset: 0, duration: 4, staff: 2 },
    { pitch: "A0", onset: 4, duration: 3, staff: 2 },
    { pitch: "C8", onset: 7, duration: 3, staff: 2 },
  ],
});

describe("writeMidi read back with @tonejs/midi", () => {
  const bytes = writeMidi(drill, { bpm: 90 });
  const midi = new Midi(bytes);

  test("format 1 with 480 ticks per quarter, a conductor track and one track per hand", () => {
    // Header chunk layout (Standard MIDI File spec, from memory): "MThd", length 6, format,
    // number of tracks, division — each a big-endian 16-bit word.
    const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
    expect(String.fromCharCode(...bytes.subarray(0, 4))).toBe("MThd");
    expect(view.getUint16(8)).toBe(1);
    expect(view.getUint16(10)).toBe(3);
    expect(view.getUint16(12)).toBe(480);
    expect(midi.header.ppq).toBe(TICKS_PER_QUARTER);
    // @tonejs/midi takes the conductor track's name as the file's name and lists the other tracks
    expect(midi.header.name).toBe("Left-hand leap drill");
    expect(midi.tracks.map((t) => t.name)).toEqual(["Right hand", "Left hand"]);
  });

  test("tempo: µs per quarter = 60,000,000 / bpm (Standard MIDI File Set Tempo, from memory)", () => {
    expect(microsecondsPerQuarter(90)).toBe(666_667);
    expect(midi.header.tempos).toHaveLength(1);
    // @tonejs/midi reports bpm = 60,000,000 / µs per quarter
    expect(60_000_000 / midi.header.tempos[0].bpm).toBeCloseTo(666_667, 0);
  });

  test("a time-signature event at every change", () => {
    expect(midi.header.timeSignatures.map((t) => [t.ticks, ...t.timeSignature])).toEqual([
      [0, 4, 4],
      [4 * 480, 3, 4],
    ]);
  });

  test("note numbers: middle C = 60, A0 = 21, C8 = 108 (FACTS §1–2)", () => {
    const right = midi.tracks[0].notes.map((n) => n.midi);
    const left = midi.tracks[1].notes.map((n) => n.midi).sort((a, b) => a - b);
    expect(right[0]).toBe(60);
    expect(left).toEqual([21, 48, 55, 108]);
  });

  test("note count = the model's sounding notes (tied notes merged, grace notes kept)", () => {
    const all = midi.tracks.flatMap((t) => t.notes);
    expect(all).toHaveLength(soundingNotes(drill).length);
    const tied = midi.tracks[0].notes.filter((n) => n.midi === 72 && n.ticks === 3 * 480);
    expect(tied).toHaveLength(1);
    expect(tied[0].durationTicks).toBe(4 * 480);
  });

  test("onsets in ticks = quarters × 480, and seconds = quarters × 60 / bpm", () => {
    const e4 = midi.tracks[0].notes.find((n) => n.midi === 64)!;
    expect(e4.ticks).toBe(480);
    expect(e4.time).toBeCloseTo(60 / 90, 4);
  });

  test("metronome marks become tempo events at their bars", () => {
    const score = buildScore({
      bars: 2,
      notes: [{ pitch: "C4", onset: 0, duration: 8 }],
      barExtras: { 0: { tempo: 60 }, 1: { tempo: 150 } },
    });
    const m = new Midi(writeMidi(score));
    expect(m.header.tempos.map((t) => [t.ticks, Math.round(t.bpm)])).toEqual([
      [0, 60],
      [4 * 480, 150],
    ]);
  });
});

describe("writeMidi on reference files", () => {
  const corpus = path.join(referenceDir(), "musicxml");
  const files = [
    "lilypond-testsuite/21d-Chords-SchubertStabatMater.xml",
    "lilypond-testsuite/23a-Tuplets.xml",
    "lilypond-testsuite/33b-Spanners-Tie.xml",
    "lilypond-testsuite/43e-Multistaff-ClefDynamics.xml",
    "w3c-musicxml-4.0/tutorial-apres-un-reve.musicxml",
  ];
  test.each(files)("%s: same notes, ticks and hands as the model", (file) => {
    const score = readScore(new Uint8Array(fs.readFileSync(path.join(corpus, file)))).score;
    const m = new Midi(writeMidi(score, { bpm: 100 }));
    const fromMidi = m.tracks.flatMap((t) => t.notes.map((n) => `${n.midi} ${n.ticks}`)).sort();
    const model = soundingNotes(score)
      .filter((e) => !e.grace)
      .map((e) => `${e.pitch!.midi} ${Math.round(e.onset.mul(new Fraction(480)).valueOf())}`);
    const graces = soundingNotes(score).filter((e) => e.grace).length;
    expect(fromMidi).toHaveLength(model.length + graces);
    for (const key of model) expect(fromMidi).toContain(key);
  });
});
