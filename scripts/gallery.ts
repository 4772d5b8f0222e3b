/**
 * Drill gallery: every drill of one knot engraved through the handout renderer (OSMD in jsdom →
 * SVG → PDF) and turned into PNG with `pdftoppm`, plus each drill's MusicXML and an index.md with
 * titles, notes, tempo, span and warnings — so a person can look at each drill as a teacher would.
 * Output goes to artifacts/gallery/ (git-ignored), emptied first.
 *
 * Usage:
 *   npm run gallery -- <score> <from>-<to> <hand> [--families a,b] [--no-png]
 *   npm run gallery -- <demo-knot-name>
 * <score> is a file name in fixtures/reference/scores or fixtures/pieces (or a path); bars are
 * 1-based positions in the file (the first bar is 1, a pickup included); hand is right, left or both.
 * Example: npm run gallery -- varied-04_wolf_eichendorff-9_der-schreckenberger.mxl 1-2 right
 */
import { execFileSync } from "node:child_process";
import fs from "node:fs";
import path from "node:path";
import { generateDrills } from "../lib/drills";
import { renderHandoutPdf } from "../lib/handout";
import { readScore, selectPassage, writeMusicXML } from "../lib/score";
import type { Hand, Passage } from "../lib/score/types";
import { DEMO_KNOTS, knotPassage } from "../tests/drills/knots";

const root = path.resolve(__dirname, "..");
const args = process.argv.slice(2);
const flag = (name: string) => {
  const i = args.indexOf(name);
  return i >= 0 ? args[i + 1] : undefined;
};
const png = !args.includes("--no-png");
const families = flag("--families")?.split(",").map((f) => f.trim()).filter(Boolean);
const plain = args.filter((a, i) => !a.startsWith("--") && !(i > 0 && args[i - 1] === "--families"));

function fail(message: string): never {
  console.error(message);
  process.exit(1);
}

/** The passage named on the command line: a demo knot, or a score file with bars and a hand. */
function passageFromArgs(): { passage: Passage; label: string } {
  const [first = "waltz-leap", bars, hand] = plain;
  const knot = DEMO_KNOTS.find((k) => k.name === first);
  if (knot) return { passage: knotPassage(knot), label: `${knot.piece}, bars ${knot.from + 1}–${knot.to + 1}, ${knot.hand}` };
  const candidates = [first, path.join(root, "fixtures/reference/scores", first), path.join(root, "fixtures/pieces", first)];
  const file = candidates.find((c) => fs.existsSync(c) && fs.statSync(c).isFile());
  if (!file) fail(`No score "${first}". Give a file in fixtures/reference/scores or fixtures/pieces, or a demo knot: ${DEMO_KNOTS.map((k) => k.name).join(", ")}`);
  const m = /^(\d+)(?:-(\d+))?$/.exec(bars ?? "");
  if (!m) fail(`Bars must look like 5-6 (1-based positions in the file), not "${bars ?? ""}".`);
  if (hand !== "right" && hand !== "left" && hand !== "both") fail(`Hand must be right, left or both, not "${hand ?? ""}".`);
  const bytes = fs.readFileSync(file);
  const { score } = readScore(file.endsWith(".mxl") ? new Uint8Array(bytes) : bytes.toString("utf8"));
  const from = Number(m[1]) - 1;
  const to = Number(m[2] ?? m[1]) - 1;
  if (from < 0 || to < from || to >= score.measures.length) fail(`Bars ${bars} are outside the score's ${score.measures.length} bars.`);
  const part = score.parts.find((p) => p.staves >= 2) ?? score.parts[0];
  return { passage: selectPassage(score, { part: part.id, hand: hand as Hand | "both", from, to }), label: `${path.basename(file)}, bars ${from + 1}–${to + 1}, ${hand}` };
}

async function main() {
  const { passage, label } = passageFromArgs();
  const out = path.join(root, "artifacts/gallery");
  fs.mkdirSync(out, { recursive: true });
  for (const f of fs.readdirSync(out)) if (/\.(musicxml|pdf|png|md)$/.test(f)) fs.rmSync(path.join(out, f));

  const { drills, skipped } = generateDrills(passage, { seed: 1, ...(families ? { families } : {}) });
  const lines = [`# Drills for ${label}`, ""];
  for (const [i, d] of drills.entries()) {
    const base = `${String(i + 1).padStart(2, "0")}-${d.family}-${d.variant}`;
    const musicxml = writeMusicXML(d.score);
    fs.writeFileSync(path.join(out, `${base}.musicxml`), musicxml);
    const span = Object.entries(d.maxSpan).map(([h, s]) => `${h} ${s!.semitones} st / ${Math.round(s!.mm)} mm`).join(", ");
    const tempo = d.tempo.beat ? `${d.tempo.beat.symbol} = ${d.tempo.beat.start} → ${d.tempo.beat.target}` : `♩ = ${d.tempo.start} → ${d.tempo.target}`;
    lines.push(`## ${base}`, `**${d.title}** — ${d.score.measures.length} bars; tempo ${tempo}; span ${span || "–"}`, "", `Teacher: ${d.teacherNote}`, "", `Student: ${d.studentNote}`, "");
    if (d.warnings.length) lines.push(...d.warnings.map((w) => `- warning (${w.code}): ${w.message}`), "");
    const pdf = await renderHandoutPdf({
      sheetTitle: d.title.slice(0, 200),
      pieceTitle: (passage.meta.title || "Untitled").slice(0, 200),
      bars: label.slice(0, 200),
      date: "gallery",
      paper: "a4",
      drills: [{ title: d.title.slice(0, 200), musicxml, studentNote: d.studentNote, tempo: { start: clampTempo(d.tempo.start), target: clampTempo(d.tempo.target) } }],
    });
    const pdfPath = path.join(out, `${base}.pdf`);
    fs.writeFileSync(pdfPath, pdf);
    // The top of the first page (header, drill, instruction) at a resolution where fingerings read.
    if (png) execFileSync("pdftoppm", ["-png", "-r", String(DPI), "-f", "1", "-l", "1", "-x", "0", "-y", "0", "-W", String(Math.round((595 / 72) * DPI)), "-H", String(Math.round((480 / 72) * DPI)), "-singlefile", pdfPath, path.join(out, base)]);
    process.stdout.write(".");
  }
  if (skipped.length) lines.push("## Not written", ...skipped.map((s) => `- ${s.family}: ${s.reason}`));
  fs.writeFileSync(path.join(out, "index.md"), lines.join("\n") + "\n");
  console.log(`\n${drills.length} drills of ${label} engraved to ${path.relative(process.cwd(), out)}${png ? " (PDF and PNG)" : " (PDF)"}`);
}

const DPI = 130;

function clampTempo(t: number): number {
  return Math.min(320, Math.max(20, Math.round(t)));
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});
