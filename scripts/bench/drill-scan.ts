/**
 * Benchmark and crash scan: every two-bar window, both hands, of every corpus file with a two-staff
 * part (fixtures/reference), through generateDrills and the MusicXML writer. Goal: no throw at all.
 */
import { scanFile, scanFiles } from "../../tests/support/drill-scan";

export async function run(): Promise<{ name: string; value: number | string; unit: string; goal: string }[]> {
  const files = scanFiles();
  let windows = 0;
  let drills = 0;
  let failures = 0;
  let skippedByError = 0;
  const t0 = performance.now();
  for (const file of files) {
    const r = scanFile(file);
    windows += r.windows;
    drills += r.drills;
    failures += r.failures.length;
    skippedByError += r.skippedByError;
    for (const f of r.failures.slice(0, 3)) process.stderr.write(`  ${f.file} ${f.window}: ${f.message}\n`);
  }
  const seconds = (performance.now() - t0) / 1000;
  return [
    { name: `drill scan: ${files.length} files, ${windows} two-bar windows, ${drills} drills written`, value: Math.round(seconds * 10) / 10, unit: "s", goal: "–" },
    { name: "drill scan: windows that threw", value: failures, unit: "", goal: failures === 0 ? "0 ✓" : "0 ✗" },
    { name: "drill scan: families skipped because they could not write", value: skippedByError, unit: "", goal: "as few as possible" },
  ];
}
