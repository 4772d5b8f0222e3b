/**
 * `thumb-pairs`: a scale of the passage's key and mode (a minor passage in the chosen minor form) fingered only with the thumb and one other finger
 * in turn (fingers 2, 3 and 4), so the thumb passes under on every other note; and five-finger
 * patterns re-fingered so the thumb takes over a finger's note, or the hand moves sideways.
 */
import Fraction from "fraction.js";
import { Note, Scale } from "tonal";
import { z } from "zod";
import type { Hand, Passage } from "../../score/types";
import { buildDrill, defaultTempo, passageHands, type Slot } from "../build";
import { asSignature, MINOR_FORMS, passageKey, scaleNameOf, writableForm } from "../key-mode";
import { barCap, firstWithin } from "../length";
import { keyTonic, pitchFromName } from "../spell";
import type { Drill, DrillContext, DrillFamily, FamilyResult } from "../types";
import { fingered } from "./shared-2-layout";

const VALUES = { "16th": new Fraction(1, 4), eighth: new Fraction(1, 2), quarter: new Fraction(1) } as const;

/** Options: which finger pairs, octaves, note value, five-finger variants and the takeover finger. */
export const thumbPairsOptions = z.object({
  fingers: z.array(z.union([z.literal(2), z.literal(3), z.literal(4)])).min(1).default([2, 3, 4]),
  octaves: z.number().int().min(1).max(2).default(1),
  value: z.enum(["16th", "eighth", "quarter"]).default("eighth"),
  fiveFinger: z.boolean().default(true),
  /** The finger whose note the thumb takes over. */
  takeover: z.number().int().min(2).max(5).default(3),
  /** Positions the five-finger pattern moves up before coming back. */
  positions: z.number().int().min(2).max(7).default(3),
  /** Minor passages use this form of the minor scale (melodic comes down as natural minor). */
  minorForm: z.enum(MINOR_FORMS).default("harmonic"),
});
export type ThumbPairsOptions = z.output<typeof thumbPairsOptions>;

/**
 * The key's scale from a tonic octave as note names, by tonal's `Scale.degrees` (ordinal 0 = tonic).
 * @example scaleNotes("C4 major", 0, 2) // ["C4", "D4", "E4"]
 */
export function scaleNotes(scaleWithOctave: string, from: number, to: number): string[] {
  const deg = Scale.degrees(scaleWithOctave);
  const out: string[] = [];
  const step = from <= to ? 1 : -1;
  for (let o = from; step > 0 ? o <= to : o >= to; o += step) out.push(deg(o >= 0 ? o + 1 : o));
  return out;
}

/** Octave for the tonic so the scale's middle sits nearest the hand's average pitch (ties go up). */
function tonicOctave(passage: Passage, hand: Hand): number {
  const m = passage.sonorities[hand].flatMap((s) => s.notes.map((n) => n.pitch!.midi));
  const mean = m.length ? m.reduce((a, b) => a + b, 0) / m.length : hand === "right" ? 66 : 50;
  const tonic = keyTonic(asSignature(passageKey(passage)));
  let best = 4;
  for (let oct = 1; oct <= 6; oct++) {
    const d = Math.abs((Note.midi(`${tonic}${oct}`) ?? 0) - (mean - 6));
    if (d <= Math.abs((Note.midi(`${tonic}${best}`) ?? 0) - (mean - 6))) best = oct;
  }
  return best;
}

/**
 * Fingers for a thumb-pair scale: thumb and `k` in turn; the right hand starts on the thumb,
 * the left on `k` (little-finger side low).
 * @example pairFingers(5, 3, "right") // [1, 3, 1, 3, 1]
 */
export function pairFingers(count: number, k: number, hand: Hand): number[] {
  const first = hand === "right" ? 1 : k;
  const second = first === 1 ? k : 1;
  return Array.from({ length: count }, (_, i) => (i % 2 === 0 ? first : second));
}

const slotsOf = (names: readonly string[], fingers: readonly number[], value: Fraction): Slot[] =>
  names.map((n, i) => ({ duration: value, notes: [fingered(pitchFromName(n), fingers[i])] }));

/** Lowest and highest piano keys: A0 = MIDI 21, C8 = MIDI 108 (FACTS.md §1). */
const LOW = 21;
const HIGH = 108;

/**
 * The pattern moved by whole octaves onto the keyboard (A0–C8), or null when it is wider than
 * the keyboard. A pattern that already fits is returned as it is.
 * @example onKeyboard(["G1", "F#1", "E1", "D1", "C1", "B0", "A0", "G0"]) // an octave up: ["G2", …, "G1"]
 */
export function onKeyboard(names: readonly string[]): string[] | null {
  const midis = names.map((n) => Note.midi(n) ?? NaN);
  const lo = Math.min(...midis);
  const hi = Math.max(...midis);
  if (Number.isNaN(lo) || hi - lo > HIGH - LOW) return null;
  const octaves = lo < LOW ? Math.ceil((LOW - lo) / 12) : hi > HIGH ? -Math.ceil((hi - HIGH) / 12) : 0;
  if (octaves === 0) return [...names];
  const by = `${octaves > 0 ? "" : "-"}${7 * Math.abs(octaves) + 1}P`;
  return names.map((n) => Note.transpose(n, by));
}

