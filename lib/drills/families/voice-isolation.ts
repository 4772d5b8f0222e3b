/**
 * `voice-isolation`: when one hand plays two or more lines (voices, or chords with a melody on top),
 * each line is written alone — the top line, the lower line, and the inner line where there is one —
 * optionally against the other hand as written, then the top and lower lines together, so the
 * student hears and shapes each line before putting them together.
 */
import { z } from "zod";
import type { Hand, NoteEvent, Passage } from "../../score/types";
import { buildDrill, defaultTempo, passageHands } from "../build";
import type { Drill, DrillContext, DrillFamily, FamilyResult } from "../types";
import { buildVoicedDrill, passageOrigin, sonorityItem, timelineSlots, type TimedItem } from "./shared-2-layout";

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

/**
 * The inner line of one hand, between its top and lower lines: the middle voices when the hand
 * has three or more, else the notes between the outer ones of every chord of three or more keys
 * (an inner chord where there are several). Null when there is none.
 * @example innerLine(makePassage({ right: "[C4,E4,G4]/2 [D4,F4,A4]/2" }), "right")?.map((i) => i.notes.length) // [1, 1]
 */
export function innerLine(passage: Passage, hand: Hand): TimedItem[] | null {
  const staff = passage.staffOf[hand];
  const notes = passage.events.filter((e) => e.staff === staff && e.pitch && !e.grace && e.tie !== "stop" && e.tie !== "continue");
  const voices = [...new Set(notes.map((e) => e.voice))];
  if (voices.length >= 3) {
    const avg = (v: string) => {
      const m = notes.filter((e) => e.voice === v).map((e) => e.pitch!.midi);
      return m.reduce((a, b) => a + b, 0) / m.length;
    };
    voices.sort((a, b) => avg(b) - avg(a));
    const middle = new Set(voices.slice(1, -1));
    const bySon = passage.sonorities[hand]
      .map((s) => ({ s, inner: s.notes.filter((n) => middle.has(n.voice)) }))
      .filter((x) => x.inner.length > 0);
    return bySon.length ? bySon.map((x) => sonorityItem(x.s, x.inner)) : null;
  }
  const withInner = passage.sonorities[hand]
    .map((s) => ({ s, inner: [...new Map(s.notes.map((n) => [n.pitch!.midi, n])).values()].slice(1, -1) }))
    .filter((x) => x.inner.length > 0);
  return withInner.length ? withInner.map((x) => sonorityItem(x.s, x.inner)) : null;
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
  const inner = innerLine(passage, hand);
  if (inner) {
    drills.push(buildDrill(passage, {
      family: "voice-isolation", tempo: defaultTempo(passage), variant: "inner", hands: hand, title: "Inner line alone",
      teacherNote: "The inner notes are the ones a student hears least; alone they show whether they are held and even.",
      studentNote: `Play only the inner notes of the ${hand} hand, with the written fingering, holding each for its full length.`,
      segments: [{ [hand]: timelineSlots(inner, origin, end) }],
    }, ctx));
  }
  // Two lines together: the top line sung out over the lower one, the inner notes left out; where
  // both lines have the same key at the same time it is written once (no unison duplicates). The
  // lower line's "p" is left out where it would stack under the top line's "mf" at the same moment.
  const same = (a: TimedItem, b: TimedItem) => a.onset.equals(b.onset) && a.notes[0]?.pitch.midi === b.notes[0]?.pitch.midi;
  const lowerOnly = lines.lower.filter((l) => !lines.top.some((t) => same(t, l)));
  const together = lowerOnly.length ? buildVoicedDrill(passage, {
    family: "voice-isolation", tempo: defaultTempo(passage), variant: "top-and-lower",
    title: "Top and lower lines together",
    teacherNote: "With the inner notes left out, the student can balance the melody against the bass line before adding the middle.",
    studentNote: `Play the top and the lower line of the ${hand} hand together; the top line louder, the lower line soft and connected.`,
  }, hand, timelineSlots(lines.top.map((i, k) => (k === 0 ? { ...i, dynamic: "mf" } : i)), origin, end), timelineSlots(lowerOnly.map((i, k) => (k === 0 && !i.onset.equals(lines.top[0]!.onset) ? { ...i, dynamic: "p" } : i)), origin, end), ctx) : null;
  // Left out when the printed fingering gives a held key's finger to a moving note.
  if (together && !together.warnings.some((w) => w.code === "fingering")) drills.push(together);
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
  describe: "Each line of the hand alone (top, inner, lower), optionally with the other hand, then the top and lower lines together.",
  options: voiceIsolationOptions,
  generate: generateVoiceIsolation,
};
