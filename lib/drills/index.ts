/**
 * The drill library: the registry of drill families, one call that runs them on a passage, and
 * suggestions from a knot's problem tags. Also re-exports the fingering and hand models.
 */
import type { Passage } from "../score/types";
import type { Drill, DrillFamily, HandProfile } from "./types";
import { makeContext } from "./build";
import { barCap, capDrill } from "./length";
import { newFingeringMemo } from "./span";
import { withEndings, type Endings } from "./groups-option";
import { withOctaveLines } from "./octave-lines";
import { blocking } from "./families/blocking";
import { chaining } from "./families/chaining";
import { octaveDoubling } from "./families/octave-doubling";
import { ornaments } from "./families/ornaments";
import { doubles } from "./families/doubles";
import { heldTone } from "./families/held-tone";
import { liftRests } from "./families/lift-rests";
import { notePairs } from "./families/note-pairs";
import { octaveShift } from "./families/octave-shift";
import { pivotWalk } from "./families/pivot-walk";
import { rhythmVariants } from "./families/rhythm-variants";
import { scaleRhythm } from "./families/scale-rhythm";
import { sequence } from "./families/sequence";
import { stops } from "./families/stops";
import { tempoLadder } from "./families/tempo-ladder";
import { thumbPairs } from "./families/thumb-pairs";
import { voiceIsolation } from "./families/voice-isolation";

export type { Drill, DrillContext, DrillFamily, DrillWarning, FamilyResult, HandProfile, ProblemTag, SpanReport } from "./types";
export { PROBLEM_TAGS } from "./types";
export { suggestFamilies, SUGGESTIONS } from "./suggest";
export { mulberry32 } from "./rng";
export { makeContext } from "./build";
export { estimateFingering } from "./fingering";
export { DEFAULT_PROFILE, keyDistanceMm, profileFromInches, spanOf } from "./hand";
export { difficultyMap, hardestBars } from "./difficulty";
export { applyLightEndings, ENDINGS, lightEndingsOption, withEndings, type Endings } from "./groups-option";
export { barCap, capDrill, countOf, shownLabel } from "./length";

/**
 * Every drill family by id, in the order a teacher sees them.
 *
 * @example
 * families["blocking"].options.parse({}); // the default options
 */
export const families: Readonly<Record<string, DrillFamily>> = Object.fromEntries(
  (
    [
      blocking, notePairs, rhythmVariants, stops, liftRests, scaleRhythm, pivotWalk,
      voiceIsolation, doubles, octaveShift, heldTone, sequence, thumbPairs, tempoLadder,
      chaining, octaveDoubling, ornaments,
    ] as DrillFamily[]
  ).map((f) => [f.id, f]),
);

export interface GenerateOptions {
  /** Family ids to run; default all. */
  readonly families?: readonly string[];
  /** Options per family id (raw input, validated by each family's schema). */
  readonly options?: Readonly<Record<string, unknown>>;
  readonly profile?: HandProfile;
  readonly seed?: number;
  /** Keep generators that move notes inside the profile (default true). */
  readonly safety?: boolean;
  /** Most bars a drill may have (default the larger of 8 and twice the passage). */
  readonly maxBars?: number;
  /** End each group lightly: a long note after shorter ones is cut short and lifted (default false). */
  readonly lightEndings?: boolean;
  /**
   * Group endings: "written" (default), "short" (as `lightEndings`), or "short-and-long": each drill
   * with long endings twice, short and light first, then long as written for contrast.
   */
  readonly endings?: Endings;
}

export interface GenerateResult {
  readonly drills: Drill[];
  /** Families that wrote nothing for this passage, and why. */
  readonly skipped: { readonly family: string; readonly reason: string }[];
}

/** A readable reason from whatever a family threw. */
function reasonOf(error: unknown): string {
  const message = error instanceof Error ? error.message : String(error);
  return message.trim() || "an unexpected error";
}

function hashId(id: string): number {
  let h = 2166136261;
  for (const ch of id) h = Math.imul(h ^ ch.charCodeAt(0), 16777619);
  return h >>> 0;
}

/**
 * Run the chosen families (default: all) on a passage. Returns the drills and, rather than
 * failing, a `skipped` list naming each family that does not apply and why; a family that throws is
 * skipped with the error's message as the reason, and the others still generate. Each family draws
 * from its own random source derived from `seed`, so adding a family never changes the others.
 * Invalid options throw the schema's `ZodError`.
 *
 * @example
 * const { drills, skipped } = generateDrills(passage, { families: ["blocking"], seed: 3 });
 * generateDrills(passage, { families: ["stops"], lightEndings: true }); // groups end short and light
 * generateDrills(passage, { families: ["stops"], endings: "short-and-long" }); // short, then long as contrast
 */
export function generateDrills(passage: Passage, opts: GenerateOptions = {}): GenerateResult {
  const ids = opts.families ?? Object.keys(families);
  const drills: Drill[] = [];
  const skipped: { family: string; reason: string }[] = [];
  const fingeringMemo = newFingeringMemo();
  for (const id of ids) {
    const family = families[id];
    if (!family) {
      skipped.push({ family: id, reason: "There is no drill family with this name." });
      continue;
    }
    const options = family.options.parse(opts.options?.[id] ?? {});
    const ctx = makeContext({ profile: opts.profile, seed: ((opts.seed ?? 1) ^ hashId(id)) >>> 0, safety: opts.safety, fingeringMemo, maxBars: opts.maxBars });
    let result: ReturnType<DrillFamily["generate"]>;
    let written: Drill[];
    try {
      result = family.generate(passage, options, ctx);
      const cap = barCap(passage, ctx);
      written = withEndings(result.drills, opts.endings ?? (opts.lightEndings ? "short" : "written")).map((d) => withOctaveLines(capDrill(d, cap)));
    } catch (error) {
      // A family that cannot write something in this passage is skipped; the others still generate.
      skipped.push({ family: id, reason: `This drill could not be written for these bars: ${reasonOf(error)}` });
      continue;
    }
    drills.push(...written);
    if (result.drills.length === 0) skipped.push({ family: id, reason: result.skipped ?? "No drill of this family fits the passage." });
  }
  return { drills, skipped };
}
