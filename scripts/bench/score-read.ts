/**
 * Benchmark: reading a generated 1,000-bar two-staff piano file (about 3 MB).
 * Goals (issue 3): readScore ≤ 3× a bare saxes pass, ≥ 8× faster than verovio's loadData,
 * and 1,000 bars ≤ 11× the time of 100 bars. After one warm-up call each, the contenders run in
 * turn for several rounds in this process; times (CPU time) and ratios are medians over the rounds.
 * readScore is timed from an esbuild bundle of lib/score, as a production build runs it (tsx's
 * per-module export getters are not in a bundle); without esbuild it falls back to the tsx copy.
 */
import fs from "node:fs";
import { createRequire } from "node:module";
import os from "node:os";
import path from "node:path";
import { XMLParser } from "fast-xml-parser";
import { SaxesParser } from "saxes";
import { readScore as readScoreTsx } from "../../lib/score/read";

type ReadScore = typeof readScoreTsx;

export interface BenchResult {
  readonly name: string;
  readonly value: number;
  readonly unit: string;
  readonly goal: string;
}

const STEPS = ["C", "D", "E", "F", "G", "A", "B"];
const DYNAMICS = ["p", "mf", "f", "mp"];

/**
 * One note as a notation program exports it (stem, beam, F sharp from the key of G major, some
 * fingering), with its children on three lines.
 */
function note(o: {
  step: number; octave: number; staff: 1 | 2; type: "half" | "quarter" | "eighth"; chord?: boolean; beam?: string;
  finger?: number; sharp?: boolean;
}): string {
  const oct = o.octave + Math.floor(o.step / 7);
  const voice = o.staff === 1 ? 1 : 5;
  const duration = o.type === "half" ? 4 : o.type === "quarter" ? 2 : 1;
  const stem = o.staff === 1 ? (oct >= 5 ? "down" : "up") : oct >= 3 ? "down" : "up";
  const alter = o.sharp ? "<alter>1</alter>" : "";
  const beam = o.beam ? `\n  <beam number="1">${o.beam}</beam>` : "";
  const finger = o.finger ? `\n  <notations><technical><fingering>${o.finger}</fingering></technical></notations>` : "";
  return `<note>${o.chord ? "<chord/>" : ""}
  <pitch><step>${STEPS[o.step % 7]}</step>${alter}<octave>${oct}</octave></pitch>
  <duration>${duration}</duration><voice>${voice}</voice><type>${o.type}</type><stem>${stem}</stem><staff>${o.staff}</staff>${beam}${finger}
</note>
`;
}

function bar(b: number): string {
  const out: string[] = [`    <measure number="${b + 1}" width="${(180 + (b % 7) * 11).toFixed(2)}">\n`];
  if (b === 0) {
    out.push(`      <print>
        <system-layout>
          <system-margins><left-margin>50.00</left-margin><right-margin>0.00</right-margin></system-margins>
          <top-system-distance>170.00</top-system-distance>
          </system-layout>
        <staff-layout number="2"><staff-distance>65.00</staff-distance></staff-layout>
        </print>
      <attributes>
        <divisions>2</divisions>
        <key><fifths>1</fifths></key>
        <time><beats>4</beats><beat-type>4</beat-type></time>
        <staves>2</staves>
        <clef number="1"><sign>G</sign><line>2</line></clef>
        <clef number="2"><sign>F</sign><line>4</line></clef>
        </attributes>\n`);
  } else if (b % 4 === 0) out.push(`      <print new-system="yes"/>\n`);
  if (b % 8 === 0) {
    out.push(`      <direction placement="below">
        <direction-type>
          <dynamics default-x="6.58" default-y="-80.00"><${DYNAMICS[(b / 8) % 4]}/></dynamics>
          </direction-type>
        <staff>1</staff>
        <sound dynamics="${70 + (b % 3) * 10}"/>
        </direction>\n`);
  }
  // Right hand: a melody in beamed eighths, a third below it on the downbeat.
  for (let i = 0; i < 8; i++) {
    const step = 7 + ((b * 3 + i * 2) % 9);
    const beam = i % 4 === 0 ? "begin" : i % 4 === 3 ? "end" : "continue";
    out.push(note({ step, octave: 4, staff: 1, type: "eighth", beam, finger: i % 4 === 0 ? (step % 5) + 1 : undefined, sharp: step % 7 === 3 }));
    if (i === 0) out.push(note({ step: step - 2, octave: 4, staff: 1, type: "eighth", chord: true }));
  }
  out.push("<backup><duration>8</duration></backup>\n");
  // Left hand: a broken chord in beamed eighths, then two quarters.
  const root = (b % 5) + 7;
  for (let i = 0; i < 4; i++) {
    const beam = i === 0 ? "begin" : i === 3 ? "end" : "continue";
    out.push(note({ step: root + [0, 4, 2, 4][i], octave: 2, staff: 2, type: "eighth", beam, finger: i === 0 ? 5 : undefined }));
  }
  out.push(note({ step: root + 4, octave: 2, staff: 2, type: "quarter" }));
  out.push(note({ step: root, octave: 2, staff: 2, type: "quarter", finger: 5 }));
  if (b % 16 === 15) out.push(`      <barline location="right"><bar-style>light-light</bar-style></barline>\n`);
  out.push("      </measure>\n");
  return out.join("");
}

