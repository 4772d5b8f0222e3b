/**
 * Benchmark: the fingering estimator on the real-score corpus (fixtures/reference/scores).
 * Agreement with the printed fingerings of the four `fingered-*` files, per file and overall, under the
 * two protocols of lib/drills/fingering-agreement.ts; the estimator's speed per 100 notes over all 12
 * scores; and how many estimated fingerings break the playability rules of DRILL-RUBRIC §4.
 */
import fs from "node:fs";
import path from "node:path";
import { performance } from "node:perf_hooks";
import { readScore } from "../../lib/score/read";
import type { Score } from "../../lib/score/types";
import { handsOf } from "../../lib/drills/difficulty-bars";
import { estimateFingering } from "../../lib/drills/fingering";
import { fingeringAgreement } from "../../lib/drills/fingering-agreement";
import { playabilityFaults } from "../../lib/drills/fingering-playability";

export interface BenchResult {
  readonly name: string;
  readonly value: number;
  readonly unit: string;
  readonly goal: string;
}

const dir = path.resolve(__dirname, "../../fixtures/reference/scores");
const pct = (a: number, b: number): number => Math.round((1000 * a) / b) / 10;

function hands(score: Score) {
  return [...handsOf(score).values()].flatMap((h) => (["right", "left"] as const).map((hand) => ({ hand, events: h[hand] })));
}

/**
 * Agreement per file and overall, speed per 100 notes, §4 faults.
 *
 * @example
 * const rows = await run(); // rows[0].value: leave-one-out agreement of the first fingered file, in %
 */
export async function run(): Promise<BenchResult[]> {
  const files = fs.readdirSync(dir).filter((f) => f.endsWith(".mxl")).sort();
  const scores = files.map((f) => ({ f, score: readScore(new Uint8Array(fs.readFileSync(path.join(dir, f)))).score }));
  const rows: BenchResult[] = [];
  for (const protocol of ["leave-one-out", "hidden"] as const) {
    let agreed = 0, total = 0;
    for (const { f, score } of scores.filter((s) => s.f.startsWith("fingered-"))) {
      const a = fingeringAgreement(score, { protocol });
      agreed += a.agreed; total += a.total;
      rows.push({ name: `fingering agreement (${protocol}), ${f.replace(/\.mxl$/, "")}`, value: pct(a.agreed, a.total), unit: `% of ${a.total}`, goal: "-" });
    }
    rows.push({ name: `fingering agreement (${protocol}), overall`, value: pct(agreed, total), unit: `% of ${total}`, goal: protocol === "leave-one-out" ? ">= 80" : "-" });
  }
  const work = scores.flatMap(({ score }) => hands(score).map((h) => ({ ...h, keyOf: (m: number) => score.measures[m]?.key })));
  const notes = work.reduce((a, w) => a + w.events.filter((e) => e.pitch).length, 0);
  for (const w of work) estimateFingering(w.events, w.hand, { costs: false, keyOf: w.keyOf }); // warm-up
  const times: number[] = [];
  let faults = 0;
  for (let r = 0; r < 3; r++) {
    const t0 = performance.now();
    const results = work.map((w) => estimateFingering(w.events, w.hand, { costs: false, keyOf: w.keyOf }).fingers);
    times.push(performance.now() - t0);
    if (r === 0) work.forEach((w, k) => { faults += playabilityFaults(w.events, results[k]!, w.events.map((e) => !e.fingering?.length), w.hand).length; });
  }
  times.sort((a, b) => a - b);
  rows.push({ name: `fingering estimate speed, 12 corpus scores (${notes} notes)`, value: Math.round((times[1]! / notes) * 100 * 100) / 100, unit: "ms per 100 notes", goal: "-" });
  rows.push({ name: "estimated fingerings breaking DRILL-RUBRIC §4 (12 corpus scores)", value: faults, unit: "faults", goal: "-" });
  return rows;
}

if (process.argv[1] && /bench[\\/]fingering-agreement\.ts$/.test(process.argv[1])) {
  void run().then((rows) => rows.forEach((r) => console.log(`${r.name}: ${r.value} ${r.unit} (goal ${r.goal})`)));
}
