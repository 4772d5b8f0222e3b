/**
 * Scale rhythm: the passage's rhythm pattern (its subdivision of the beat, tuplets included)
 * played on a two-octave scale of its key and mode (found from the notes: a minor passage gets
 * the harmonic or melodic minor the teacher chooses), up and down, with standard scale fingering —
 * the same motion problem without the notes of the piece. One octave when two would pass the bar cap.
 */
import Fraction from "fraction.js";
import { Scale } from "tonal";
import { z } from "zod";
import type { Hand, Passage } from "../../score/types";
import type { Drill, DrillContext, DrillFamily, FamilyResult } from "../types";
import { buildDrill, passageHands, type Slot } from "../build";
import { beatLength, groupSonorities, placeInBar } from "../groups";
import { asSignature, keyLabel, MINOR_FORMS, passageKey, writableForm } from "../key-mode";
import { barCap, firstWithin } from "../length";
import { keyTonic, pitchFromName } from "../spell";
import { scaleFingers } from "../scale-fingerings";

export const scaleRhythmOptions = z.object({
  /** Minor keys use this form of the minor scale. */
  minorForm: z.enum(MINOR_FORMS).default("harmonic"),
});
export type ScaleRhythmOptions = z.output<typeof scaleRhythmOptions>;

/** One beat's rhythm: durations from the beat's start, and the tuplet they are written in. */
export interface BeatPattern {
  readonly durations: readonly Fraction[];
  readonly tuplet?: { readonly actual: number; readonly normal: number };
}

/**
 * The most common beat pattern of a hand with at least two notes in the beat (ties keep the first
 * seen); one note per beat when the hand never divides the beat.
 *
 * @example
 * beatPattern(passage, "right").durations.map(String); // ["0.5", "0.5"] for running eighths
 */
export function beatPattern(passage: Passage, hand: Hand, ctx: DrillContext): BeatPattern {
  const beat = beatLength(passage.time);
  const counts = new Map<string, { n: number; pattern: BeatPattern }>();
  for (const g of groupSonorities(passage, hand, "beat", ctx.profile)) {
    const { offset } = placeInBar(passage, g[0].onset);
    if (!offset.mod(beat).equals(0) || g.length < 2) continue;
    const end = g[0].onset.add(beat);
    const durations = g.map((s, i) => (g[i + 1]?.onset ?? end).sub(s.onset));
    const tuplet = g[0].notes[0]?.written.tuplet ?? undefined;
    const key = durations.map((d) => d.toFraction()).join(" ") + (tuplet ? ` ${tuplet.actual}:${tuplet.normal}` : "");
    const entry = counts.get(key) ?? { n: 0, pattern: { durations, ...(tuplet ? { tuplet } : {}) } };
    counts.set(key, { ...entry, n: entry.n + 1 });
  }
  let best: { n: number; pattern: BeatPattern } | undefined;
  for (const c of counts.values()) if (!best || c.n > best.n) best = c;
  return best?.pattern ?? { durations: [beat] };
}

/**
 * Standard two-octave scale fingering, up and back down (29 fingers, the notes of `twoOctaveScale`),
 * from the scale-book table in scale-fingerings.ts (all 24 keys; common practice). Null for an unknown tonic.
 *
 * @example
 * scaleFingering("C", "major", "right")?.slice(0, 15); // [1, 2, 3, 1, 2, 3, 4, 1, 2, 3, 1, 2, 3, 4, 5]
 */
export function scaleFingering(tonic: string, mode: string, hand: Hand, minorForm: ScaleRhythmOptions["minorForm"] = "harmonic", octaves = 2): number[] | null {
  const fingers = scaleFingers(tonic, mode === "minor" ? `${minorForm} minor` : "major", hand, octaves);
  return fingers ? [...fingers.up, ...fingers.down.slice(1)] : null;
}

/**
 * The scale of a key, two octaves (or `octaves`) up and back down (29 notes for two), as tonal spells it.
 *
 * @example
 * twoOctaveScale({ fifths: 0, mode: "major" }, 4, "harmonic").slice(0, 3); // ["C4", "D4", "E4"]
 */
