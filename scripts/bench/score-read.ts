/**
 * Benchmark: reading a generated 1,000-bar two-staff piano file (about 3 MB).
 * Goals (issue 3): readScore ≤ 3× a bare saxes pass, ≥ 8× faster than verovio's loadData,
 * and 1,000 bars ≤ 11× the time of 100 bars.
 */
import { performance } from "node:perf_hooks";
import { XMLParser } from "fast-xml-parser";
import { SaxesParser } from "saxes";
import { readScore } from "../../lib/score/read";

export interface BenchResult {
  readonly name: string;
  readonly value: number;
  readonly unit: string;
  readonly goal: string;
}

const STEPS = ["C", "D", "E", "F", "G", "A", "B"];

function note(step: number, octave: number, staff: number, extra = ""): string {
  return `      <note>${extra}
        <pitch>
          <step>${STEPS[step % 7]}</step>
          <octave>${octave + Math.floor(step / 7)}</octave>
        </pitch>
        <duration>1</duration>
        <voice>${staff === 1 ? 1 : 5}</voice>
        <type>eighth</type>
        <staff>${staff}</staff>${staff === 1 ? `
        <notations><technical><fingering>${(step % 5) + 1}</fingering></technical></notations>` : ""}
      </note>\n`;
}

/**
 * A partwise two-staff piano file: eighths in both hands, a chord on every first beat.
 *
 * @example
 * generatedPianoXml(1000).length; // about 3 MB
 */
export function generatedPianoXml(bars: number): string {
  const out: string[] = [`<?xml version="1.0" encoding="UTF-8"?>
<score-partwise version="4.0">
  <part-list><score-part id="P1"><part-name>Piano</part-name></score-part></part-list>
  <part id="P1">\n`];
  for (let b = 0; b < bars; b++) {
    out.push(`    <measure number="${b + 1}">\n`);
    if (b === 0) {
      out.push(`      <attributes><divisions>2</divisions><key><fifths>0</fifths></key><time><beats>4</beats><beat-type>4</beat-type></time><staves>2</staves>
        <clef number="1"><sign>G</sign><line>2</line></clef><clef number="2"><sign>F</sign><line>4</line></clef></attributes>\n`);
    }
    for (let i = 0; i < 8; i++) {
      out.push(note((b + i) % 14, 4, 1));
      if (i === 0) out.push(note(((b + i) % 14) + 2, 4, 1, "<chord/>"));
    }
    out.push("      <backup><duration>8</duration></backup>\n");
    for (let i = 0; i < 8; i++) out.push(note([0, 4, 2, 4][i % 4] + (b % 5), 2, 2));
    out.push("    </measure>\n");
  }
  out.push("  </part>\n</score-partwise>\n");
  return out.join("");
}

function median(run: () => void, times = 5): number {
  const ms: number[] = [];
  for (let i = 0; i < times; i++) {
    const t0 = performance.now();
    run();
    ms.push(performance.now() - t0);
  }
  return ms.sort((a, b) => a - b)[Math.floor(times / 2)];
}

function saxesPass(xml: string): void {
  const p = new SaxesParser({ position: false });
  let n = 0;
  p.on("opentag", () => n++);
  p.write(xml).close();
}

/** Median timings and the issue's ratios, from one run. */
export async function run(): Promise<BenchResult[]> {
  const big = generatedPianoXml(1000);
  const small = generatedPianoXml(100);
  readScore(big); // warm-up
  const saxes = median(() => saxesPass(big));
  const read = median(() => readScore(big));
  const read100 = median(() => readScore(small), 9);
  const fxp = median(() => new XMLParser({ preserveOrder: true, ignoreAttributes: false, parseTagValue: false, processEntities: false }).parse(big), 3);
  // verovio is a test-only devDependency; its entry points ship no type declarations.
  // @ts-ignore
  const { default: createVerovioModule } = await import("verovio/wasm");
  // @ts-ignore
  const { VerovioToolkit } = await import("verovio/esm");
  const tk = new VerovioToolkit(await createVerovioModule());
  tk.setOptions({ inputFrom: "musicxml", breaks: "none" });
  const verovio = median(() => tk.loadData(big), 3);
  const r = (x: number) => Math.round(x * 100) / 100;
  return [
    { name: "score-read: file size (1,000 bars)", value: r(big.length / 1e6), unit: "MB", goal: "about 3" },
    { name: "score-read: saxes bare pass", value: r(saxes), unit: "ms", goal: "reference" },
    { name: "score-read: readScore", value: r(read), unit: "ms", goal: "≤ 3× saxes" },
    { name: "score-read: fast-xml-parser preserveOrder", value: r(fxp), unit: "ms", goal: "reference" },
    { name: "score-read: verovio loadData", value: r(verovio), unit: "ms", goal: "reference" },
    { name: "score-read: readScore / saxes", value: r(read / saxes), unit: "×", goal: "≤ 3" },
    { name: "score-read: verovio / readScore", value: r(verovio / read), unit: "×", goal: "≥ 8" },
    { name: "score-read: 1,000 bars / 100 bars", value: r(read / read100), unit: "×", goal: "≤ 11" },
  ];
}
