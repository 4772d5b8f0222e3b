/**
 * Benchmark: fingering plus difficulty map for a generated two-hand piece.
 * Goals (issue 5): 300 bars in at most 1 s; cost linear in length (300 bars ≈ 10 × 30 bars).
 */
import { performance } from "node:perf_hooks";
import { difficultyMap } from "../../lib/drills/difficulty";
import { buildScore, type NoteSpec } from "../../lib/score/test-builders";
import type { Score } from "../../lib/score/types";

export interface BenchResult {
  readonly name: string;
  readonly value: number;
  readonly unit: string;
  readonly goal: string;
}

const NAMES = ["C", "D", "E", "F", "G", "A", "B"];
const note = (step: number): string => `${NAMES[((step % 7) + 7) % 7]}${Math.floor(step / 7)}`;

/** Small seeded generator (linear congruential), so every run times the same piece. */
function lcg(seed: number): () => number {
  let s = seed >>> 0;
  return () => ((s = (s * 1664525 + 1013904223) >>> 0) / 2 ** 32);
}

/**
 * A two-hand piece in 4/4: the right hand in eighths (scale runs, arpeggios, a leap now and then),
 * the left hand alternating broken chords in eighths and block triads in quarters.
 */
export function generatedPiece(bars: number, seed = 7): Score {
  const rnd = lcg(seed);
  const notes: NoteSpec[] = [];
  let top = 30; // staff step of C4 is 28 (4 × 7)
  for (let b = 0; b < bars; b++) {
    const kind = Math.floor(rnd() * 3);
    for (let k = 0; k < 8; k++) {
      if (kind === 0) top += rnd() < 0.5 ? 1 : -1;
      else if (kind === 1) top += k % 4 === 3 ? -6 : 2;
      else top += k === 4 ? (rnd() < 0.5 ? 7 : -7) : rnd() < 0.5 ? 1 : -2;
      top = Math.min(40, Math.max(26, top));
      notes.push({ pitch: note(top), onset: b * 4 + k / 2, duration: 0.5, staff: 1 });
    }
    const root = 14 + Math.floor(rnd() * 7);
    if (b % 2 === 0) {
      [0, 4, 2, 4, 0, 4, 2, 4].forEach((d, k) => notes.push({ pitch: note(root + d), onset: b * 4 + k / 2, duration: 0.5, staff: 2 }));
    } else {
      for (let q = 0; q < 4; q++) for (const d of [0, 2, 4]) notes.push({ pitch: note(root + d), onset: b * 4 + q, duration: 1, staff: 2 });
    }
  }
  return buildScore({ bars, notes });
}

function medianMs(work: () => void, runs: number): number {
  const times: number[] = [];
  for (let i = 0; i < runs; i++) {
    const t0 = performance.now();
    work();
    times.push(performance.now() - t0);
  }
  times.sort((a, b) => a - b);
  return times[Math.floor(times.length / 2)]!;
}

/**
 * Time the fingering estimate and difficulty map for 30 and 300 bars (median of 5 after a warm-up).
 *
 * @example
 * const [time, ratio] = await run(); // time.value in ms, ratio.value ≈ 10
 */
export async function run(): Promise<BenchResult[]> {
  const small = generatedPiece(30);
  const large = generatedPiece(300);
  difficultyMap(small);
  difficultyMap(large);
  const t30 = medianMs(() => difficultyMap(small), 5);
  const t300 = medianMs(() => difficultyMap(large), 5);
  return [
    { name: "fingering + difficulty map, 300 bars, two hands", value: Math.round(t300), unit: "ms", goal: "<= 1000" },
    { name: "fingering + difficulty map, 30 bars, two hands", value: Math.round(t30 * 10) / 10, unit: "ms", goal: "-" },
    { name: "fingering time ratio 300 bars / 30 bars (linear = 10)", value: Math.round((t300 / t30) * 10) / 10, unit: "x", goal: "<= 15" },
  ];
}

if (process.argv[1] && /bench[\\/]fingering\.ts$/.test(process.argv[1])) {
  void run().then((rows) => rows.forEach((r) => console.log(`${r.name}: ${r.value} ${r.unit} (goal ${r.goal})`)));
}
