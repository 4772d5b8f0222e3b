// Rubric properties over real music: every drill family on two-bar windows of the vendored
// real-score corpus (fixtures/reference/scores, every file, both hands; windows sampled evenly
// unless RUBRIC_ALL=1) and on every window of the demo pieces (fixtures/pieces). Each test is one
// rule of the teacher's rubric (DRILL-RUBRIC.md, common practice) that a program can judge:
// length, spelling, meter, wording, mode, exact bars.
import fs from "node:fs";
import path from "node:path";
import Fraction from "fraction.js";
import { Note } from "tonal";
import { describe, expect, test } from "vitest";
import { families as registry, generateDrills } from "../../lib/drills";
import { barLength } from "../../lib/drills/build";
import { beatLength } from "../../lib/drills/groups";
import { keyLabel, keyScaleNotes, passageKey, writableForm } from "../../lib/drills/key-mode";
import { barCap } from "../../lib/drills/length";
import { isCompound } from "../../lib/drills/meter";
import { pitchName } from "../../lib/drills/spell";
import type { Drill } from "../../lib/drills/types";
import { makePassage } from "../../lib/drills/test-passages";
import { readScore, selectPassage, writeMusicXML } from "../../lib/score";
import { hasXmllint } from "../support/xmllint";
import { validateAll } from "./xsd-batch";
import type { Hand, Passage, Score } from "../../lib/score/types";

const root = path.resolve(__dirname, "../..");
const corpusDir = path.join(root, "fixtures/reference/scores");
const piecesDir = path.join(root, "fixtures/pieces");
/** Windows per corpus file and hand when not running them all (RUBRIC_ALL=1 runs every window). */
const PER_FILE = 10;

interface Run {
  readonly where: string;
  readonly passage: Passage;
  readonly drills: readonly Drill[];
}

/**
 * A bar whose length is not its time signature's (other than an opening pickup): the reader's
 * quoting of such bars is issue #13's work, so rhythm rules are judged on regular bars only.
 */
function irregular(score: Score, b: number): boolean {
  const m = score.measures[b];
  return m.length.compare(barLength(m.time)) > 0 || (b > 0 && !m.implicit && m.length.compare(barLength(m.time)) !== 0);
}

function windowsOf(score: Score, name: string, hands: readonly (Hand | "both")[], all: boolean): Run[] {
  const part = score.parts.find((p) => p.staves >= 2) ?? score.parts[0];
  const n = score.measures.length;
  const stride = all ? 1 : Math.max(1, Math.ceil((n - 1) / PER_FILE));
  const out: Run[] = [];
  for (let b = 0; b + 1 < n; b += stride) {
    if (irregular(score, b) || irregular(score, b + 1)) continue;
    for (const hand of hands) {
      const passage = selectPassage(score, { part: part.id, hand, from: b, to: b + 1 });
      out.push({ where: `${name} bars ${b + 1}–${b + 2} ${hand}`, passage, drills: generateDrills(passage, { seed: 1 }).drills });
    }
  }
  return out;
}

const all = process.env.RUBRIC_ALL === "1";
const corpusFiles = fs.readdirSync(corpusDir).filter((f) => f.endsWith(".mxl")).sort();
const runs: Run[] = [
  ...corpusFiles.flatMap((f) =>
    windowsOf(readScore(new Uint8Array(fs.readFileSync(path.join(corpusDir, f)))).score, f.split("_")[0], ["right", "left"], all),
  ),
  ...fs
    .readdirSync(piecesDir)
    .filter((f) => f.endsWith(".musicxml"))
    .sort()
    .flatMap((f) => windowsOf(readScore(fs.readFileSync(path.join(piecesDir, f), "utf8")).score, f, ["right", "left", "both"], true)),
];
const each = (fn: (d: Drill, r: Run, label: string) => void) => {
  for (const r of runs) for (const d of r.drills) fn(d, r, `${r.where} ${d.family}/${d.variant}`);
};

