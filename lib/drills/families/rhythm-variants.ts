/**
 * Rhythm variants: runs of equal note values practised in other rhythms — dotted long-short and
 * short-long, regrouped as triplets, and with accents every 3 or 4 notes — so that evenness comes
 * from control rather than habit.
 */
import Fraction from "fraction.js";
import { z } from "zod";
import type { Hand, Passage, Sonority } from "../../score/types";
import type { Drill, DrillContext, DrillFamily, FamilyResult } from "../types";
import { barLength, buildDrill, leadOf, noteOf, passageHands, passageSlots, restSlot, type Slot } from "../build";

const VARIANTS = ["long-short", "short-long", "triplets", "accent-3", "accent-4"] as const;

export const rhythmVariantsOptions = z.object({
  variants: z.array(z.enum(VARIANTS)).min(1).default([...VARIANTS]),
  /** Shortest run of equal values that counts. */
  minRun: z.number().int().min(2).max(16).default(4),
});
export type RhythmVariantsOptions = z.output<typeof rhythmVariantsOptions>;

/**
 * Runs of consecutive sonorities with the same value and no gap (tuplets left out), at least `minRun` long.
 *
 * @example
 * equalRuns(passage.sonorities.right, 4).map((r) => r.length); // [8] for eight even eighths
 */
export function equalRuns(sons: readonly Sonority[], minRun: number): Sonority[][] {
  const runs: Sonority[][] = [];
  let cur: Sonority[] = [];
  const plain = (s: Sonority) => !s.notes.some((n) => n.written.tuplet);
  for (const s of sons) {
    const prev = cur[cur.length - 1];
    const joins = prev && plain(s) && prev.duration.equals(s.duration) && prev.onset.add(prev.duration).equals(s.onset);
    if (joins) cur.push(s);
    else {
      if (cur.length >= minRun) runs.push(cur);
      cur = plain(s) ? [s] : [];
    }
  }
  if (cur.length >= minRun) runs.push(cur);
  return runs;
}

const TEXT: Record<(typeof VARIANTS)[number], { title: string; teacherNote: string; studentNote: string }> = {
  "long-short": {
    title: "Dotted rhythm, long-short",
    teacherNote: "Uneven rhythms make every second note arrive quickly, which trains the finger that is usually late.",
    studentNote: "Play the runs as long-short pairs. Keep the short note light and prepare it during the long one.",
  },
  "short-long": {
    title: "Dotted rhythm, short-long",
    teacherNote: "The reversed dotted rhythm moves the quick arrival to the other finger of each pair.",
    studentNote: "Play the runs as short-long pairs. Rest the hand on each long note before the next quick one.",
  },
  triplets: {
    title: "Regrouped in triplets",
    teacherNote: "Grouping the same notes in threes moves the beat onto different fingers and breaks habitual accents.",
    studentNote: "Count three to each beat and play the notes evenly across the triplets.",
  },
  "accent-3": {
    title: "Accent every third note",
    teacherNote: "A moving accent shows which fingers are weak and evens out the run once it is removed.",
    studentNote: "Play every third note of the runs a little louder, the others soft and even.",
  },
  "accent-4": {
    title: "Accent every fourth note",
    teacherNote: "Accents every four notes steady the pulse and lead into a clean, even run.",
    studentNote: "Play every fourth note of the runs a little louder, the others soft and even.",
  },
};

/** The passage as written, with each run's slots rewritten by `rewrite`. */
function rewriteRuns(passage: Passage, hand: Hand, runs: Sonority[][], rewrite: (slot: Slot, k: number) => Slot): Slot[] {
  const place = new Map<Sonority, number>();
  runs.forEach((r) => r.forEach((s, k) => place.set(s, k)));
  return passageSlots(passage, hand, (s, _i, slot) => (place.has(s) ? rewrite(slot, place.get(s)!) : slot));
}

/** Each run regrouped as triplets (3 in the time of 2), padded with triplet rests to whole groups. */
function tripletSlots(runs: Sonority[][]): Slot[] {
  const tuplet = { actual: 3, normal: 2 };
  return runs.flatMap((run) => {
    const d = run[0].duration.mul(2, 3);
    const slots: Slot[] = run.map((s) => ({ duration: d, notes: s.notes.map(noteOf), tuplet }));
    while (slots.length % 3 !== 0) slots.push(restSlot(d, tuplet));
    return slots;
  });
}

/**
 * One drill per variant and hand for the runs of equal values in the passage.
 *
 * @example
 * rhythmVariants.generate(passage, rhythmVariantsOptions.parse({ variants: ["long-short"] }), makeContext());
 */
export function generateRhythmVariants(passage: Passage, options: RhythmVariantsOptions, ctx: DrillContext): FamilyResult {
  const drills: Drill[] = [];
  const hands = passageHands(passage);
  for (const hand of hands) {
    const runs = equalRuns(passage.sonorities[hand], options.minRun);
    if (runs.length === 0) continue;
    for (const variant of options.variants) {
      let slots: Slot[];
      let lead = leadOf(passage);
      if (variant === "long-short" || variant === "short-long") {
        const [first, second] = variant === "long-short" ? [new Fraction(3, 2), new Fraction(1, 2)] : [new Fraction(1, 2), new Fraction(3, 2)];
        slots = fixOddRuns(passage, hand, runs, first, second);
      } else if (variant === "triplets") {
        // Triplet groups (two written values each) must divide the bar, so no group crosses a barline.
        if (runs.some((r) => barLength(passage.time).div(r[0].duration.mul(2)).d !== 1n)) continue;
        slots = tripletSlots(runs);
        lead = new Fraction(0);
      } else {
        const every = variant === "accent-3" ? 3 : 4;
        slots = rewriteRuns(passage, hand, runs, (slot, k) => (k % every === 0 ? { ...slot, marks: ["accent"] } : slot));
      }
      const text = TEXT[variant];
      drills.push(
        buildDrill(
          passage,
          { family: "rhythm-variants", variant, ...text, title: hands.length > 1 ? `${text.title} (${hand} hand)` : text.title, hands: hand, segments: [{ [hand]: slots, lead }] },
          ctx,
        ),
      );
    }
  }
  return drills.length ? { drills } : { drills, skipped: `No run of ${options.minRun} or more equal notes in the passage.` };
}

/** Dotted pairs over each run; a run of odd length keeps its last note at the written value. */
function fixOddRuns(passage: Passage, hand: Hand, runs: Sonority[][], first: Fraction, second: Fraction): Slot[] {
  const place = new Map<Sonority, { k: number; len: number }>();
  runs.forEach((r) => r.forEach((s, k) => place.set(s, { k, len: r.length })));
  return passageSlots(passage, hand, (s, _i, slot) => {
    const p = place.get(s);
    if (!p || (p.len % 2 === 1 && p.k === p.len - 1)) return slot;
    return { ...slot, duration: slot.duration.mul(p.k % 2 === 0 ? first : second) };
  });
}

export const rhythmVariants: DrillFamily<typeof rhythmVariantsOptions> = {
  id: "rhythm-variants",
  label: "Rhythm variants",
  describe: "Runs of even notes practised dotted, reversed, in triplets and with moving accents.",
  options: rhythmVariantsOptions,
  generate: generateRhythmVariants,
};
