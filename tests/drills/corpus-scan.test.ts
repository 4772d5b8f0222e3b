// Issue #16: generateDrills never throws on a readable score. Every corpus file with a two-staff part
// (the 12 real scores and the two-staff files of the MusicXML test suite, fixtures/reference) is scanned
// in two-bar windows, both hands; every drill is also written to MusicXML. The full scan (every window)
// runs in scripts/bench/drill-scan.ts; here a deterministic sample keeps the suite fast: every file,
// every 12th start bar, the offset varying per file so that different bars are hit.
import { describe, expect, test } from "vitest";
import { scanFile, scanFiles } from "../support/drill-scan";

const files = scanFiles();

describe("drill scan over the corpus", () => {
  test("covers all 12 real scores and the test suite's two-staff files", () => {
    expect(files.filter((f) => f.name.startsWith("scores/"))).toHaveLength(12);
    expect(files.filter((f) => f.name.startsWith("musicxml/")).length).toBeGreaterThanOrEqual(5);
  });

  test.each(files.map((f, i) => [f.name, i] as const))("%s: sampled two-bar windows generate without a throw", (_name, i) => {
    const result = scanFile(files[i], 12, (i * 5) % 12);
    expect(result.windows).toBeGreaterThan(0);
    expect(result.failures).toEqual([]);
  }, 60_000);
});
