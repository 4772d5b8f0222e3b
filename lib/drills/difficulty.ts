/**
 * Difficulty map of a whole piece: per bar and hand, the fingering model's rule points and the widest
 * stretch, each turned into a 0–1 score and combined; plus the hardest bars with plain-word reasons.
 */
import { pianoPart } from "../score/parts";
import type { Hand, Score } from "../score/types";
import type { FingeringModel } from "./fingering-rules";
import { barFacts, handsOf, intervalName, type BarFacts } from "./difficulty-bars";
import { DEFAULT_PROFILE, spanLimits } from "./hand";
import type { HandProfile } from "./types";

export interface DifficultyOptions {
  readonly profile?: HandProfile;
  readonly model?: FingeringModel;
}

/**
 * Rule points at which a bar's cost score reaches 1 − 1/e ≈ 0.63. A one-octave scale in eighths costs
 * about 10 points under Parncutt et al. (1997), so a bar of plain scale work stays near 0.25.
 */
export const COST_SCALE = 40;

/** Cost score: saturates smoothly, 0 for a bar with no points. */
const costScore = (cost: number): number => 1 - Math.exp(-Math.max(0, cost) / COST_SCALE);

/**
 * Stretch score against the profile: 0 up to half the comfortable span, 0.5 at the comfortable span,
 * 1 at the practical limit (hand.ts) and beyond.
 */
function spanScore(mm: number, profile: HandProfile): number {
  const { comfortable, practical } = spanLimits(profile);
  if (mm <= comfortable / 2) return 0;
  if (mm <= comfortable) return (0.5 * (mm - comfortable / 2)) / (comfortable / 2);
  return Math.min(1, 0.5 + (0.5 * (mm - comfortable)) / (practical - comfortable));
}

/** Either a costly bar or a wide stretch makes a bar hard: 1 − (1 − cost)(1 − span). */
const combine = (f: BarFacts, profile: HandProfile): number =>
  1 - (1 - costScore(f.cost)) * (1 - spanScore(f.span?.mm ?? 0, profile));

type Analysis = Record<Hand, BarFacts[][]>;

function analyse(score: Score, options: DifficultyOptions): Analysis {
  const profile = options.profile ?? DEFAULT_PROFILE;
  const model = options.model ?? "parncutt";
  const bars = score.measures.length;
  const out: Analysis = { right: [], left: [] };
  // Only the piano's staves are hands: a song's voice part never counts (lib/score/parts).
  const piano = pianoPart(score);
  for (const [part, hands] of handsOf(score)) {
    if (piano && part !== piano.id) continue;
    for (const hand of ["right", "left"] as const) {
      if (hands[hand].length > 0) out[hand].push(barFacts(hands[hand], hand, bars, profile.octaveMm, model, (m) => score.measures[m]?.key));
    }
  }
  return out;
}

function scores(parts: BarFacts[][], bars: number, profile: HandProfile): number[] {
  return Array.from({ length: bars }, (_, i) => Math.max(0, ...parts.map((p) => combine(p[i]!, profile))));
}

/**
 * Difficulty per bar (0–1) for each hand of the piano part (found by staves and name, so a song's voice
 * part never counts); bars where a hand has no notes score 0. When no part looks like a piano, each bar
 * takes the hardest part.
 *
 * @example
 * difficultyMap(score).right[3] // e.g. 0.42
 */
export function difficultyMap(score: Score, options: DifficultyOptions = {}): { right: number[]; left: number[] } {
  const profile = options.profile ?? DEFAULT_PROFILE;
  const a = analyse(score, options);
  const bars = score.measures.length;
  return { right: scores(a.right, bars, profile), left: scores(a.left, bars, profile) };
}

export interface HardBar {
  /** 0-based measure index. */
  readonly measure: number;
  /** Printed bar number. */
  readonly number: string;
  readonly hand: Hand;
  readonly score: number;
  readonly reasons: string[];
}

/** Plain-word reasons for one bar, strongest first. */
function reasonsFor(f: BarFacts, profile: HandProfile): string[] {
  const out: { weight: number; text: string }[] = [];
  const r = f.rules;
  if (f.span && (f.span.semitones >= 12 || f.span.mm > spanLimits(profile).comfortable)) {
    out.push({ weight: 100, text: `stretch of ${intervalName(f.span.low, f.span.high)} (${Math.round(f.span.mm)} mm)` });
  }
  if (r && r.positionChangeCount >= 2) out.push({ weight: r.positionChangeCount + r.positionChangeSize / 4, text: "many position changes" });
  if (f.weakRepeats >= 2) out.push({ weight: f.weakRepeats, text: "weak fingers 4–5 on repeated notes" });
  if (r && r.thumbOnBlack >= 1) out.push({ weight: r.thumbOnBlack / 2, text: "thumb on black keys" });
  if (r && r.fiveOnBlack >= 2) out.push({ weight: r.fiveOnBlack / 2, text: "little finger on black keys" });
  if (r && r.thumbPassing >= 2) out.push({ weight: r.thumbPassing / 2, text: "thumb passes under the hand" });
  if (r && r.threeToFour + r.fourOnBlack >= 2) out.push({ weight: (r.threeToFour + r.fourOnBlack) / 2, text: "fingers 3 and 4 in awkward succession" });
  const stretchNamed = out.length > 0 && out[0]!.weight === 100;
  if (r && !stretchNamed && r.stretch + r.largeSpan >= 8) out.push({ weight: (r.stretch + r.largeSpan) / 4, text: "wide leaps between notes" });
  if (out.length === 0) out.push({ weight: 0, text: f.notes >= 12 ? `many notes (${f.notes})` : "awkward fingering" });
  return out.sort((a, b) => b.weight - a.weight).map((x) => x.text);
}

/**
 * The `n` hardest (bar, hand) pairs of the piano part (as `difficultyMap`), hardest first, with reasons in plain words
 * ("stretch of a tenth (212 mm)", "many position changes", "thumb on black keys" …).
 *
 * @example
 * hardestBars(score, 3)[0] // { measure: 11, number: "12", hand: "left", score: 0.81, reasons: [...] }
 */
export function hardestBars(score: Score, n: number, options: DifficultyOptions = {}): HardBar[] {
  const profile = options.profile ?? DEFAULT_PROFILE;
  const a = analyse(score, options);
  const all: HardBar[] = [];
  for (const hand of ["right", "left"] as const) {
    score.measures.forEach((m, i) => {
      let best: BarFacts | null = null;
      let value = 0;
      for (const part of a[hand]) {
        const v = combine(part[i]!, profile);
        if (!best || v > value) { best = part[i]!; value = v; }
      }
      if (best && value > 0) all.push({ measure: i, number: m.number, hand, score: value, reasons: reasonsFor(best, profile) });
    });
  }
  return all.sort((x, y) => y.score - x.score || x.measure - y.measure).slice(0, Math.max(0, n));
}
