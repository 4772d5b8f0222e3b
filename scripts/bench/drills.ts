/**
 * Benchmark: every drill family on an 8-bar two-hand passage of a demo piece (goal: median ≤ 20 ms).
 */
import fs from "node:fs";
import path from "node:path";
import { generateDrills } from "../../lib/drills";
import { readScore, selectPassage } from "../../lib/score";

const ROUNDS = 30;
/** A server generates drills all day: measure warm code, not the first calls through the JIT. */
const WARM_UP = 20;

export async function run(): Promise<{ name: string; value: number; unit: string; goal: string }[]> {
  const xml = fs.readFileSync(path.resolve(__dirname, "../../fixtures/pieces/pebble-study.musicxml"), "utf8");
  const { score } = readScore(xml);
  const passage = selectPassage(score, { hand: "both", from: 0, to: 7 });
  for (let i = 0; i < WARM_UP; i++) generateDrills(passage, { seed: 1000 + i });
  const times: number[] = [];
  let count = 0;
  for (let i = 0; i < ROUNDS; i++) {
    const t0 = performance.now();
    count = generateDrills(passage, { seed: i }).drills.length;
    times.push(performance.now() - t0);
  }
  times.sort((a, b) => a - b);
  const median = times[Math.floor(times.length / 2)];
  return [
    { name: `all drill families, 8 bars, two hands (${count} drills)`, value: Math.round(median * 10) / 10, unit: "ms (median)", goal: "≤ 20 ms" },
  ];
}
