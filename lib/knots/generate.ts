/**
 * Drills for a stored knot: cut the knot's bars out of the piece's cleaned copy, run the chosen
 * families with the hand profile, and turn each drill into its browser JSON.
 */
import { DEFAULT_PROFILE, generateDrills, type Drill, type HandProfile } from "../drills/index";
import { drillKeys, toDrillDto, type DrillDto } from "./dto";
import type { GenerateRequest } from "./generate-request";
import { barIndex, selectPassage } from "../score/index";
import type { Passage, Score } from "../score/types";
import { checkGeneratedOutput, checkKnotLength } from "../limits/work";
import { parsedScore } from "./score-cache";
import { writeMusicXML } from "../score/write";

export interface KnotSource {
  musicxml: string;
  part: string;
  hand: "right" | "left" | "both";
  /** Printed bar numbers, as the teacher marked them. */
  fromBar: number;
  toBar: number;
  /** The piece's id and last change: when both are given, its parsed copy is reused across requests. */
  scoreId?: string;
  scoreUpdatedAt?: Date;
}

/** The piece parsed from the stored copy (cached per piece id and change stamp when known). */
function sourceScore(src: KnotSource): Score {
  return parsedScore(src.musicxml, src.scoreId && src.scoreUpdatedAt ? { id: src.scoreId, updatedAt: src.scoreUpdatedAt } : undefined);
}

/** Printed bar number → measure index (falls back to counting from 1 when the number is not printed). */
function indexOf(score: Parameters<typeof barIndex>[0], bar: number): number {
  return barIndex(score, bar) ?? Math.max(0, Math.min(score.measures.length - 1, bar - 1));
}

/** The knot's passage from the stored cleaned copy. */
export function knotPassage(src: KnotSource): Passage {
  return passageOf(sourceScore(src), src);
}

/** The knot's bars of an already parsed piece. */
export function passageOf(score: Score, src: Pick<KnotSource, "part" | "hand" | "fromBar" | "toBar">): Passage {
  const from = indexOf(score, src.fromBar);
  const to = Math.max(from, indexOf(score, src.toBar));
  return selectPassage(score, { part: src.part, hand: src.hand, from, to });
}

export interface KnotDrills {
  drills: { drill: Drill; key: string }[];
  skipped: { family: string; reason: string }[];
  /** The hand profile the spans were measured for (the default hand when the request named none). */
  profile?: HandProfile;
}

/** Run the request on the knot; the same request always gives the same drills (fixed seed). */
export function generateForKnot(src: KnotSource, req: GenerateRequest, profile?: HandProfile): KnotDrills {
  return generateForPassage(knotPassage(src), req, profile);
}

/**
 * The request run on a passage already cut out of its piece. Throws WorkLimitError (lib/limits/work)
 * when the knot is longer than a knot may be or the drills would be more than one request may make.
 */
export function generateForPassage(passage: Passage, req: GenerateRequest, profile?: HandProfile): KnotDrills {
  checkKnotLength(passage.measures.length);
  const result = generateDrills(passage, { families: req.families, options: req.options, profile, seed: req.seed ?? 1 });
  checkGeneratedOutput(result.drills);
  const keys = drillKeys(result.drills);
  return { drills: result.drills.map((drill, i) => ({ drill, key: keys[i] })), skipped: result.skipped, profile: profile ?? DEFAULT_PROFILE };
}

/** The generate handler's JSON body. */
export function knotDrillsJson(out: KnotDrills): { drills: DrillDto[]; skipped: KnotDrills["skipped"] } {
  return { drills: out.drills.map(({ drill, key }) => toDrillDto(drill, key)), skipped: out.skipped };
}

/** The knot's bars (all staves of its part) as a small MusicXML score for engraving. */
export function knotExcerpt(src: KnotSource): string {
  const score = sourceScore(src);
  const from = indexOf(score, src.fromBar);
  const to = Math.max(from, indexOf(score, src.toBar));
  const part = score.parts.find((p) => p.id === src.part) ?? score.parts[0];
  const offset = score.measures[from].start;
  const measures = score.measures.slice(from, to + 1).map((m, i) => ({ ...m, index: i, start: m.start.sub(offset) }));
  const events = score.events
    .filter((e) => e.part === part.id && e.measure >= from && e.measure <= to)
    .map((e) => ({ ...e, measure: e.measure - from, onset: e.onset.sub(offset) }));
  return writeMusicXML({ ...score, parts: [part], measures, events });
}
