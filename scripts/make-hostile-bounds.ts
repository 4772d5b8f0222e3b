/**
 * Hostile corpus, second half: well-formed MusicXML whose numbers are absurd (a note of 10^15
 * quarters, divisions 10^12, a tuplet 100000:1, bars that would make millions of metronome clicks).
 * The reader accepts them; `checkScoreBounds` (lib/score/limits.ts) must refuse each at upload with
 * a message naming the bar. `boundsCorpus()` builds them in memory; running this script writes them
 * into fixtures/hostile/ next to the first half (scripts/make-hostile.ts).
 *
 *   npx tsx scripts/make-hostile-bounds.ts
 */
import fs from "node:fs";
import path from "node:path";
import { strToU8, zipSync } from "fflate";

export interface BoundsCase {
  readonly file: string;
  readonly bytes: Uint8Array;
  /** Printed number of the bar the refusal must name. */
  readonly bar: string;
  /** Words the refusal must contain. */
  readonly says: RegExp;
}

const head = '<?xml version="1.0" encoding="UTF-8"?>\n';
const partList = '<part-list><score-part id="P1"><part-name>Piano</part-name></score-part></part-list>';
const score = (measures: string) => `${head}<score-partwise version="4.0">${partList}<part id="P1">${measures}</part></score-partwise>`;
const note = (duration: string | number, type = "whole", extra = "") =>
  `<note><pitch><step>C</step><octave>4</octave></pitch><duration>${duration}</duration><type>${type}</type>${extra}</note>`;
const attrs = (divisions: string | number, time = "<time><beats>4</beats><beat-type>4</beat-type></time>") =>
  `<attributes><divisions>${divisions}</divisions>${time}</attributes>`;
const bar = (n: number, body: string) => `<measure number="${n}">${body}</measure>`;
const container = '<?xml version="1.0" encoding="UTF-8"?><container><rootfiles><rootfile full-path="score.musicxml" media-type="application/vnd.recordare.musicxml+xml"/></rootfiles></container>';
const mxl = (xml: string) =>
  zipSync({ mimetype: [strToU8("application/vnd.recordare.musicxml"), { level: 0 }], "META-INF/container.xml": strToU8(container), "score.musicxml": strToU8(xml) }, { level: 9 });

/** Four bars of 4/4 at divisions 4; bar `at` (1-based) holds `body` instead of a whole note. */
function fourBars(at: number, body: string, divisions: string | number = 4): string {
  const bars: string[] = [];
  for (let i = 1; i <= 4; i++) bars.push(bar(i, (i === 1 ? attrs(divisions) : "") + (i === at ? body : note(16))));
  return score(bars.join(""));
}

/**
 * Every case, with the bar and the words its refusal must carry.
 *
 * @example
 * boundsCorpus().find((c) => c.file === "huge-duration.xml")?.bar; // "3"
 */
export function boundsCorpus(): BoundsCase[] {
  // 5,000 bars (the reader's measure cap) of 4/64 time holding a 64-quarter note each: a click every
  // sixteenth of a quarter, 1,024 clicks a bar, 5 million in all, from a file of 16 KB once zipped.
  const clickBars: string[] = [];
  for (let i = 1; i <= 5000; i++) {
    clickBars.push(bar(i, (i === 1 ? attrs(1, "<time><beats>4</beats><beat-type>64</beat-type></time>") : "") + note(64, "long")));
  }
  // Divisions changing between two large primes: each alone is fine, together they need 99991 × 99989.
  const primes = score(bar(1, attrs(99991) + note(1) + `<forward><duration>${99991 * 4 - 1}</duration></forward>`) + bar(2, attrs(99989) + note(1, "whole") + `<forward><duration>${99989 * 4 - 1}</duration></forward>`));
  return [
    { file: "huge-duration.xml", bar: "3", says: /lasts .* quarter notes/, bytes: strToU8(fourBars(3, note("1000000000000000"))) },
    { file: "huge-divisions.xml", bar: "1", says: /divisions/, bytes: strToU8(fourBars(1, note("4000000000000"), "1e12")) },
    {
      file: "huge-tuplet.xml",
      bar: "2",
      says: /tuplet ratio 100000:1/,
      bytes: strToU8(fourBars(2, note(16, "whole", "<time-modification><actual-notes>100000</actual-notes><normal-notes>1</normal-notes></time-modification>"))),
    },
    { file: "long-bar.xml", bar: "4", says: /bar lasts 300 quarter notes/, bytes: strToU8(fourBars(4, note(1200))) },
    { file: "prime-divisions.xml", bar: "2", says: /divisions per quarter note together/, bytes: strToU8(primes) },
    { file: "million-clicks.mxl", bar: String(Math.ceil(200_000 / 1024)), says: /metronome beats/, bytes: mxl(score(clickBars.join(""))) },
  ];
}

function main(): void {
  const dir = path.resolve(__dirname, "../fixtures/hostile");
  fs.mkdirSync(dir, { recursive: true });
  for (const c of boundsCorpus()) {
    fs.writeFileSync(path.join(dir, c.file), c.bytes);
    console.log(`${c.file.padEnd(28)} ${String(c.bytes.length).padStart(8)} bytes  → bar ${c.bar}`);
  }
}

if (process.argv[1] && path.resolve(process.argv[1]) === path.resolve(__filename)) main();
