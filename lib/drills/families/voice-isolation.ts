/**
 * `voice-isolation`: when one hand plays two lines (two voices, or chords with a melody on top),
 * each line is written alone — the top line, then the lower line — and optionally against the
 * other hand as written, so the student hears and shapes each line before putting them together.
 */
import { z } from "zod";
import type { Hand, NoteEvent, Passage } from "../../score/types";
import { buildDrill, defaultTempo, passageHands } from "../build";
import type { Drill, DrillContext, DrillFamily, FamilyResult } from "../types";
import { passageOrigin, sonorityItem, timelineSlots, type TimedItem } from "./shared-2-layout";

/** Options: with or without the other hand, or both versions. */
export const voiceIsolationOptions = z.object({
  otherHand: z.enum(["without", "with", "both"]).default("both"),
});
export type VoiceIsolationOptions = z.output<typeof voiceIsolationOptions>;

const item = (e: NoteEvent): TimedItem => ({
  onset: e.onset, duration: e.duration, notes: [{ pitch: e.pitch!, source: e }], tuplet: e.written.tuplet,
});

/**
 * The top and lower line of one hand: by voice when the hand has two voices (highest and lowest
 * by average pitch), otherwise the top and bottom note of every chord. Null when the hand plays
 * only one line.
 * @example handLines(makePassage({ right: "[C4,E4]/4 [D4,G4]/4" }), "right")?.top.length // 2
 */
export function handLines(passage: Passage, hand: Hand): { top: TimedItem[]; lower: TimedItem[] } | null {
  const staff = passage.staffOf[hand];
  const notes = passage.events.filter((e) => e.staff === staff && e.pitch && !e.grace);
  const voices = [...new Set(notes.map((e) => e.voice))];
  if (voices.length >= 2) {
    const avg = (v: string) => {
      const m = notes.filter((e) => e.voice === v).map((e) => e.pitch!.midi);
      return m.reduce((a, b) => a + b, 0) / m.length;
    };
    voices.sort((a, b) => avg(b) - avg(a));
    const pickLine = (v: string, top: boolean) => {
      const byOnset = new Map<string, NoteEvent>();
      for (const e of notes.filter((x) => x.voice === v)) {
        const k = e.onset.toFraction();
        const cur = byOnset.get(k);
        if (!cur || (top ? e.pitch!.midi > cur.pitch!.midi : e.pitch!.midi < cur.pitch!.midi)) byOnset.set(k, e);
      }
      return [...byOnset.values()].map(item);
    };
    return { top: pickLine(voices[0], true), lower: pickLine(voices[voices.length - 1], false) };
  }
  const sons = passage.sonorities[hand];
  if (!sons.some((s) => s.notes.length >= 2)) return null;
  return {
    top: sons.map((s) => sonorityItem(s, [s.notes[s.notes.length - 1]])),
    lower: sons.map((s) => sonorityItem(s, [s.notes[0]])),
  };
}

function drillsForHand(passage: Passage, hand: Hand, o: VoiceIsolationOptions, ctx: DrillContext): Drill[] {
  const lines = handLines(passage, hand);
  if (!lines) return [];
  const other: Hand = hand === "right" ? "left" : "right";
  const { origin, end } = passageOrigin(passage);
  const otherSlots = timelineSlots(passage.sonorities[other].map((s) => sonorityItem(s)), origin, end);
  const hasOther = passage.sonorities[other].length > 0;
  const drills: Drill[] = [];
  for (const which of ["top", "lower"] as const) {
    const slots = timelineSlots(lines[which], origin, end);
    const word = which === "top" ? "Top line" : "Lower line";
    const base = {
      family: "voice-isolation", tempo: defaultTempo(passage),
      teacherNote: which === "top"
        ? "The top line usually carries the melody; alone it can be shaped and voiced before the other notes join it."
        : "The lower line often gets lost under the melody; alone it shows whether it is even and held for its full length.",
    };
    if (o.otherHand !== "with") {
      drills.push(buildDrill(passage, {
        ...base, variant: which, hands: hand, title: `${word} alone`,
        studentNote: `Play only the ${which} line of the ${hand} hand, with the written fingering, listening for a singing, connected sound.`,
        segments: [{ [hand]: slots }],
      }, ctx));
    }
    if (o.otherHand !== "without" && hasOther) {
      drills.push(buildDrill(passage, {
        ...base, variant: `${which}-with-other-hand`, hands: "both", title: `${word} with the other hand`,
        studentNote: `Play the ${which} line of the ${hand} hand with the ${other} hand as written; keep the ${other} hand softer.`,
        segments: [{ [hand]: slots, [other]: otherSlots }],
      }, ctx));
    }
  }
  return drills;
}

/**
 * Generate the voice-isolation drills; skips when no hand plays two lines.
 * @example generateVoiceIsolation(makePassage({ right: "[C4,E4]/2 [D4,F4]/2" }), voiceIsolationOptions.parse({}), makeContext()).drills.map((d) => d.variant) // ["top", "lower"]
 */
export function generateVoiceIsolation(passage: Passage, options: VoiceIsolationOptions, ctx: DrillContext): FamilyResult {
  const drills = passageHands(passage).flatMap((h) => drillsForHand(passage, h, options, ctx));
  return drills.length ? { drills } : { drills: [], skipped: "no hand plays two lines at once" };
}

/** The `voice-isolation` family for the registry. */
export const voiceIsolation: DrillFamily<typeof voiceIsolationOptions> = {
  id: "voice-isolation",
  label: "One line at a time",
  describe: "The top line alone and the lower line alone, each optionally with the other hand as written.",
  options: voiceIsolationOptions,
  generate: generateVoiceIsolation,
};
