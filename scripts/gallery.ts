/**
 * Drill gallery: writes every drill of one demo knot as MusicXML into artifacts/gallery/, with an
 * index listing titles, notes, span and warnings, so a person can open and look at each one.
 * Usage: npx tsx scripts/gallery.ts [knot-name]   (knot names: tests/drills/knots.ts)
 */
import fs from "node:fs";
import path from "node:path";
import { generateDrills } from "../lib/drills";
import { writeMusicXML } from "../lib/score";
import { DEMO_KNOTS, knotPassage } from "../tests/drills/knots";

const name = process.argv[2] ?? "waltz-leap";
const knot = DEMO_KNOTS.find((k) => k.name === name);
if (!knot) {
  console.error(`Unknown knot "${name}". Known: ${DEMO_KNOTS.map((k) => k.name).join(", ")}`);
  process.exit(1);
}
const out = path.resolve(__dirname, "../artifacts/gallery");
fs.mkdirSync(out, { recursive: true });
for (const f of fs.readdirSync(out)) if (f.endsWith(".musicxml")) fs.rmSync(path.join(out, f));

const { drills, skipped } = generateDrills(knotPassage(knot), { seed: 1 });
const lines = [`# Drills for ${knot.piece}, bars ${knot.from}–${knot.to}, ${knot.hand} hand(s)`, ""];
drills.forEach((d, i) => {
  const file = `${String(i + 1).padStart(2, "0")}-${d.family}-${d.variant}.musicxml`;
  fs.writeFileSync(path.join(out, file), writeMusicXML(d.score));
  const span = Object.entries(d.maxSpan).map(([h, s]) => `${h} ${s!.semitones} st / ${Math.round(s!.mm)} mm`).join(", ");
  lines.push(`## ${file}`, `**${d.title}** — tempo ${d.tempo.start} → ${d.tempo.target}; span ${span || "–"}`, "", `Teacher: ${d.teacherNote}`, "", `Student: ${d.studentNote}`, "");
  if (d.warnings.length) lines.push(...d.warnings.map((w) => `- warning (${w.code}): ${w.message}`), "");
});
if (skipped.length) lines.push("## Not written", ...skipped.map((s) => `- ${s.family}: ${s.reason}`));
fs.writeFileSync(path.join(out, "index.md"), lines.join("\n") + "\n");
console.log(`${drills.length} drills written to ${path.relative(process.cwd(), out)}`);
