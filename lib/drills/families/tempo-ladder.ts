/**
 * Tempo ladder: the passage repeated with metronome marks rising from a start tempo to the
 * target, so speed is built in small, secure steps.
 */
import { z } from "zod";
import type { Passage } from "../../score/types";
import type { DrillContext, DrillFamily, FamilyResult } from "../types";
import { buildDrill, defaultTempo, leadOf, passageHands, passageSlots } from "../build";
import { barCap } from "../length";
import { beatUnit, inBeats } from "../meter";

export const tempoLadderOptions = z
  .object({
    startPercent: z.number().int().min(20).max(100).default(60),
    endPercent: z.number().int().min(20).max(150).default(100),
    stepPercent: z.number().int().min(1).max(50).default(10),
    /** Target tempo (quarter notes per minute, whatever the meter); default the score's mark. */
    target: z.number().int().min(20).max(300).optional(),
  })
  .refine((o) => o.startPercent <= o.endPercent, { message: "The start must not be above the end." });
export type TempoLadderOptions = z.output<typeof tempoLadderOptions>;

/**
 * The metronome marks of a ladder: start % to end % of the target in steps, the end always included.
 *
 * @example
 * ladderTempos(100, 60, 100, 10); // [60, 70, 80, 90, 100]
 */
export function ladderTempos(target: number, start: number, end: number, step: number): number[] {
  const out: number[] = [];
  for (let p = start; p < end; p += step) out.push(Math.round((target * p) / 100));
  out.push(Math.round((target * end) / 100));
  return [...new Set(out)].slice(-16);
}

/**
 * `k` rungs spread evenly over a ladder, the first and last always kept.
 *
 * @example
 * spreadRungs([60, 70, 80, 90, 100], 3); // [60, 80, 100]
 */
export function spreadRungs(rungs: readonly number[], k: number): number[] {
  if (k >= rungs.length) return [...rungs];
  if (k <= 1) return [rungs[rungs.length - 1]];
  return [...new Set(Array.from({ length: k }, (_, i) => rungs[Math.round((i * (rungs.length - 1)) / (k - 1))]))];
}

/**
 * One drill: the passage once per rung, each repetition starting a new bar with its metronome mark.
 * When all rungs would pass the bar cap, evenly spread rungs are written ("4 of 5 steps shown") and
 * the instruction lists every mark; marks are given in the meter's beat (♩. in 6/8).
 *
 * @example
 * tempoLadder.generate(passage, tempoLadderOptions.parse({ target: 120 }), makeContext()).drills[0].score.measures[0].tempo; // 72
 */
export function generateTempoLadder(passage: Passage, options: TempoLadderOptions, ctx: DrillContext): FamilyResult {
  const hands = passageHands(passage);
  if (hands.every((h) => passage.sonorities[h].length === 0)) return { drills: [], skipped: "The passage has no notes." };
  const target = options.target ?? defaultTempo(passage).target;
  const all = ladderTempos(target, options.startPercent, options.endPercent, options.stepPercent);
  const perRung = Math.max(1, passage.measures.length);
  const rungs = spreadRungs(all, Math.max(2, Math.floor(barCap(passage, ctx) / perRung)));
  const slots = Object.fromEntries(hands.map((h) => [h, passageSlots(passage, h)]));
  const unit = beatUnit(passage.time).symbol;
  const marks = (list: readonly number[]) => list.map((t) => inBeats(t, passage.time)).join(", ");
  const shown = rungs.length < all.length ? ` (${rungs.length} of ${all.length} steps shown)` : "";
  const plan = rungs.length < all.length ? ` The whole plan, ${unit} = ${marks(all)}: practise the steps between the written ones the same way.` : "";
  const drill = buildDrill(
    passage,
    {
      family: "tempo-ladder",
      variant: `${options.startPercent}-${options.endPercent}`,
      title: `Tempo ladder ${unit} = ${inBeats(rungs[0], passage.time)} → ${inBeats(rungs[rungs.length - 1], passage.time)}${shown}`,
      teacherNote: "Small tempo steps keep the passage secure while it gets faster; the student moves up only when a step feels easy.",
      studentNote: `Play each repetition at its metronome mark. Move to the next only after two clean, relaxed times.${plan}`,
      segments: rungs.map((tempo) => ({ ...slots, lead: leadOf(passage), tempo })),
      tempo: { start: rungs[0], target: rungs[rungs.length - 1] },
    },
    ctx,
  );
  return { drills: [drill] };
}

export const tempoLadder: DrillFamily<typeof tempoLadderOptions> = {
  id: "tempo-ladder",
  label: "Tempo ladder",
  describe: "The passage repeated with metronome marks from a slow start up to the target tempo.",
  options: tempoLadderOptions,
  generate: generateTempoLadder,
};
