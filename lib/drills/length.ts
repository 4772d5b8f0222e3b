/**
 * Drill length and wording shared by every family: the bar cap (a drill practises one idea in a
 * few bars — at most 8, or twice the passage, whichever is larger; DRILL-RUBRIC "Short", common
 * practice), the first of several candidate drills that fits it, a last-resort cut that says what
 * it left out, and numbers that agree in grammar ("1 step", "2 steps").
 */
import type { Measure, NoteEvent, Passage } from "../score/types";
import type { Drill, DrillContext } from "./types";

/** Default cap in bars for a short passage (DRILL-RUBRIC "Short": at most 8 bars, common practice). */
export const DEFAULT_MAX_BARS = 8;

/**
 * The most bars a drill of this passage may have: the context's override, else the larger of 8
 * and twice the passage's bar count.
 *
 * @example
 * barCap(twoBarPassage); // 8
 * barCap(sixBarPassage); // 12
 */
export function barCap(passage: Passage, ctx?: Pick<DrillContext, "maxBars">): number {
  if (ctx?.maxBars !== undefined) return ctx.maxBars;
  const bars = Math.max(1, passage.to - passage.from + 1);
  return Math.max(DEFAULT_MAX_BARS, 2 * bars);
}

/** Number of bars a drill writes. */
export function drillBars(d: Drill): number {
  return d.score.measures.length;
}

/**
 * The first candidate whose drill fits the cap (candidates from the fullest to the shortest);
 * the last one when none fits. Candidates are built lazily, so the full version costs nothing
 * more when it already fits.
 *
 * @example
 * firstWithin(8, [() => twoOctaves(), () => oneOctave()]);
 */
export function firstWithin(cap: number, candidates: readonly (() => Drill)[]): Drill {
  let last: Drill | undefined;
  for (const make of candidates) {
    last = make();
    if (drillBars(last) <= cap) return last;
  }
  if (!last) throw new RangeError("firstWithin needs at least one candidate");
  return last;
}

/**
 * "n of N shown" for a family that writes only the first variants.
 *
 * @example
 * shownLabel(3, 12); // "3 of 12 shown"
 */
export function shownLabel(shown: number, total: number): string {
  return `${shown} of ${total} shown`;
}

/**
 * A count with its noun in the right number ("1 step", "2 steps"); `plural` for irregular nouns.
 *
 * @example
 * countOf(1, "scale step"); // "1 scale step"
 * countOf(3, "octave"); // "3 octaves"
 */
export function countOf(n: number, noun: string, plural = `${noun}s`): string {
  return `${n} ${n === 1 ? noun : plural}`;
}

/** The tie flag of a note whose continuation after the cut is gone. */
function cutTie(e: NoteEvent): NoteEvent["tie"] {
  if (e.tie === "start") return "none";
  if (e.tie === "continue") return "stop";
  return e.tie;
}

/**
 * A drill cut to its first `cap` bars (ties into the cut bars closed), its title saying how much
 * is shown ("first 8 of 14 bars shown"), when it is longer than `cap`; else the drill unchanged.
 * The last resort for a family that cannot shorten its own content.
 *
 * @example
 * capDrill(drill, 8).score.measures.length <= 8; // true
 */
export function capDrill(d: Drill, cap: number): Drill {
  const bars = drillBars(d);
  if (bars <= cap || cap < 1) return d;
  const measures: Measure[] = d.score.measures.slice(0, cap);
  const events: NoteEvent[] = [];
  for (const e of d.score.events) {
    if (e.measure >= cap) continue;
    events.push(e.measure === cap - 1 && (e.tie === "start" || e.tie === "continue") ? { ...e, tie: cutTie(e) } : e);
  }
  const kept = new Set(events.map((e) => e.id));
  const fingeringSource = Object.fromEntries(Object.entries(d.fingeringSource).filter(([id]) => kept.has(id)));
  const title = `${d.title} (first ${cap} of ${bars} bars shown)`;
  return {
    ...d,
    title,
    score: { ...d.score, meta: { ...d.score.meta, title }, measures, events },
    fingeringSource,
  };
}
