/**
 * Drill gallery: writes every drill of one demo knot as MusicXML into artifacts/gallery/, with an
 * index listing titles, notes, span and warnings, and engraves each one as SVG (the handout renderer)
 * and PNG (Debian chromium), so a person can open and look at each one.
 * Usage: npx tsx scripts/gallery.ts [knot-name] [--no-png]   (knot names: tests/drills/knots.ts)
 */
import fs from "node:fs";
import path from "node:path";
import { generateDrills } from "../lib/drills";
import { renderDrillSvg } from "../lib/handout";
import { writeMusicXML } from "../lib/score";
import { launchChromium } from "../tests/browser/chromium";
import { DEMO_KNOTS, knotPassage } from "../tests/drills/knots";

const args = process.argv.slice(2);
const name = args.find((a) => !a.startsWith("--")) ?? "waltz-leap";
const png = !args.includes("--no-png");
const knot = DEMO_KNOTS.find((k) => k.name === name);
if (!knot) {
  console.error(`Unknown knot "${name}". Known: ${DEMO_KNOTS.map((k) => k.name).join(", ")}`);
  process.exit(1);
}
const out = path.resolve(__dirname, "../artifacts/gallery");
fs.mkdirSync(out, { recursive: true });
for (const f of fs.readdirSync(out)) if (/\.(musicxml|svg|png)$/.test(f)) fs.rmSync(path.join(out, f));

const { drills, skipped } = generateDrills(knotPassage(knot), { seed: 1 });
const files: string[] = [];
const lines = [`# Drills for ${knot.piece}, bars ${knot.from}–${knot.to}, ${knot.hand} hand(s)`, ""];
drills.forEach((d, i) => {
  const file = `${String(i + 1).padStart(2, "0")}-${d.family}-${d.variant}.musicxml`;
  fs.writeFileSync(path.join(out, file), writeMusicXML(d.score));
  files.push(file);
  const span = Object.entries(d.maxSpan).map(([h, s]) => `${h} ${s!.semitones} st / ${Math.round(s!.mm)} mm`).join(", ");
  lines.push(`## ${file}`, `**${d.title}** — tempo ${d.tempo.start} → ${d.tempo.target}; span ${span || "–"}`, "", `Teacher: ${d.teacherNote}`, "", `Student: ${d.studentNote}`, "");
  if (d.warnings.length) lines.push(...d.warnings.map((w) => `- warning (${w.code}): ${w.message}`), "");
});
if (skipped.length) lines.push("## Not written", ...skipped.map((s) => `- ${s.family}: ${s.reason}`));
fs.writeFileSync(path.join(out, "index.md"), lines.join("\n") + "\n");
console.log(`${drills.length} drills written to ${path.relative(process.cwd(), out)}`);

/** Engrave every drill to SVG, then screenshot each SVG on a white page to PNG. */
async function engrave() {
  const browser = png ? await launchChromium() : null;
  const page = browser ? await browser.newPage({ viewport: { width: 900, height: 400 } }) : null;
  for (const file of files) {
    const svg = await renderDrillSvg(fs.readFileSync(path.join(out, file), "utf8"));
    const base = file.replace(/\.musicxml$/, "");
    fs.writeFileSync(path.join(out, `${base}.svg`), svg);
    if (page) {
      await page.setContent(`<body style="margin:16px;background:#fff">${svg}</body>`);
      await page.locator("svg").first().screenshot({ path: path.join(out, `${base}.png`) });
    }
  }
  await browser?.close();
  console.log(`${files.length} drills engraved as SVG${png ? " and PNG" : ""}`);
}
engrave().catch((error) => {
  console.error(error);
  process.exit(1);
});
