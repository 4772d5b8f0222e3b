// Every drill from every demo knot: full bars, keyboard range, fingering sources, and — written with
// writeMusicXML — valid against the MusicXML 4.0 XSD and read back by verovio with the same notes.
import { beforeAll, describe, expect, test } from "vitest";
import { writeMusicXML } from "../../lib/score";
import { barLength } from "../../lib/drills/build";
import { families, generateDrills } from "../../lib/drills";
import type { Drill } from "../../lib/drills/types";
import { hasXmllint } from "../support/xmllint";
import { validateAll } from "./xsd-batch";
import { verovioNotes, verovioToolkit } from "../support/verovio";
import { DEMO_KNOTS, knotPassage } from "./knots";

const all = DEMO_KNOTS.flatMap((knot) => {
  const { drills, skipped } = generateDrills(knotPassage(knot), { seed: 11 });
  return [{ knot, drills, skipped }];
});
const drills: { name: string; drill: Drill }[] = all.flatMap(({ knot, drills }) =>
  drills.map((drill, i) => ({ name: `${knot.name} #${i} ${drill.family}/${drill.variant}`, drill })),
);

describe("drills from the demo knots", () => {
  beforeAll(async () => {
    await verovioToolkit();
  });

  test("every family writes at least one drill on some demo knot", () => {
    const written = new Set(drills.map((d) => d.drill.family));
    // The ornaments family needs grace notes; it must say so where a knot has none.
    const graceless = DEMO_KNOTS.every((k) => !knotPassage(k).events.some((e) => e.grace));
    const missing = [...Object.keys(families)].filter((id) => !written.has(id));
    expect(missing).toEqual(graceless ? ["ornaments"].filter((id) => missing.includes(id)) : []);
    if (graceless) for (const { skipped } of all) expect(skipped.find((s) => s.family === "ornaments")?.reason).toMatch(/no grace notes/);
  });

  test("every bar of every staff sums to its time signature (MusicXML 4.0 <time>)", () => {
    for (const { name, drill } of drills) {
      for (const m of drill.score.measures) {
        for (let staff = 1; staff <= drill.score.parts[0].staves; staff++) {
          const voices = new Set(drill.score.events.filter((e) => e.staff === staff).map((e) => e.voice));
          for (const voice of voices) {
            const sum = drill.score.events
              .filter((e) => e.measure === m.index && e.staff === staff && e.voice === voice && !e.chord && !e.grace)
              .reduce((s, e) => s + e.duration.valueOf(), 0);
            expect(sum, `${name} bar ${m.number} staff ${staff}`).toBeCloseTo(barLength(m.time).valueOf(), 9);
          }
        }
      }
    }
  });

  test("pitches stay within A0 = 21 … C8 = 108 (FACTS.md §1); notes have a fingering source; notes are written", () => {
    for (const { name, drill } of drills) {
      const notes = drill.score.events.filter((e) => e.pitch);
      expect(notes.length, name).toBeGreaterThan(0);
      for (const e of notes) {
        expect(e.pitch!.midi, name).toBeGreaterThanOrEqual(21);
        expect(e.pitch!.midi, name).toBeLessThanOrEqual(108);
        expect(["score", "estimated", "drill", "none"]).toContain(drill.fingeringSource[e.id]);
      }
      expect(drill.teacherNote.length, name).toBeGreaterThan(10);
      expect(drill.studentNote.length, name).toBeGreaterThan(10);
    }
  });

  test.runIf(hasXmllint())("every drill validates against the MusicXML 4.0 XSD", () => {
    // W3C MusicXML 4.0 schema (vendored copy in fixtures/reference), read once for all drills.
    const errors = validateAll(drills.map(({ drill }) => writeMusicXML(drill.score)));
    drills.forEach(({ name }, i) => expect(errors[i], name).toEqual([]));
  });

  test("the same seed writes the same drills again (no clock, unseeded random or leftover state)", () => {
    for (const knot of DEMO_KNOTS) {
      const again = generateDrills(knotPassage(knot), { seed: 11 }).drills.map((d) => writeMusicXML(d.score));
      const first = all.find((a) => a.knot === knot)!.drills.map((d) => writeMusicXML(d.score));
      expect(again, knot.name).toEqual(first);
    }
  });

  test("verovio (reference reader) reads every drill back with the same notes", async () => {
    for (const { name, drill } of drills) {
      const ours = drill.score.events
        .filter((e) => e.pitch && !e.grace && e.tie !== "stop" && e.tie !== "continue")
        .map((e) => `${e.onset.valueOf().toFixed(3)}:${e.staff}:${e.pitch!.midi}`)
        .sort();
      const theirs = (await verovioNotes(writeMusicXML(drill.score), { mergeTies: true }))
        .map((n) => `${n.onset.toFixed(3)}:${n.staff}:${n.midi}`)
        .sort();
      expect(theirs, name).toEqual(ours);
    }
  });
});
