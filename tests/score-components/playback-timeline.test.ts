import { readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, test } from "vitest";
import {
  barStartAtOrBefore,
  buildTimeline,
  describePosition,
  normaliseVelocity,
  scoreTimeAtTick,
  type PlaybackEvent,
} from "@/components/score/playback-timeline";
import { readScore } from "@/lib/score/read";
import { verovioToolkit } from "../support/verovio";

/** Tone's transport counts 192 ticks per quarter note by default (from memory; the player reads transport.PPQ). */
const PPQ = 192;
const ev = (onsetQ: number, durationQ: number, midi = 60, velocity = 0.8): PlaybackEvent => ({ midi, onsetQ, durationQ, velocity });

describe("playback-timeline", () => {
  test("note times in seconds are quarter notes × 60 / bpm at any tempo", () => {
    // Issue #8 check: onset in seconds = onset in quarter notes × 60 / bpm.
    const events = [ev(0, 1), ev(1.5, 0.5), ev(10 / 3, 2 / 3)];
    const t = buildTimeline({ events, beatsPerBar: 4, beatUnitQ: 1, countIn: false }, PPQ);
    for (const bpm of [40, 92, 208]) {
      t.notes.forEach((n, i) => {
        const seconds = (n.tick / PPQ) * (60 / bpm);
        expect(seconds).toBeCloseTo((events[i].onsetQ * 60) / bpm, 2);
      });
    }
  });

  test("a 4/4 count-in is one bar of four clicks, the first a downbeat, and shifts the music by a bar", () => {
    const t = buildTimeline({ events: [ev(0, 4), ev(4, 4)], beatsPerBar: 4, beatUnitQ: 1, countIn: true }, PPQ);
    expect(t.countInQ).toBe(4);
    expect(t.notes.map((n) => n.tick)).toEqual([4 * PPQ, 8 * PPQ]);
    expect(t.clicks).toHaveLength(12);
    expect(t.clicks.filter((c) => c.downbeat).map((c) => c.tick / PPQ)).toEqual([0, 4, 8]);
    expect([t.loopStartTick, t.loopEndTick]).toEqual([4 * PPQ, 12 * PPQ]);
  });

  test("6/8 counted in dotted quarters clicks twice a bar", () => {
    const t = buildTimeline({ events: [ev(0, 3)], beatsPerBar: 2, beatUnitQ: 1.5, countIn: false }, PPQ);
    expect(t.clicks.map((c) => [c.tick / PPQ, c.downbeat])).toEqual([
      [0, true],
      [1.5, false],
    ]);
  });

  test("the end rounds up to the bar line and notes outside the range are left out", () => {
    const t = buildTimeline({ events: [ev(0, 1), ev(5, 0.5), ev(9, 1)], beatsPerBar: 4, beatUnitQ: 1, startQ: 4, endQ: 8, countIn: false }, PPQ);
    expect(t.notes).toHaveLength(1);
    expect(t.notes[0].tick).toBe(1 * PPQ);
    const open = buildTimeline({ events: [ev(0, 1), ev(4, 1.5)], beatsPerBar: 4, beatUnitQ: 1, countIn: false }, PPQ);
    expect(open.endQ).toBe(8);
  });

  test("velocities read as 0–1, MIDI velocities 0–127 scaled", () => {
    expect(normaliseVelocity(0.5)).toBe(0.5);
    expect(normaliseVelocity(127)).toBe(1);
    expect(normaliseVelocity(64)).toBeCloseTo(64 / 127);
  });

  test("during the count-in the position stays at the start", () => {
    const t = { countInQ: 3, startQ: 6 };
    expect(scoreTimeAtTick(t, 1 * PPQ, PPQ)).toEqual({ q: 6, countingIn: true });
    expect(scoreTimeAtTick(t, 4.5 * PPQ, PPQ)).toEqual({ q: 7.5, countingIn: false });
  });

  test("a pickup piece: downbeat clicks fall on the bar lines verovio reports, and the count-in starts on a downbeat", async () => {
    const xml = readFileSync(path.resolve(__dirname, "../../fixtures/pieces/lantern-waltz.musicxml"), "utf8");
    const { score } = readScore(xml);
    const beatsPerBar = score.measures[0].time.beats;
    const beatUnitQ = 4 / score.measures[0].time.beatType;
    // Reference: verovio's timemap (qstamp of each measure start), an independent MusicXML reader.
    const tk = await verovioToolkit();
    tk.setOptions({ inputFrom: "musicxml", breaks: "none" });
    tk.loadData(xml);
    const map = tk.renderToTimemap({ includeMeasures: true, includeRests: true }) as { qstamp: number; measureOn?: string }[];
    const barStarts = map.filter((m) => m.measureOn).map((m) => Math.round(m.qstamp * 1000) / 1000);
    expect(barStarts.length).toBe(score.measures.length);
    const anchor = barStarts[1];
    const events = score.events.filter((e) => e.pitch).map((e) => ev(e.onset.valueOf(), e.duration.valueOf(), e.pitch!.midi));
    const t = buildTimeline({ events, beatsPerBar, beatUnitQ, barAnchorQ: anchor, countIn: true }, PPQ);
    const scoreQ = (tick: number) => tick / PPQ - t.countInQ;
    const downbeats = t.clicks.filter((c) => c.downbeat).map((c) => scoreQ(c.tick)).filter((q) => q >= 0);
    expect(downbeats).toEqual(barStarts.slice(1));
    expect(t.clicks[0].downbeat).toBe(true);
    // The one-beat pickup: count-in is a whole bar plus the two beats before the pickup.
    const barQ = beatsPerBar * beatUnitQ;
    const pickupQ = anchor - barStarts[0];
    expect(pickupQ).toBe(1);
    expect(t.countInQ).toBe(barQ + (barQ - pickupQ));
    expect(t.endQ).toBe(score.measures.at(-1)!.start.valueOf() + score.measures.at(-1)!.length.valueOf());
  });

  test("position readout counts beats on the bar grid, so a pickup is the last beat", () => {
    const grid = { beatsPerBar: 3, beatUnitQ: 1, anchor: 1 };
    const bars = [
      { number: 0, startQ: 0 },
      { number: 1, startQ: 1 },
      { number: 2, startQ: 4 },
    ];
    expect(describePosition(0, grid, bars)).toBe("Bar 0, beat 3");
    expect(describePosition(1, grid, bars)).toBe("Bar 1, beat 1");
    expect(describePosition(5.5, grid, bars)).toBe("Bar 2, beat 2");
    expect(describePosition(5.5, { beatsPerBar: 4, beatUnitQ: 1, anchor: 0 })).toBe("Bar 2, beat 2");
    expect(barStartAtOrBefore(0, 1, 3)).toBe(-2);
  });
});
