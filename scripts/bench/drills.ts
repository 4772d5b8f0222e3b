/**
 * Benchmark: every drill family on an 8-bar two-hand passage of a demo piece, in-process.
 * Goal (issue 4): median ≤ 20 ms.
 */
import fs from "node:fs";
import path from "node:path";
import { performance } from "node:perf_hooks";
import { families, generateDrills } from "../../lib/drills/index";
import { readScore, selectPassage } from "../../lib/score/index";

export interface BenchResult {
  readonly name: string;
  readonly value: number;
  readonly unit: string;
  readonly goal: string;
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;

export async function run(): Promise<BenchResult[]> {
  const xml = fs.readFileSync(path.resolve(__dirname, "../../fixtures/pieces/lantern-waltz.musicxml"), "utf8");
  const { score } = readScore(xml);
  const passage = selectPassage(score, { part: score.parts[0]!.id, hand: "both", from: 0, to: 7 });
  let drills = 0;
  for (let i = 0; i < 3; i++) generateDrills(passage, { seed: i + 1 }); // warm-up
  const times: number[] = [];
  for (let i = 0; i < 15; i++) {
    const t = performance.now();
    drills = generateDrills(passage, { seed: i + 1 }).drills.length;
    times.push(performance.now() - t);
  }
  const ms = median(times);
  const n = Object.keys(families).length;
  return [
    { name: `drills: all ${n} families, 8 bars, both hands (median of 15)`, value: Math.round(ms * 10) / 10, unit: "ms", goal: `≤ 20 ms ${ms <= 20 ? "✓" : "✗"}` },
    { name: "drills: drills generated per run", value: drills, unit: "drills", goal: "information" },
  ];
}
