/**
 * Rhythm variants: runs of equal note values (tuplet runs included) practised in other rhythms —
 * dotted long-short and short-long inside each beat, regrouped against the meter (threes in simple
 * time; twos and fours where the run moves in threes, as in 6/8), and with accents every 3 or 4
 * notes — so that evenness comes from control rather than habit.
 */
import Fraction from "fraction.js";
import { z } from "zod";
import type { Hand, Passage, Sonority, TimeSignature } from "../../score/types";
import type { Drill, DrillContext, DrillFamily, FamilyResult } from "../types";
import { barLength, buildDrill, leadOf, noteOf, passageHands, passageSlots, restSlot, type Slot } from "../build";
import { beatLength, placeInBar } from "../groups";
import { dottedFactors, isCompound, runFeel } from "../meter";

/** Option values; "regroup" writes triplets, duplets or quadruplets by the run's meter ("triplets" is its old name). */
const VARIANTS = ["long-short", "short-long", "regroup", "accent-3", "accent-4"] as const;
type Variant = (typeof VARIANTS)[number];

export const rhythmVariantsOptions = z.object({
  variants: z
    .array(z.enum([...VARIANTS, "triplets"]))
    .min(1)
    .default([...VARIANTS])
    .transform((list) => [...new Set(list.map((v): Variant => (v === "triplets" ? "regroup" : v)))]),
  /** Shortest run of equal values that counts. */
  minRun: z.number().int().min(2).max(16).default(4),
});
export type RhythmVariantsOptions = z.output<typeof rhythmVariantsOptions>;

const ratioOf = (s: Sonority) => s.notes[0]?.written.tuplet ?? null;
const sameRatio = (a: Sonority, b: Sonority) => {
  const x = ratioOf(a);
  const y = ratioOf(b);
  return x === null || y === null ? x === y : x.actual === y.actual && x.normal === y.normal;
};

/**
 * Runs of consecutive sonorities with the same value and tuplet ratio and no gap, at least
 * `minRun` long (tuplet runs, such as triplet eighths, count too).
 *
 * @example
 * equalRuns(passage.sonorities.right, 4).map((r) => r.length); // [8] for eight even eighths
 */
export function equalRuns(sons: readonly Sonority[], minRun: number): Sonority[][] {
  const runs: Sonority[][] = [];
  let cur: Sonority[] = [];
  for (const s of sons) {
    const prev = cur[cur.length - 1];
    const joins = prev && sameRatio(prev, s) && prev.duration.equals(s.duration) && prev.onset.add(prev.duration).equals(s.onset);
    if (joins) cur.push(s);
    else {
      if (cur.length >= minRun) runs.push(cur);
      cur = [s];
    }
  }
  if (cur.length >= minRun) runs.push(cur);
  return runs;
}

type Written = "long-short" | "short-long" | "triplets" | "duplets" | "quadruplets" | "accent-3" | "accent-4";

