/**
 * Pivot walk: the note a hand turns around in a repeating figure is moved chromatically, step by
 * step, up and down, while the other notes stay — the rotation is practised over many distances.
 * An outer-note variant walks the figure's outer note inward only. Steps are spelled with sharps
 * going up and flats going down (common practice). With safety on, no step widens the figure past
 * the hand's comfortable span; with it off, such steps are written with a warning.
 */
import { z } from "zod";
import type { Hand, KeySignature, Passage, Pitch, Sonority } from "../../score/types";
import type { Drill, DrillContext, DrillFamily, DrillWarning, FamilyResult } from "../types";
import { buildDrill, noteOf, passageHands, PIANO_RANGE, type Slot } from "../build";
import { GROUP_BY, groupLength, groupSonorities } from "../groups";
import { asSignature, passageKey } from "../key-mode";
import { chromaticStep, pitchName } from "../spell";
import { pitchSpan } from "../span";

export const pivotWalkOptions = z.object({
  groupBy: z.enum(GROUP_BY).default("figure"),
  /** Most semitone steps each way. */
  maxSteps: z.number().int().min(1).max(6).default(3),
});
export type PivotWalkOptions = z.output<typeof pivotWalkOptions>;

/**
 * The figure and the note it turns around: the pitch that recurs most within one group (the first
 * such group), else null.
 *
 * @example
 * findPivot(groups)?.pivot.midi; // 67 for C4 G4 E4 G4
 */
export function findPivot(groups: readonly Sonority[][]): { figure: Sonority[]; pivot: Pitch } | null {
  for (const g of groups) {
    if (g.length < 3) continue;
    const count = new Map<number, { n: number; pitch: Pitch }>();
    for (const s of g) for (const n of s.notes) {
      const c = count.get(n.pitch!.midi) ?? { n: 0, pitch: n.pitch! };
      count.set(n.pitch!.midi, { ...c, n: c.n + 1 });
    }
    const best = [...count.values()].sort((a, b) => b.n - a.n)[0];
    if (best && best.n >= 2) return { figure: [...g], pivot: best.pitch };
  }
  return null;
}

/**
 * The pitches one note walks through: chromatic steps from `start` in one direction, stopping
 * before a note of the figure, the keyboard's end, or (with safety) a step past the comfortable span.
 *
 * @example
 * walkSteps(pitchFromName("G4"), 1, 3, [60, 64], () => true).map(pitchName); // ["G#4", "A4", "A#4"]
 */
export function walkSteps(start: Pitch, dir: 1 | -1, max: number, others: readonly number[], fits: (p: Pitch) => boolean, key?: KeySignature): Pitch[] {
  const out: Pitch[] = [];
  let p = start;
  for (let i = 0; i < max; i++) {
    p = chromaticStep(p, dir, key);
    if (others.includes(p.midi) || p.midi < PIANO_RANGE.low || p.midi > PIANO_RANGE.high || !fits(p)) break;
    out.push(p);
  }
  return out;
}

/** The figure once, with every occurrence of `from` replaced by `to`. */
function figureSlots(figure: Sonority[], from: Pitch, to: Pitch, words?: string): Slot[] {
  const end = figure[0].onset.add(groupLength(figure));
  return figure.map((s, i) => ({
    duration: (figure[i + 1]?.onset ?? end).sub(s.onset),
    notes: s.notes.map((n) => (n.pitch!.midi === from.midi && to !== from ? { pitch: to } : noteOf(n))),
    ...(i === 0 && words ? { words } : {}),
  }));
}

function walkDrill(passage: Passage, hand: Hand, figure: Sonority[], note: Pitch, dirs: (1 | -1)[], opts: PivotWalkOptions, ctx: DrillContext, outer: boolean): Drill | null {
  const others = [...new Set(figure.flatMap((s) => s.notes.map((n) => n.pitch!.midi)).filter((m) => m !== note.midi))];
  const otherPitches = figure.flatMap((s) => s.notes.map((n) => n.pitch!)).filter((p) => p.midi !== note.midi);
  const over = (p: Pitch) => pitchSpan([...otherPitches, p], ctx.profile).overComfortable;
  const slots: Slot[] = [...figureSlots(figure, note, note)];
  const warnings: DrillWarning[] = [];
  let moved = 0;
  for (const dir of dirs) {
    const steps = walkSteps(note, dir, opts.maxSteps, others, (p) => !ctx.safety || !over(p), asSignature(passageKey(passage)));
    steps.forEach((p, i) => {
      slots.push(...figureSlots(figure, note, p, i === 0 ? (dir > 0 ? "step up" : "step down") : undefined));
      if (over(p)) warnings.push({ code: "span", message: `With ${pitchName(p)} the figure is wider than the comfortable span.` });
    });
    moved += steps.length;
    if (steps.length) slots.push(...figureSlots(figure, note, note));
  }
  if (moved === 0) return null;
  const name = pitchName(note);
  return buildDrill(
    passage,
    {
      family: "pivot-walk",
      variant: outer ? "outer-inward" : "pivot",
      title: outer ? `Outer note ${name} walks inward` : `Pivot walk around ${name}`,
      teacherNote: outer
        ? "Bringing the outer note closer step by step shows the hand how to turn without reaching; the figure never gets wider."
        : "Moving the pivot note by semitones while the rest stays trains the rotation of the forearm over changing distances.",
      studentNote: `Play the figure, then each version with ${name} moved by one key, turning the hand loosely around it.`,
      hands: hand,
      segments: [{ [hand]: slots }],
      warnings,
    },
    ctx,
  );
}

/**
 * Pivot-walk drills for each hand with a figure that turns around a recurring note.
 *
 * @example
 * pivotWalk.generate(passage, pivotWalkOptions.parse({}), makeContext()).drills.map((d) => d.variant); // ["pivot", "outer-inward"]
 */
export function generatePivotWalk(passage: Passage, options: PivotWalkOptions, ctx: DrillContext): FamilyResult {
  const drills: Drill[] = [];
  for (const hand of passageHands(passage)) {
    // A figure split by beats may hide its turn; fall back to whole bars, then half bars.
    const found = [options.groupBy, "bar", "half-bar"]
      .map((by) => findPivot(groupSonorities(passage, hand, by as PivotWalkOptions["groupBy"], ctx.profile)))
      .find((f) => f !== null);
    if (!found) continue;
    const pivot = walkDrill(passage, hand, found.figure, found.pivot, [1, -1], options, ctx, false);
    if (pivot) drills.push(pivot);
    const pitches = found.figure.flatMap((s) => s.notes.map((n) => n.pitch!)).sort((a, b) => a.midi - b.midi);
    const outer = hand === "right" ? pitches[pitches.length - 1] : pitches[0];
    const inward = walkDrill(passage, hand, found.figure, outer, [hand === "right" ? -1 : 1], options, ctx, true);
    if (inward) drills.push(inward);
  }
  return drills.length ? { drills } : { drills, skipped: "No figure turns around a recurring note." };
}

export const pivotWalk: DrillFamily<typeof pivotWalkOptions> = {
  id: "pivot-walk",
  label: "Pivot walk",
  describe: "The note the hand turns around moved by semitones, step by step, with the rest of the figure fixed.",
  options: pivotWalkOptions,
  generate: generatePivotWalk,
};
