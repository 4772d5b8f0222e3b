// Every drill family on the two-staff piano files of the vendored reference corpus
// (fixtures/reference/musicxml): two 2-bar passages per file, every family; bars exact, keyboard
// range, and validity against the MusicXML 4.0 XSD.
import fs from "node:fs";
import path from "node:path";
import { describe, expect, test } from "vitest";
import { readScore, selectPassage, writeMusicXML } from "../../lib/score";
import type { Passage, Score } from "../../lib/score/types";
import { barLength } from "../../lib/drills/build";
import { families, generateDrills } from "../../lib/drills";
import type { Drill } from "../../lib/drills/types";
import { hasXmllint, referenceDir } from "../support/xmllint";
import { validateAll } from "./xsd-batch";

/** MusicXML files under the reference folder, the schema folder and snippet fragments left out. */
function referenceFiles(dir: string): string[] {
  if (!fs.existsSync(dir)) return [];
  return fs.readdirSync(dir, { withFileTypes: true }).flatMap((d) => {
    const full = path.join(dir, d.name);
    if (d.isDirectory()) return d.name === "schema" || d.name === "snippets" ? [] : referenceFiles(full);
    return /\.(xml|musicxml)$/.test(d.name) ? [full] : [];
  });
}

/** The first part with two staves (a piano part), or null. */
function pianoPart(score: Score): string | null {
  return score.parts.find((p) => p.staves === 2)?.id ?? null;
}

interface Case { readonly name: string; readonly passage: Passage }

const cases: Case[] = referenceFiles(path.join(referenceDir(), "musicxml")).flatMap((file) => {
  let score: Score;
  try {
    score = readScore(fs.readFileSync(file, "utf8")).score;
  } catch {
    return []; // a file the reader refuses is the reader's test, not this one
  }
  const part = pianoPart(score);
  if (!part) return [];
  const last = score.measures.length - 1;
  const mid = Math.max(0, Math.floor(last / 2));
  const starts = [...new Set([0, Math.min(mid, Math.max(0, last - 1))])];
  return starts.map((from) => ({
    name: `${path.basename(file)} bars ${from + 1}–${Math.min(from + 1, last) + 1}`,
    passage: selectPassage(score, { part, hand: "both", from, to: Math.min(from + 1, last) }),
  }));
});

const runs = cases.map((c) => ({ ...c, ...generateDrills(c.passage, { seed: 7 }) }));
const drills: { name: string; drill: Drill }[] = runs.flatMap((r) =>
  r.drills.map((drill, i) => ({ name: `${r.name} #${i} ${drill.family}/${drill.variant}`, drill })),
);

describe("drills on the reference corpus's piano files", () => {
  test("the corpus has two-staff piano files to draw from", () => {
    expect(new Set(cases.map((c) => c.name.split(" bars")[0])).size).toBeGreaterThanOrEqual(3);
  });

  test("every family writes a drill on some reference passage; the others say why they skip", () => {
    const written = new Set(drills.map((d) => d.drill.family));
    // The ornaments family needs grace notes before a note of their own staff; where the sampled
    // passages have none, it says so.
    const missing = Object.keys(families).filter((id) => !written.has(id));
    expect(missing.filter((id) => id !== "ornaments")).toEqual([]);
    if (missing.includes("ornaments")) for (const r of runs) expect(r.skipped.find((s) => s.family === "ornaments")?.reason).toMatch(/grace notes/);
    for (const r of runs) for (const s of r.skipped) expect(s.reason.length, `${r.name} ${s.family}`).toBeGreaterThan(5);
  });

  test("every bar of every staff and voice sums to its time signature (MusicXML 4.0 <time>)", () => {
    for (const { name, drill } of drills) {
      for (const m of drill.score.measures) {
        for (let staff = 1; staff <= drill.score.parts[0].staves; staff++) {
          const here = drill.score.events.filter((e) => e.staff === staff);
          for (const voice of new Set(here.map((e) => e.voice))) {
            const sum = here
              .filter((e) => e.measure === m.index && e.voice === voice && !e.chord && !e.grace)
              .reduce((s, e) => s.add(e.duration), barLength(m.time).sub(barLength(m.time)));
            expect(sum.equals(barLength(m.time)), `${name} bar ${m.number} staff ${staff}`).toBe(true);
          }
        }
      }
    }
  });

  test("pitches stay within A0 = 21 … C8 = 108 (FACTS.md §1)", () => {
    for (const { name, drill } of drills) {
      for (const e of drill.score.events) {
        if (!e.pitch) continue;
        expect(e.pitch.midi, name).toBeGreaterThanOrEqual(21);
        expect(e.pitch.midi, name).toBeLessThanOrEqual(108);
      }
    }
  });

  test.runIf(hasXmllint())("every drill validates against the MusicXML 4.0 XSD", () => {
    expect(drills.length).toBeGreaterThan(14);
    // W3C MusicXML 4.0 schema (vendored copy in fixtures/reference), read once for all drills.
    const errors = validateAll(drills.map(({ drill }) => writeMusicXML(drill.score)));
    drills.forEach(({ name }, i) => expect(errors[i], name).toEqual([]));
  });
});
