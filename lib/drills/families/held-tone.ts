/**
 * `held-tone`: in an accompaniment figure (an Alberti bass, a broken chord) one note comes back
 * every other note. The drill holds that note as a long note, or presses it silently, or gives it
 * to the other hand, while the rest of the figure plays — so the moving fingers learn to be even
 * without the hand bouncing on the recurring note.
 */
import { z } from "zod";
import type { Hand, Passage, Sonority } from "../../score/types";
import { buildDrill, defaultTempo, passageHands } from "../build";
import type { Drill, DrillContext, DrillFamily, FamilyResult } from "../types";
import { buildVoicedDrill, passageOrigin, sonorityItem, timelineSlots, type TimedItem } from "./shared-2-layout";

/** Options: which variants, and how often the note must come back to count. */
export const heldToneOptions = z.object({
  variants: z.array(z.enum(["hold", "silent", "other-hand"])).min(1).default(["hold", "silent", "other-hand"]),
  /** Fewest returns of the note (every other note) that make a figure. */
  minReturns: z.number().int().min(2).max(16).default(3),
});
export type HeldToneOptions = z.output<typeof heldToneOptions>;

/** A stretch of sonorities (indexes, end exclusive) where the note at every other position is `midi`. */
export interface RecurringWindow {
  readonly start: number;
  readonly end: number;
  /** Indexes of the recurring note's sonorities. */
  readonly recurring: readonly number[];
  readonly midi: number;
}

const single = (s: Sonority | undefined) => (s && s.notes.length === 1 ? s.notes[0].pitch!.midi : null);

/**
 * Stretches of a hand's sonorities where one single note comes back every other note, at least
 * `minReturns` times, and the notes between are different notes.
 * @example findRecurringWindows(makePassage({ right: "C4/8 G4/8 E4/8 G4/8" }).sonorities.right, 2) // [{ start: 0, end: 4, recurring: [1, 3], midi: 67 }]
 */
export function findRecurringWindows(sons: readonly Sonority[], minReturns: number): RecurringWindow[] {
  const out: RecurringWindow[] = [];
  let i = 0;
  while (i < sons.length) {
    let found: RecurringWindow | null = null;
    for (const j of [i, i + 1]) {
      const midi = single(sons[j]);
      if (midi === null) continue;
      const recurring = [j];
      while (single(sons[recurring[recurring.length - 1] + 2]) === midi && !sons[recurring[recurring.length - 1] + 1].notes.some((n) => n.pitch!.midi === midi)) {
        recurring.push(recurring[recurring.length - 1] + 2);
      }
      if (recurring.length < minReturns) continue;
      const last = recurring[recurring.length - 1];
      const inner = j > i ? !sons[i].notes.some((n) => n.pitch!.midi === midi) : false;
      const after = last + 1 < sons.length && !sons[last + 1].notes.some((n) => n.pitch!.midi === midi);
      found = { start: inner ? i : j, end: after ? last + 2 : last + 1, recurring, midi };
      break;
    }
    if (found) {
      out.push(found);
      i = found.end;
    } else i++;
  }
  return out;
}

const endOf = (s: Sonority) => s.onset.add(s.duration);

/** The moving notes, each lasting until the next moving note inside a window; outside, as written. */
function movingItems(sons: readonly Sonority[], windows: readonly RecurringWindow[], extend: boolean): TimedItem[] {
  const held = new Set(windows.flatMap((w) => w.recurring));
  const items: TimedItem[] = [];
  sons.forEach((s, i) => {
    if (held.has(i)) return;
    const w = windows.find((x) => i >= x.start && i < x.end);
    if (!w || !extend) return void items.push(sonorityItem(s));
    let k = i + 1;
    while (k < w.end && held.has(k)) k++;
    const until = k < w.end ? sons[k].onset : endOf(sons[w.end - 1]);
    items.push({ ...sonorityItem(s), duration: until.sub(s.onset) });
  });
  return items;
}