const hasDoubles = (p: Passage) => p.events.some((e) => e.pitch && Math.abs(e.pitch.alter) >= 2);
/** The passage itself writes 3:2 triplets (then a drill may quote them). */
const hasTriplets = (p: Passage) => p.events.some((e) => e.written.tuplet?.actual === 3 && e.written.tuplet.normal === 2);
const TYPE_RANK = ["whole", "half", "quarter", "eighth", "16th", "32nd", "64th", "128th"];

describe("rubric properties over the real-score corpus and the demo pieces", () => {
  test("the runs cover every corpus file, both hands, and every family somewhere", () => {
    expect(new Set(runs.map((r) => r.where.split(" ")[0])).size).toBe(corpusFiles.length + 3);
    const families = new Set(runs.flatMap((r) => r.drills.map((d) => d.family)));
    expect(families.size).toBe(Object.keys(registry).length);
  });

  test("DRILL-RUBRIC 6 'Short': no drill longer than 8 bars or twice the passage, whichever is larger", () => {
    each((d, r, label) => expect(d.score.measures.length, label).toBeLessThanOrEqual(barCap(r.passage)));
  });

  test("DRILL-RUBRIC 3 'Spelled as a musician spells': no double sharp or flat unless the passage has one", () => {
    each((d, r, label) => {
      if (hasDoubles(r.passage)) return;
      for (const e of d.score.events) if (e.pitch) expect(Math.abs(e.pitch.alter), `${label} ${pitchName(e.pitch)}`).toBeLessThan(2);
    });
  });

  test("DRILL-RUBRIC rhythm-variants: no 3:2 triplets over a compound meter (6/8, 9/8, 12/8 already move in threes)", () => {
    each((d, r, label) => {
      for (const e of d.score.events) {
        const m = d.score.measures[e.measure];
        const t = e.written.tuplet;
        if (m && isCompound(m.time) && t && d.family === "rhythm-variants" && !hasTriplets(r.passage)) expect(t.actual === 3 && t.normal === 2, label).toBe(false);
      }
    });
  });

  test("DRILL-RUBRIC 2 and rhythm-variants: dotted rhythms stay inside the beat (compound time) or half bar (no new note across it)", () => {
    const crossings = (events: readonly { onset: Fraction; duration: Fraction; pitch: unknown }[], start: Fraction, beat: Fraction) =>
      events.filter((e) => {
        if (!e.pitch) return false;
        const from = e.onset.sub(start).div(beat);
        return from.floor().compare(e.onset.add(e.duration).sub(start).div(beat).ceil().sub(1)) < 0;
      }).length;
    each((d, r, label) => {
      if (d.family !== "rhythm-variants" || !/long|short/.test(d.variant)) return;
      // Compound time: the dotted-quarter beat; four-beat simple time: the half bar; else the bar.
      const time = r.passage.time;
      const beat = isCompound(time) ? beatLength(time) : time.beats % 4 === 0 ? barLength(time).div(2) : barLength(time);
      // Passage notes across a beat (syncopation as written) may stay; a dotted pair may not add any.
      const before = crossings(r.passage.events, r.passage.measures[0].start.sub(barLength(r.passage.time).sub(r.passage.measures[0].length).mod(barLength(r.passage.time))), beat);
      const after = crossings(d.score.events.filter((e) => e.tie === "none" || e.tie === "start"), new Fraction(0), beat);
      expect(after, label).toBeLessThanOrEqual(before);
    });
  });

  test("DRILL-RUBRIC 2: stops, lift-rests and tempo-ladder invent no note value shorter than the passage's shortest", () => {
    each((d, r, label) => {
      if (!["stops", "lift-rests", "tempo-ladder"].includes(d.family)) return;
      // A hand with two voices in different rhythms is quoted as one line until voices are kept apart (#13).
      if (new Set(r.passage.events.map((e) => `${e.staff}/${e.voice}`)).size > (r.passage.hand === "both" ? 2 : 1)) return;
      const rank = (t: string | null) => TYPE_RANK.indexOf(t ?? "quarter");
      const shortest = Math.max(...r.passage.events.filter((e) => e.pitch && !e.grace).map((e) => rank(e.written.type)));
      for (const e of d.score.events) if (e.pitch) expect(rank(e.written.type), label).toBeLessThanOrEqual(shortest);
    });
  });

  test("DRILL-RUBRIC 7 'Says what to do': no '(s)' hedges; no 'n of N' label on a note, where it reads as a fingering", () => {
    each((d, _r, label) => {
      expect(`${d.title} ${d.teacherNote} ${d.studentNote} ${d.warnings.map((w) => w.message).join(" ")}`, label).not.toMatch(/\(s\)/);
      for (const e of d.score.events) if (e.words) expect(e.words, label).not.toMatch(/^\s*\d+\s*(of|\/)\s*\d+/);
    });
  });

  test("DRILL-RUBRIC scale-rhythm / thumb-pairs: scales in the passage's key and mode (tonal Scale.get / Key.minorKey)", () => {
    each((d, r, label) => {
      if (d.family !== "scale-rhythm" && d.family !== "thumb-pairs") return;
      const pk = passageKey(r.passage);
      const form = writableForm(pk, "harmonic", r.passage);
      // Reference: tonal (Scale.get for major, Key.minorKey(tonic)[form].scale for minor).
      const allowed = new Set(keyScaleNotes(pk, form));
      for (const e of d.score.events) if (e.pitch) expect(allowed.has(Note.pitchClass(pitchName(e.pitch))), `${label} ${pitchName(e.pitch)}`).toBe(true);
      if (d.family === "scale-rhythm") expect(d.title.startsWith(keyLabel(pk, form)), `${label}: ${d.title}`).toBe(true);
    });
  });

  test("DRILL-RUBRIC tempo-ladder: marks in the meter's beat (a dotted quarter in 6/8)", () => {
    each((d, r, label) => {
      if (d.family !== "tempo-ladder" || !isCompound(r.passage.time)) return;
      expect(d.tempo.beat?.symbol, label).toMatch(/\.$/);
      expect(d.title, label).toContain(`${d.tempo.beat!.symbol} =`);
    });
  });

  test("DRILL-RUBRIC 8 and sequence: no empty drill, and a sequence states its figure at least twice (it moves)", () => {
    each((d, _r, label) => {
      expect(d.score.events.some((e) => e.pitch), label).toBe(true);
      if (d.family === "sequence") expect(d.warnings.some((w) => /Stopped after [01] repetition/.test(w.message)), label).toBe(false);
    });
  });

  test("every bar of every staff and voice sums to its time signature (MusicXML 4.0 <time>)", () => {
    each((d, _r, label) => {
      for (const m of d.score.measures) {
        const sums = new Map<string, Fraction>();
        for (const e of d.score.events) {
          if (e.measure !== m.index || e.chord || e.grace) continue;
          const k = `${e.staff}/${e.voice}`;
          sums.set(k, (sums.get(k) ?? new Fraction(0)).add(e.duration));
        }
        for (const [k, sum] of sums) expect(sum.equals(barLength(m.time)), `${label} bar ${m.number} ${k}`).toBe(true);
      }
    });
  });

  test.runIf(hasXmllint())("6/8 regroupings are written as 2:3 and 4:3 tuplets that validate against the MusicXML 4.0 XSD", () => {
    const p = makePassage({ time: { beats: 6, beatType: 8 }, right: "C4/8 D4/8 E4/8 F4/8 G4/8 A4/8 B4/8 C5/8 D5/8 E5/8 F5/8 G5/8", left: "C3/4. G3/4. C3/4. G3/4.", tempo: 90 });
    const { drills } = generateDrills(p, { seed: 1 });
    const xml = drills.map((d) => writeMusicXML(d.score));
    // W3C MusicXML 4.0 schema (vendored copy in fixtures/reference).
    expect(validateAll(xml).filter((e) => e.length)).toEqual([]);
    const duplets = xml[drills.findIndex((d) => d.variant === "duplets")];
    expect(duplets).toContain("<time-modification><actual-notes>2</actual-notes><normal-notes>3</normal-notes></time-modification>");
  });
});