/**
 * A partwise two-staff piano file laid out as a notation program exports it (about 3 KB a bar):
 * a right-hand melody in eighths with thirds, left-hand broken chords in eighths and quarters, stems,
 * beams, some fingering and dynamics, print and layout elements.
 *
 * @example
 * generatedPianoXml(1000).length; // about 3 MB
 */
export function generatedPianoXml(bars: number): string {
  const out: string[] = [`<?xml version="1.0" encoding="UTF-8" standalone="no"?>
<!DOCTYPE score-partwise PUBLIC "-//Recordare//DTD MusicXML 4.0 Partwise//EN" "http://www.musicxml.org/dtds/partwise.dtd">
<score-partwise version="4.0">
  <work>
    <work-title>Generated study</work-title>
    </work>
  <identification>
    <creator type="composer">Benchmark</creator>
    <encoding>
      <software>Knotwork benchmark</software>
      </encoding>
    </identification>
  <part-list>
    <score-part id="P1">
      <part-name>Piano</part-name>
      <score-instrument id="P1-I1"><instrument-name>Piano</instrument-name></score-instrument>
      </score-part>
    </part-list>
  <part id="P1">\n`];
  for (let b = 0; b < bars; b++) out.push(bar(b));
  out.push("    </part>\n  </score-partwise>\n");
  return out.join("");
}

/**
 * readScore from a one-file esbuild bundle of lib/score/read.ts (written to the temp folder), and how
 * it was loaded; the tsx-compiled module when esbuild cannot run.
 */
async function bundledReader(): Promise<{ readScore: ReadScore; how: string }> {
  try {
    const esbuild = await import("esbuild");
    const outfile = path.join(os.tmpdir(), `knotwork-score-read-${process.pid}.cjs`);
    esbuild.buildSync({
      entryPoints: [path.resolve(__dirname, "../../lib/score/read.ts")],
      bundle: true, platform: "node", format: "cjs", target: "node20", outfile, logLevel: "silent",
    });
    const mod = createRequire(outfile)(outfile) as { readScore: ReadScore };
    fs.rmSync(outfile, { force: true });
    return { readScore: mod.readScore, how: "esbuild bundle" };
  } catch {
    return { readScore: readScoreTsx, how: "tsx, no bundle" };
  }
}

function saxesPass(xml: string): void {
  const p = new SaxesParser({ position: false });
  let n = 0;
  p.on("opentag", () => n++);
  p.write(xml).close();
}

/** Milliseconds of CPU time this process spent (user + system), collector threads included. */
function cpuMs(): number {
  const u = process.cpuUsage();
  return (u.user + u.system) / 1000;
}