function drillsForHand(passage: Passage, hand: Hand, o: ThumbPairsOptions, ctx: DrillContext): Drill[] {
  const pk = passageKey(passage);
  const form = writableForm(pk, o.minorForm, passage);
  const name = scaleNameOf(pk, form);
  const oct = tonicOctave(passage, hand);
  const scale = `${pk.tonic}${oct} ${name.slice(name.indexOf(" ") + 1)}`;
  // Melodic minor comes down as natural minor (common practice).
  const downName = form === "melodic" && pk.mode === "minor" ? scaleNameOf(pk, "natural") : name;
  const down = `${pk.tonic}${oct} ${downName.slice(downName.indexOf(" ") + 1)}`;
  const value = VALUES[o.value];
  const cap = barCap(passage, ctx);
  const base = { family: "thumb-pairs", hands: hand, tempo: defaultTempo(passage) };
  const tag = passageHands(passage).length > 1 ? ` (${hand} hand)` : "";
  const upAndDown = (octaves: number) => onKeyboard([...scaleNotes(scale, 0, 7 * octaves), ...scaleNotes(down, 7 * octaves - 1, 0)]);
  if (!upAndDown(o.octaves)) return [];
  const octaveChoices = Array.from({ length: o.octaves }, (_, i) => o.octaves - i);
  const drills: Drill[] = o.fingers.map((k) =>
    firstWithin(cap, octaveChoices.map((n) => () => {
      const names = upAndDown(n) ?? [];
      return buildDrill(passage, {
        ...base, variant: `thumb-and-${k}`, title: `Scale with thumb and ${k}${tag}`,
        teacherNote: "With only two fingers, the thumb has to pass on every other note; a smooth result shows a free thumb and a quiet arm.",
        studentNote: `Play the scale up and down using only the thumb and finger ${k} in turn; keep the line smooth and the elbow still.`,
        segments: [{ [hand]: slotsOf(names, pairFingers(names.length, k, hand), value) }],
      }, ctx);
    })),
  );
  if (!o.fiveFinger) return drills;
  // Sideways: the five-finger pattern up and back, on each position, then back down.
  const up = hand === "right" ? [1, 2, 3, 4, 5, 4, 3, 2] : [5, 4, 3, 2, 1, 2, 3, 4];
  const sideways = (positions: number) => () => {
    const starts = [...Array.from({ length: positions }, (_, i) => i), ...Array.from({ length: positions - 1 }, (_, i) => positions - 2 - i)];
    const side = starts.flatMap((s) => scaleNotes(scale, s, s + 4).concat(scaleNotes(scale, s + 3, s + 1)));
    const sideFingers = starts.flatMap(() => up);
    return buildDrill(passage, {
      ...base, variant: "five-finger-sideways", title: `Five-finger pattern moving sideways${tag}`,
      teacherNote: "Moving a fixed hand shape one key at a time trains the lateral move without any thumb passing.",
      studentNote: "Play the five-finger pattern up and back, then move the whole hand one key over; keep the shape of the hand the same.",
      segments: [{ [hand]: slotsOf(onKeyboard([...side, scaleNotes(scale, 0, 0)[0]]) ?? [], [...sideFingers, hand === "right" ? 1 : 5], value) }],
    }, ctx);
  };
  drills.push(firstWithin(cap, Array.from({ length: o.positions - 1 }, (_, i) => sideways(o.positions - i))));
  // Takeover: fingers 1…k on consecutive notes (right hand up, left hand down), then the thumb retakes finger k's note.
  const k = o.takeover;
  const dir = hand === "right" ? 1 : -1;
  const takeover = (octaves: number) => () => {
    const top = 7 * octaves;
    const cells: { name: string; finger: number }[] = [];
    let start = 0;
    for (; Math.abs(start + dir * (k - 1)) <= top; start += dir * (k - 1)) {
      scaleNotes(scale, start, start + dir * (k - 1)).forEach((n, i) => cells.push({ name: n, finger: i + 1 }));
    }
    if (Math.abs(start) < top) {
      scaleNotes(scale, start, dir * top).forEach((n, i) => cells.push({ name: n, finger: i + 1 }));
    }
    return buildDrill(passage, {
      ...base, variant: `thumb-takes-${k}`, title: `Thumb takes over finger ${k}${tag}`,
      teacherNote: "Taking a note over with the thumb moves the hand into the next position without a gap or a bump.",
      studentNote: `Play fingers 1 to ${k} on the scale; the thumb then plays the same key finger ${k} just played, and the hand carries on from there.`,
      segments: [{ [hand]: slotsOf(onKeyboard(cells.map((c) => c.name)) ?? [], cells.map((c) => c.finger), value) }],
    }, ctx);
  };
  drills.push(firstWithin(cap, octaveChoices.map(takeover)));
  return drills;
}

/**
 * Generate the thumb-pair drills for each hand of the passage.
 * @example generateThumbPairs(makePassage({ right: "C4/4" }), thumbPairsOptions.parse({}), makeContext()).drills.length // 5
 */
export function generateThumbPairs(passage: Passage, options: ThumbPairsOptions, ctx: DrillContext): FamilyResult {
  return { drills: passageHands(passage).flatMap((h) => drillsForHand(passage, h, options, ctx)) };
}

/** The `thumb-pairs` family for the registry. */
export const thumbPairs: DrillFamily<typeof thumbPairsOptions> = {
  id: "thumb-pairs",
  label: "Thumb pairs and five-finger shifts",
  describe: "The key's scale with the thumb and one finger in turn, and five-finger patterns that move sideways or hand over to the thumb.",
  options: thumbPairsOptions,
  generate: generateThumbPairs,
};

