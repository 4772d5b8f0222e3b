/**
 * The drill scan over the reference corpus: two-bar windows, both hands of the piano part, of every
 * real score (fixtures/reference/scores) and every two-staff file of the MusicXML test suite, each run
 * through `generateDrills` and every drill written with `writeMusicXML` (what the app does next).
 * Shared by tests/drills/corpus-scan.test.ts (a deterministic sample) and scripts/bench/drill-scan.ts (all).
 */
import fs from "node:fs";
import path from "node:path";
import { generateDrills } from "../../lib/drills";
import { readScore, selectPassage, writeMusicXML } from "../../lib/score";
import type { Score } from "../../lib/score/types";

const referenceDir = path.resolve(__dirname, "../../fixtures/reference");

export interface ScanFile {
  readonly name: string;
  readonly score: Score;
  readonly part: string;
}

/** Every corpus file that has a two-staff part, read once. */
export function scanFiles(): ScanFile[] {
  const out: ScanFile[] = [];
  const add = (name: string, full: string) => {
    const { score } = readScore(new Uint8Array(fs.readFileSync(full)));
    const piano = score.parts.find((p) => p.staves === 2);
    if (piano) out.push({ name, score, part: piano.id });
  };
  const scores = path.join(referenceDir, "scores");
  for (const f of fs.readdirSync(scores).filter((f) => f.endsWith(".mxl")).sort()) add(`scores/${f}`, path.join(scores, f));
  const walk = (dir: string) => {
    for (const entry of fs.readdirSync(dir, { withFileTypes: true }).sort((a, b) => a.name.localeCompare(b.name))) {
      const full = path.join(dir, entry.name);
      if (entry.isDirectory() && entry.name !== "schema") walk(full);
      else if (/\.(xml|musicxml|mxl)$/.test(entry.name) && !entry.name.endsWith(".fragment.xml")) {
        add(path.relative(referenceDir, full), full);
      }
    }
  };
  walk(path.join(referenceDir, "musicxml"));
  return out;
}

export interface ScanFailure {
  readonly file: string;
  readonly window: string;
  readonly message: string;
}

export interface ScanResult {
  readonly windows: number;
  readonly drills: number;
  readonly skippedByError: number;
  readonly failures: ScanFailure[];
}

/**
 * Run the windows of one file: every `stride`-th start bar (stride 1 = all), both hands.
 * A throw from `generateDrills` or from writing a drill is a failure; a family skipped because it threw
 * is counted (it is a readable skip, not a crash).
 */
export function scanFile(file: ScanFile, stride = 1, offset = 0): ScanResult {
  const failures: ScanFailure[] = [];
  let windows = 0;
  let drills = 0;
  let skippedByError = 0;
  const last = file.score.measures.length - 1;
  for (let from = Math.min(offset, Math.max(0, last - 1)); from <= Math.max(0, last - 1); from += stride) {
    const to = Math.min(from + 1, last);
    for (const hand of ["right", "left"] as const) {
      windows++;
      const window = `bars ${from}–${to} ${hand}`;
      try {
        const passage = selectPassage(file.score, { part: file.part, hand, from, to });
        const result = generateDrills(passage, { seed: 1 });
        skippedByError += result.skipped.filter((s) => s.reason.startsWith("This drill could not be written")).length;
        for (const drill of result.drills) {
          drills++;
          writeMusicXML(drill.score);
        }
      } catch (error) {
        failures.push({ file: file.name, window, message: (error as Error).message });
      }
    }
  }
  return { windows, drills, skippedByError, failures };
}
