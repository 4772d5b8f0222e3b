/**
 * Shared shapes of the drill library: every family has the same signature and returns `Drill`s.
 * Types that several modules of lib/drills need live here; this file imports nothing from lib/drills,
 * so it can never close an import circle (import-cycles.test.ts checks the whole folder).
 */
import type { z } from "zod";
import type { Hand, Passage, Score } from "../score/types";

/**
 * Fingering work shared by the drills of one `generateDrills` call: the passage's own estimate per
 * hand (by passage object) and finished estimates per hand and note sequence (span.ts fills it).
 */
export interface FingeringMemo {
  readonly passage: WeakMap<Passage, Map<Hand, ReadonlyMap<string, number>>>;
  readonly sequences: Map<string, readonly (number | null)[]>;
}

/** Problem tags a teacher puts on a knot (trade words). */
export const PROBLEM_TAGS = [
  "rhythm",
  "evenness",
  "rotation",
  "lateral move",
  "release",
  "leap",
  "voicing",
  "stretch",
  "coordination",
] as const;
export type ProblemTag = (typeof PROBLEM_TAGS)[number];

/** A student's hand: comfortable 1–5 span and the keyboard's octave width. */
export interface HandProfile {
  /** Comfortable span from thumb to little finger, in millimetres. */
  readonly spanMm: number;
  /** Octave width of the keyboard played on, in millimetres (standard 165.1). */
  readonly octaveMm: number;
}

/** The widest stretch one hand needs in a drill. */
export interface SpanReport {
  readonly semitones: number;
  readonly mm: number;
  /** Over the profile's comfortable span. */
  readonly overComfortable: boolean;
  /** Over the practical limit (comfortable span plus the allowance in hand.ts). */
  readonly overPractical: boolean;
}

export interface DrillWarning {
  readonly code: "span" | "range" | "repetition" | "estimated-fingering" | string;
  readonly message: string;
}

export interface Drill {
  /** Family id, e.g. "blocking". */
  readonly family: string;
  /** Variant id within the family, e.g. "block-then-tap". */
  readonly variant: string;
  readonly title: string;
  /** Why a teacher would give this drill (short, plain words). */
  readonly teacherNote: string;
  /** How the student practises it (short, plain words). */
  readonly studentNote: string;
  readonly hands: Hand | "both";
  /** A small, complete score, ready for `writeMusicXML`. */
  readonly score: Score;
  /**
   * Quarter-note metronome marks; `beat` gives the same marks in the meter's beat when that is not
   * a quarter (a dotted quarter in 6/8: quarter 90 is "♩. = 60").
   */
  readonly tempo: {
    readonly start: number;
    readonly target: number;
    readonly beat?: { readonly symbol: string; readonly start: number; readonly target: number };
  };
  readonly maxSpan: { readonly right?: SpanReport; readonly left?: SpanReport };
  readonly warnings: readonly DrillWarning[];
  /**
   * Per event id of `score.events`: where its fingering came from — written in the score, estimated,
   * prescribed by the drill itself (e.g. a scale's standard fingering), or none.
   */
  readonly fingeringSource: Readonly<Record<string, "score" | "estimated" | "drill" | "none">>;
}

/** Seedable random source in [0, 1). */
export type Rng = () => number;

export interface DrillContext {
  readonly profile: HandProfile;
  readonly rng: Rng;
  /** When true (default), generators that move notes stay within the profile's span. */
  readonly safety: boolean;
  /** Fingering estimates shared by the drills of one run (made per context when absent). */
  readonly fingeringMemo?: FingeringMemo;
  /** Most bars a drill may have; default the larger of 8 and twice the passage (see `length.ts`). */
  readonly maxBars?: number;
}

/** What a family returns: its drills, or why it does not apply to this passage. */
export interface FamilyResult {
  readonly drills: readonly Drill[];
  readonly skipped?: string;
}

export interface DrillFamily<O extends z.ZodType = z.ZodType> {
  readonly id: string;
  /** Short label for menus. */
  readonly label: string;
  /** One sentence for the teacher. */
  readonly describe: string;
  /** Options, validated by the same schema in the form and in the server action. */
  readonly options: O;
  readonly generate: (passage: Passage, options: z.output<O>, ctx: DrillContext) => FamilyResult;
}