/**
 * CPU time of one call. On a shared machine wall-clock time mostly measures waiting for a core;
 * CPU time measures the work, so the ratios hold whatever else the machine is doing.
 */
function time(run: () => void): number {
  const t0 = cpuMs();
  run();
  return cpuMs() - t0;
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

/** Rounds measured after the warm-up; every ratio is the median of its per-round ratios. */
const ROUNDS = 7;
/** Repetitions of the 100-bar read inside a round (it is too short to time once). */
const SMALL_REPS = 10;

/**
 * Median timings and the ratios, from one run. Every contender runs once per round, in turn,
 * in this one process, so load on a shared machine hits them alike; the ratios are taken per round.
 *
 * @example
 * (await run()).find((r) => r.name.endsWith("readScore / saxes"))?.value; // ≤ 3
 */
export async function run(): Promise<BenchResult[]> {
  const big = generatedPianoXml(1000);
  const small = generatedPianoXml(100);
  const { readScore, how } = await bundledReader();
  // verovio is a test-only devDependency; its entry points ship no type declarations.
  // @ts-ignore
  const { default: createVerovioModule } = await import("verovio/wasm");
  // @ts-ignore
  const { VerovioToolkit } = await import("verovio/esm");
  const tk = new VerovioToolkit(await createVerovioModule());
  tk.setOptions({ inputFrom: "musicxml", breaks: "none" });
  const fxpParser = new XMLParser({ preserveOrder: true, ignoreAttributes: false, parseTagValue: false, processEntities: false });
  const contenders = {
    saxes: () => saxesPass(big),
    read: () => readScore(big),
    read100: () => {
      for (let i = 0; i < SMALL_REPS; i++) readScore(small);
    },
    fxp: () => fxpParser.parse(big),
    verovio: () => tk.loadData(big),
  };
  type Name = keyof typeof contenders;
  const names = Object.keys(contenders) as Name[];
  for (const name of names) contenders[name](); // warm-up
  const ms: Record<Name, number[]> = { saxes: [], read: [], read100: [], fxp: [], verovio: [] };
  const ratios = { readSaxes: [] as number[], verovioRead: [] as number[], linear: [] as number[] };
  for (let round = 0; round < ROUNDS; round++) {
    const t = {} as Record<Name, number>;
    for (const name of names) {
      t[name] = time(contenders[name]) / (name === "read100" ? SMALL_REPS : 1);
      ms[name].push(t[name]);
    }
    ratios.readSaxes.push(t.read / t.saxes);
    ratios.verovioRead.push(t.verovio / t.read);
    ratios.linear.push(t.read / t.read100);
  }
  const r = (x: number) => Math.round(x * 100) / 100;
  const m = (name: Name) => r(median(ms[name]));
  return [
    { name: "score-read: file size (1,000 bars)", value: r(big.length / 1e6), unit: "MB", goal: "about 3" },
    { name: "score-read: saxes bare pass", value: m("saxes"), unit: "ms CPU", goal: "reference" },
    { name: `score-read: readScore (${how})`, value: m("read"), unit: "ms CPU", goal: "≤ 3× saxes" },
    { name: `score-read: readScore, 100 bars (${how})`, value: m("read100"), unit: "ms CPU", goal: "reference" },
    { name: "score-read: fast-xml-parser preserveOrder", value: m("fxp"), unit: "ms CPU", goal: "reference" },
    { name: "score-read: verovio loadData", value: m("verovio"), unit: "ms CPU", goal: "reference" },
    { name: "score-read: readScore / saxes", value: r(median(ratios.readSaxes)), unit: "×", goal: "≤ 3" },
    { name: "score-read: verovio / readScore", value: r(median(ratios.verovioRead)), unit: "×", goal: "≥ 8" },
    { name: "score-read: 1,000 bars / 100 bars", value: r(median(ratios.linear)), unit: "×", goal: "≤ 11" },
  ];
}