export function twoOctaveScale(key: Passage["key"], octave: number, minorForm: ScaleRhythmOptions["minorForm"], octaves = 2): string[] {
  const tonic = keyTonic(key);
  const type = key.mode === "minor" ? (minorForm === "natural" ? "minor" : `${minorForm} minor`) : "major";
  // Melodic minor comes down as natural minor (common practice).
  const up = Scale.rangeOf(`${tonic} ${type}`)(`${tonic}${octave}`, `${tonic}${octave + octaves}`) as string[];
  const downScale = type === "melodic minor" ? `${tonic} minor` : `${tonic} ${type}`;
  const down = (Scale.rangeOf(downScale)(`${tonic}${octave + octaves}`, `${tonic}${octave}`) as string[]).slice(1);
  return [...up, ...down];
}

function scaleSlots(passage: Passage, hand: Hand, pattern: BeatPattern, options: ScaleRhythmOptions, octaves: number): Slot[] {
  const pk = passageKey(passage);
  const key = asSignature(pk);
  const form = writableForm(pk, options.minorForm, passage);
  const names = twoOctaveScale(key, hand === "right" ? 4 : 2, form, octaves);
  // Scale-book fingering for this key, form and number of octaves (lib/drills/scale-fingerings.ts).
  const fingers = scaleFingering(keyTonic(key), key.mode, hand, form, octaves);
  const fingerAt = (i: number) => fingers?.[i];
  const slots: Slot[] = [];
  const tuplet = pattern.tuplet;
  let k = 0;
  for (; k < names.length; k++) {
    const f = fingerAt(k);
    slots.push({
      duration: pattern.durations[k % pattern.durations.length],
      notes: [{ pitch: pitchFromName(names[k]), ...(f ? { fingering: [{ finger: f }] } : {}) }],
      ...(tuplet ? { tuplet } : {}),
    });
  }
  // The last tonic is held to the end of its beat (a scale ends on a long tonic, common practice),
  // rather than followed by a string of short rests.
  let hold = new Fraction(0);
  for (; k % pattern.durations.length !== 0; k++) hold = hold.add(pattern.durations[k % pattern.durations.length]);
  const last = slots[slots.length - 1];
  if (last && hold.compare(0) > 0) {
    const duration = last.duration.add(hold);
    const { tuplet: _drop, ...plain } = last;
    slots[slots.length - 1] = duration.d === 1n || [2n, 4n, 8n, 16n, 32n].includes(duration.d) ? { ...plain, duration } : { ...last, duration };
  }
  return slots;
}

/**
 * One drill per hand (and hands together when the passage has both): the scale in the hand's rhythm.
 *
 * @example
 * scaleRhythm.generate(passage, scaleRhythmOptions.parse({}), makeContext()).drills[0].title;
 */
export function generateScaleRhythm(passage: Passage, options: ScaleRhythmOptions, ctx: DrillContext): FamilyResult {
  const hands = passageHands(passage).filter((h) => passage.sonorities[h].length > 0);
  if (hands.length === 0) return { drills: [], skipped: "The passage has no notes to take a rhythm from." };
  const pk = passageKey(passage);
  const keyName = keyLabel(pk, writableForm(pk, options.minorForm, passage));
  const cap = barCap(passage, ctx);
  const drills: Drill[] = [];
  const sets: (Hand | "both")[] = hands.length === 2 ? ["right", "left", "both"] : hands;
  for (const set of sets) {
    const own: Hand[] = set === "both" ? ["right", "left"] : [set];
    const pattern = beatPattern(passage, own[0], ctx);
    const make = (octaves: number) => () =>
      buildDrill(
        passage,
        {
          family: "scale-rhythm",
          variant: set === "both" ? "hands-together" : `${set}-hand`,
          title: `${keyName} scale in the passage's rhythm${set === "both" ? ", hands together" : hands.length > 1 ? ` (${set} hand)` : ""}`,
          teacherNote: "The scale carries the passage's exact subdivision, so the rhythm is secured on familiar notes first.",
          studentNote: `Play the scale ${octaves === 2 ? "two octaves" : "one octave"} up and down in this rhythm, evenly, with the fingering shown.`,
          hands: set,
          segments: [Object.fromEntries(own.map((h) => [h, scaleSlots(passage, h, pattern, options, octaves)]))],
        },
        ctx,
      );
    drills.push(firstWithin(cap, [make(2), make(1)]));
  }
  return { drills };
}

export const scaleRhythm: DrillFamily<typeof scaleRhythmOptions> = {
  id: "scale-rhythm",
  label: "Scale in rhythm",
  describe: "The passage's rhythm on a two-octave scale of its key, up and down.",
  options: scaleRhythmOptions,
  generate: generateScaleRhythm,
};