const TEXT: Record<Written, { title: string; teacherNote: string; studentNote: string }> = {
  "long-short": {
    title: "Dotted rhythm, long-short",
    teacherNote: "Uneven rhythms make every second note arrive quickly, which trains the finger that is usually late.",
    studentNote: "Play the runs in the dotted rhythm, long then short, inside each beat. Keep the short note light and prepare it during the long one.",
  },
  "short-long": {
    title: "Dotted rhythm, short-long",
    teacherNote: "The reversed dotted rhythm moves the quick arrival to the other finger of each pair.",
    studentNote: "Play the runs in the dotted rhythm, short then long, inside each beat. Rest the hand on each long note before the next quick one.",
  },
  triplets: {
    title: "Regrouped in triplets",
    teacherNote: "Grouping the same notes in threes moves the beat onto different fingers and breaks habitual accents.",
    studentNote: "Count three to each triplet and play the notes evenly across the beats.",
  },
  duplets: {
    title: "Regrouped in twos",
    teacherNote: "The run moves in threes; two notes to the beat put the beat on other fingers and break the habit of the written grouping.",
    studentNote: "Play two even notes to each beat (duplets) while you count the beats of the bar.",
  },
  quadruplets: {
    title: "Regrouped in fours",
    teacherNote: "The run moves in threes; four notes to the beat put the beat on other fingers and test evenness at a new speed.",
    studentNote: "Play four even notes to each beat (quadruplets) while you count the beats of the bar.",
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

/** How a run can be regrouped against its meter: in threes (triplets) or, when it moves in threes, in twos and fours. */
function regroupsOf(run: readonly Sonority[], time: TimeSignature): ("triplets" | "duplets" | "quadruplets")[] {
  const v = run[0].duration;
  const { perBeat, threes } = runFeel(v, time);
  if (perBeat === null) return [];
  if (threes) return ["duplets", "quadruplets"];
  // Triplets (two written values each) must divide the bar, so no group crosses a barline.
  if (isCompound(time) || barLength(time).div(v.mul(2)).d !== 1n) return [];
  return ["triplets"];
}

function gcd(a: number, b: number): number {
  return b === 0 ? a : gcd(b, a % b);
}

/**
 * The runs regrouped, back to back from a bar's start, each padded with rests to whole beats:
 * triplets are 3 in the time of 2 of the run's value; duplets and quadruplets put 2 or 4 notes on
 * a beat that held 3 (written as 2:3 and 4:3 tuplets in compound time, as plain values when the
 * run itself was a tuplet).
 */
function regroupSlots(runs: Sonority[][], kind: "triplets" | "duplets" | "quadruplets", time: TimeSignature): Slot[] {
  const beat = beatLength(time);
  return runs.flatMap((run) => {
    const v = run[0].duration;
    let d: Fraction;
    let tuplet: Slot["tuplet"];
    let per: number;
    if (kind === "triplets") {
      d = v.mul(2, 3);
      tuplet = { actual: 3, normal: 2 };
      per = 3;
    } else {
      const n = runFeel(v, time).perBeat!;
      const k = ((kind === "duplets" ? 2 : 4) * n) / 3;
      d = beat.div(k);
      const g = gcd(k, n);
      tuplet = isCompound(time) ? { actual: k / g, normal: n / g } : undefined;
      per = k;
    }
    const slots: Slot[] = run.map((s) => ({ duration: d, notes: s.notes.map(noteOf), ...(tuplet ? { tuplet } : {}) }));
    // Pad to whole groups that also end on a beat (a tuplet bracket never crosses a beat).
    for (let guard = 0; guard < 64 && (slots.length % per !== 0 || d.mul(slots.length).mod(beat).compare(0) !== 0); guard++) {
      slots.push(restSlot(d, tuplet));
    }
    return slots;
  });
}

/** Sounding length of a written sixteenth in this sonority's tuplet (1 when it has none). */
function ratioScale(s: Sonority): Fraction {
  const t = ratioOf(s);
  return t ? new Fraction(t.normal, t.actual) : new Fraction(1);
}

/**
 * Dotted durations for the runs, kept inside the beat: pairs start on an even place of the beat
 * (of two beats for a run of one note per beat), three notes to a beat take the compound figure,
 * chords keep their written value. Returns the new duration per sonority.
 */
function dottedPlan(passage: Passage, runs: Sonority[][], order: "long-short" | "short-long"): Map<Sonority, Fraction> {
  const plan = new Map<Sonority, Fraction>();
  const beat = beatLength(passage.time);
  for (const run of runs) {
    const v = run[0].duration;
    const { perBeat } = runFeel(v, passage.time);
    // A dotted pair on anything shorter than a sixteenth would need 64ths (DRILL-RUBRIC 2: no invented values).
    if (perBeat === null || v.compare(new Fraction(1, 4).mul(ratioScale(run[0]))) < 0) continue;
    // Plain values only, in groupings a student reads (1, 2, 3, 4, 6 or 8 to the beat): a dotted
    // figure inside a tuplet is hard to read and was misread in the gallery (pebble-study bars 1–2);
    // tuplet runs are drilled by regrouping and accents instead.
    if (ratioOf(run[0]) || ![1, 2, 3, 4, 6, 8].includes(perBeat)) continue;
    const unit = perBeat >= 2 ? beat : v.mul(2);
    const groups = new Map<string, Sonority[]>();
    for (const s of run) {
      const { bar, offset } = placeInBar(passage, s.onset);
      const key = `${bar}:${offset.div(unit).floor().toFraction()}`;
      groups.set(key, [...(groups.get(key) ?? []), s]);
    }
    for (const g of groups.values()) {
      if (g.some((s) => s.notes.length !== 1)) continue; // no dotted rhythm on chords (DRILL-RUBRIC, rhythm-variants)
      const place = placeInBar(passage, g[0].onset).offset.mod(unit).div(v).valueOf();
      if (perBeat === 3) {
        const f = g.length === 3 ? dottedFactors(3, order) : null;
        f?.forEach((x, i) => plan.set(g[i], v.mul(x)));
        continue;
      }
      const from = place % 2 === 1 ? 1 : 0;
      const count = Math.floor((g.length - from) / 2) * 2;
      const f = count >= 2 ? dottedFactors(count, order) : null;
      f?.forEach((x, i) => plan.set(g[from + i], v.mul(x)));
    }
  }
  return plan;
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
  const make = (hand: Hand, variant: Written, slots: Slot[], lead: Fraction) => {
    const text = TEXT[variant];
    const title = hands.length > 1 ? `${text.title} (${hand} hand)` : text.title;
    drills.push(buildDrill(passage, { family: "rhythm-variants", variant, ...text, title, hands: hand, segments: [{ [hand]: slots, lead }] }, ctx));
  };
  for (const hand of hands) {
    const runs = equalRuns(passage.sonorities[hand], options.minRun);
    if (runs.length === 0) continue;
    for (const variant of options.variants) {
      if (variant === "long-short" || variant === "short-long") {
        const plan = dottedPlan(passage, runs, variant);
        if (plan.size === 0) continue;
        make(hand, variant, passageSlots(passage, hand, (so, _i, slot) => (plan.has(so) ? { ...slot, duration: plan.get(so)! } : slot)), leadOf(passage));
      } else if (variant === "regroup") {
        for (const kind of ["triplets", "duplets", "quadruplets"] as const) {
          const fit = runs.filter((r) => regroupsOf(r, passage.time).includes(kind));
          if (fit.length) make(hand, kind, regroupSlots(fit, kind, passage.time), new Fraction(0));
        }
      } else {
        const every = variant === "accent-3" ? 3 : 4;
        make(hand, variant, rewriteRuns(passage, hand, runs, (slot, k) => (k % every === 0 ? { ...slot, marks: ["accent"] } : slot)), leadOf(passage));
      }
    }
  }
  return drills.length ? { drills } : { drills, skipped: `No run of ${options.minRun} or more equal notes in the passage.` };
}

export const rhythmVariants: DrillFamily<typeof rhythmVariantsOptions> = {
  id: "rhythm-variants",
  label: "Rhythm variants",
  describe: "Runs of even notes practised dotted, reversed, regrouped against the meter and with moving accents.",
  options: rhythmVariantsOptions,
  generate: generateRhythmVariants,
};
