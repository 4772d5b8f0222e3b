/**
 * Pivot walk: a figure that turns around a recurring note, found within one hand position, is
 * walked as a whole hand shape by semitones, up and back, then down and back — the rotation is
 * practised over new black-and-white key layouts while the shape and fingering stay. An outer-note
 * variant walks only the figure's outer note inward (and says so), narrowing the shape. Steps are
 * spelled with sharps going up and flats going down (common practice). With safety on, no step
 * passes the hand's comfortable span; with it off, such steps are written with a warning.
 */
import { z } from "zod";
import type { Hand, KeySignature, Passage, Pitch, Sonority } from "../../score/types";
import type { Drill, DrillContext, DrillFamily, DrillWarning, FamilyResult } from "../types";
import { buildDrill, noteOf, passageHands, PIANO_RANGE, type Slot } from "../build";
import { GROUP_BY, groupLength, groupSonorities } from "../groups";
import { asSignature, passageKey } from "../key-mode";
import { chromaticStep, pitchName } from "../spell";
import { pitchSpan } from "../span";
import { handPositions } from "../hand-position";

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

function walkDrill(passage: Passage, hand: Hand, figure: Sonority[], note: Pitch, dirs: (1 | -1)[], opts: PivotWalkOptions, ctx: DrillContext): Drill | null {
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
      variant: "outer-inward",
      title: `Outer note ${name} walks inward`,
      teacherNote: "Bringing only the outer note closer, one key at a time, shows the hand how to turn without reaching; the figure never gets wider.",
      studentNote: `Play the figure, then each version with only ${name} moved one key inward; the other notes stay.`,
      hands: hand,
      segments: [{ [hand]: slots }],
      warnings,
    },
    ctx,
  );
}

/** The figure once, every note moved by `k` semitones (sharps going up, flats going down). */
function movedFigure(figure: Sonority[], k: number, words?: string): Slot[] {
  const end = figure[0]!.onset.add(groupLength(figure));
  const move = (p: Pitch) => {
    let q = p;
    for (let i = 0; i < Math.abs(k); i++) q = chromaticStep(q, k > 0 ? 1 : -1);
    return q;
  };
  return figure.map((s, i) => ({
    duration: (figure[i + 1]?.onset ?? end).sub(s.onset),
    notes: s.notes.map((n) => (k === 0 ? noteOf(n) : { pitch: move(n.pitch!), like: n })),
    ...(i === 0 && words ? { words } : {}),
  }));
}

/**
 * The whole hand shape walked by semitones around the note it turns on: the figure, then moved up
 * one key at a time, back to the written figure, down one key at a time, and back. Every note
 * moves, so the hand keeps its shape and fingering; with safety on, a step whose stretch on the
 * keys (black and white keys differ) passes the comfortable span ends the walk that way.
 */
function shapeWalk(passage: Passage, hand: Hand, figure: Sonority[], pivot: Pitch, opts: PivotWalkOptions, ctx: DrillContext): Drill | null {
  const pitches = figure.flatMap((s) => s.notes.map((n) => n.pitch!));
  const warnings: DrillWarning[] = [];
  const slots: Slot[] = [...movedFigure(figure, 0)];
  let moved = 0;
  for (const dir of [1, -1] as const) {
    let steps = 0;
    for (let k = 1; k <= opts.maxSteps; k++) {
      const midis = pitches.map((p) => p.midi + dir * k);
      if (midis.some((m) => m < PIANO_RANGE.low || m > PIANO_RANGE.high)) break;
      const over = pitchSpan(midis.map((midi) => ({ ...pitches[0]!, midi })), ctx.profile).overComfortable;
      if (over && ctx.safety) break;
      if (over) warnings.push({ code: "span", message: `Moved ${k} ${k === 1 ? "key" : "keys"} ${dir > 0 ? "up" : "down"}, the shape is wider than the comfortable span.` });
      slots.push(...movedFigure(figure, dir * k, k === 1 ? (dir > 0 ? "up by semitones" : "down by semitones") : undefined));
      steps++;
    }
    if (steps) slots.push(...movedFigure(figure, 0, "as written"));
    moved += steps;
  }
  if (moved === 0) return null;
  const name = pitchName(pivot);
  return buildDrill(
    passage,
    {
      family: "pivot-walk",
      variant: "pivot",
      title: `Hand shape walked by semitones around ${name}`,
      teacherNote: "Moving the whole hand shape one key at a time, up and back, keeps the turn around the pivot note the same while the hand meets new black and white keys.",
      studentNote: `Play the figure, then each version one key higher, back to the written figure, then one key lower; keep the fingering and turn the hand loosely around ${name}.`,
      hands: hand,
      segments: [{ [hand]: slots }],
      warnings,
    },
    ctx,
  );
}

/** Groups cut at the onsets where a new hand position starts. */
function withinPositions(groups: readonly Sonority[][], starts: ReadonlySet<number>): Sonority[][] {
  const out: Sonority[][] = [];
  for (const g of groups) {
    let cur: Sonority[] = [];
    for (const s of g) {
      if (cur.length && starts.has(s.onset.valueOf())) { out.push(cur); cur = []; }
      cur.push(s);
    }
    if (cur.length) out.push(cur);
  }
  return out;
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
    // A figure is one the hand plays without moving: groups are cut where a new hand position starts.
    const starts = new Set(handPositions(passage, hand, ctx.profile, ctx.fingeringMemo).map((p) => p.onset.valueOf()));
    const found = [options.groupBy, "bar", "half-bar"]
      .map((by) => findPivot(withinPositions(groupSonorities(passage, hand, by as PivotWalkOptions["groupBy"], ctx.profile), starts)))
      .find((f) => f !== null);
    if (!found) continue;
    const figure = found.figure.slice(0, 8);
    const pivot = shapeWalk(passage, hand, figure, found.pivot, options, ctx);
    if (pivot) drills.push(pivot);
    const pitches = figure.flatMap((s) => s.notes.map((n) => n.pitch!)).sort((a, b) => a.midi - b.midi);
    const outer = hand === "right" ? pitches[pitches.length - 1] : pitches[0];
    const inward = walkDrill(passage, hand, figure, outer, [hand === "right" ? -1 : 1], options, ctx);
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
