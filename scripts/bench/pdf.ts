/**
 * Benchmark: an eight-drill handout (engraving on the server + PDF), from the demo pieces.
 * Goal (issue 7): an 8-drill handout in at most 1.5 s, with the engraver already loaded in the
 * process (the first handout after start-up also pays for loading it; reported on its own row).
 */
import { performance } from "node:perf_hooks";
import { renderHandoutPdf } from "../../lib/handout";
import { eightDrillSheet } from "../../tests/handout/sample-sheet";

export interface BenchResult {
  readonly name: string;
  readonly value: number;
  readonly unit: string;
  readonly goal: string;
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

export async function run(): Promise<BenchResult[]> {
  const sheet = eightDrillSheet("a4");
  let t = performance.now();
  await renderHandoutPdf(sheet);
  const cold = performance.now() - t;
  const times: number[] = [];
  let bytes = 0;
  for (let i = 0; i < 5; i++) {
    t = performance.now();
    bytes = (await renderHandoutPdf({ ...sheet, paper: i % 2 ? "letter" : "a4" })).length;
    times.push(performance.now() - t);
  }
  const warm = median(times);
  return [
    { name: "handout PDF, 8 drills (median of 5)", value: Math.round(warm), unit: "ms", goal: `≤ 1500 ms ${warm <= 1500 ? "✓" : "✗"}` },
    { name: "handout PDF, 8 drills, first after start-up", value: Math.round(cold), unit: "ms", goal: "information" },
    { name: "handout PDF size, 8 drills", value: Math.round(bytes / 1024), unit: "KiB", goal: "information" },
  ];
}