/** The recurring note as one long note per window (from its first return, or the window start). */
function heldItems(sons: readonly Sonority[], windows: readonly RecurringWindow[], silent: boolean): TimedItem[] {
  return windows.map((w) => {
    const first = sons[w.recurring[0]];
    const from = silent ? sons[w.start].onset : first.onset;
    const end = endOf(sons[w.end - 1]);
    return {
      ...sonorityItem(first),
      onset: from,
      duration: end.sub(from),
      ...(silent ? { marks: ["diamond" as const], words: "press silently" } : {}),
    };
  });
}

const mean = (items: readonly TimedItem[]) => {
  const m = items.flatMap((i) => i.notes.map((n) => n.pitch.midi));
  return m.length ? m.reduce((a, b) => a + b, 0) / m.length : 0;
};

function drillsForHand(passage: Passage, hand: Hand, o: HeldToneOptions, ctx: DrillContext): Drill[] {
  const sons = passage.sonorities[hand];
  const windows = findRecurringWindows(sons, o.minReturns);
  if (windows.length === 0) return [];
  const { origin, end } = passageOrigin(passage);
  const tempo = defaultTempo(passage);
  const base = { family: "held-tone", tempo };
  const drills: Drill[] = [];
  for (const variant of o.variants) {
    if (variant === "other-hand") {
      const other: Hand = hand === "right" ? "left" : "right";
      const mine = timelineSlots(movingItems(sons, windows, false), origin, end);
      const given = timelineSlots(windows.flatMap((w) => w.recurring.map((i) => sonorityItem(sons[i]))), origin, end);
      drills.push(
        buildDrill(passage, {
          ...base, variant, hands: "both",
          title: "Recurring note in the other hand",
          teacherNote: "Hearing the figure shared between the hands shows the student which notes carry the line and which only return.",
          studentNote: `The ${other} hand plays the returning note; the ${hand} hand plays the rest. Then swap back to the written version.`,
          segments: [{ [hand]: mine, [other]: given }],
        }, ctx),
      );
      continue;
    }
    const silent = variant === "silent";
    const moving = movingItems(sons, windows, true);
    const held = heldItems(sons, windows, silent);
    const heldUp = mean(held) > mean(moving);
    const upper = timelineSlots(heldUp ? held : moving, origin, end);
    const lower = timelineSlots(heldUp ? moving : held, origin, end);
    drills.push(
      buildVoicedDrill(passage, {
        ...base, variant,
        title: silent ? "Recurring note pressed silently" : "Recurring note held",
        teacherNote: silent
          ? "With the returning key held down without sound, the hand cannot bounce on it and the other fingers must move on their own."
          : "Holding the returning note keeps the hand still over it, so the moving fingers learn to be even.",
        studentNote: silent
          ? "Press the diamond note down without sounding it and keep it down; play the other notes evenly and softly."
          : "Hold the long note down for its full length while the other fingers play their notes evenly.",
      }, hand, upper, lower, ctx),
    );
  }
  return drills;
}

/**
 * Generate the held-tone drills; skips with a reason when no note recurs every other note.
 * @example generateHeldTone(makePassage({ left: "C3/8 G3/8 E3/8 G3/8 C3/8 G3/8 E3/8 G3/8" }), heldToneOptions.parse({}), makeContext()).drills.length // 3
 */
export function generateHeldTone(passage: Passage, options: HeldToneOptions, ctx: DrillContext): FamilyResult {
  const written = passageHands(passage).flatMap((h) => drillsForHand(passage, h, options, ctx));
  // Holding a key the printed fingering gives to a moving note cannot be played: leave those out.
  const drills = written.filter((d) => !d.warnings.some((w) => w.code === "fingering"));
  if (drills.length) return { drills };
  return { drills: [], skipped: written.length ? "The recurring note cannot be held down with the passage's fingering." : "No note comes back every other note, so there is nothing to hold." };
}

/** The `held-tone` family for the registry. */
export const heldTone: DrillFamily<typeof heldToneOptions> = {
  id: "held-tone",
  label: "Held recurring note",
  describe: "The note an accompaniment figure keeps returning to is held, pressed silently or given to the other hand while the rest plays.",
  options: heldToneOptions,
  generate: generateHeldTone,
};

