// Property tests over random passages (fast-check): the rules every drill must keep.
import fc from "fast-check";
import { Key, Note, Scale } from "tonal";
import { describe, expect, test } from "vitest";
import { families, generateDrills } from "../../lib/drills";
import { barLength } from "../../lib/drills/build";
import { pitchSpan } from "../../lib/drills/span";
import { passageKey, writableForm } from "../../lib/drills/key-mode";
import { pitchFromName, pitchName, spellMidi } from "../../lib/drills/spell";
import { makePassage } from "../../lib/drills/test-passages";
import { walkSteps } from "../../lib/drills/families/pivot-walk";
import type { Drill } from "../../lib/drills/types";

const TIMES = [
  { beats: 4, beatType: 4 },
  { beats: 3, beatType: 4 },
  { beats: 2, beatType: 4 },
  { beats: 6, beatType: 8 },
];
const VALUES = ["16", "8", "8", "4", "4", "8.", "2"];

/** One hand's text: notes or small chords around a centre, spelled in the key, with some fingering. */
const handText = (low: number, high: number, fifths: number) =>
  fc
    .array(
      fc.record({
        root: fc.integer({ min: low, max: high }),
        extra: fc.uniqueArray(fc.integer({ min: 1, max: 9 }), { maxLength: 2 }),
        value: fc.constantFrom(...VALUES),
        kind: fc.constantFrom("note", "note", "note", "chord", "rest"),
        finger: fc.option(fc.integer({ min: 1, max: 5 }), { nil: undefined }),
      }),
      { minLength: 3, maxLength: 14 },
    )
    .map((items) =>
      items
        .map(({ root, extra, value, kind, finger }) => {
          const key = { fifths, mode: "major" };
          if (kind === "rest") return `r/${value}`;
          const midis = kind === "chord" ? [root, ...extra.map((e) => Math.min(108, root + e))] : [root];
          const names = [...new Set(midis)].map((m) => pitchName(spellMidi(m, key)));
          const head = names.length > 1 ? `[${names.join(",")}]` : names[0];
          return `${head}/${value}${finger && names.length === 1 ? `@${finger}` : ""}`;
        })
        .join(" "),
    );

const passages = fc
  .record({ time: fc.constantFrom(...TIMES), fifths: fc.integer({ min: -6, max: 6 }), hands: fc.constantFrom("right", "left", "both") })
  .chain(({ time, fifths, hands }) =>
    fc.record({
      time: fc.constant(time),
      fifths: fc.constant(fifths),
      right: hands === "left" ? fc.constant(undefined) : handText(21, 108, fifths),
      // Both hands over the whole keyboard, A0 = 21 … C8 = 108 (FACTS.md §1).
      left: hands === "right" ? fc.constant(undefined) : handText(21, 108, fifths),
    }),
  )
  .map(({ time, fifths, right, left }) => makePassage({ time, key: { fifths, mode: "major" }, right, left }));

function checkBars(d: Drill) {
  for (const m of d.score.measures) {
    for (let staff = 1; staff <= d.score.parts[0].staves; staff++) {
      for (const voice of new Set(d.score.events.filter((e) => e.staff === staff).map((e) => e.voice))) {
        const sum = d.score.events
          .filter((e) => e.measure === m.index && e.staff === staff && e.voice === voice && !e.chord && !e.grace)
          .reduce((s, e) => s.add(e.duration), barLength(m.time).sub(barLength(m.time)));
        expect(sum.equals(barLength(m.time)), `${d.family}/${d.variant} bar ${m.number}`).toBe(true);
      }
    }
  }
}

/** Every family of the registry is checked as a group. */
const CHECKED = Object.keys(families);

describe("drill properties over random passages", () => {
  test("every drill of all seventeen families: exact bars and pitches within A0 = 21 … C8 = 108 (FACTS.md §1)", () => {
    expect(CHECKED.length).toBe(17);
    fc.assert(
      fc.property(passages, fc.integer({ min: 1, max: 1000 }), (passage, seed) => {
        const { drills } = generateDrills(passage, { seed, families: CHECKED });
        for (const d of drills) {
          checkBars(d);
          for (const e of d.score.events) if (e.pitch) expect(e.pitch.midi).toBeGreaterThanOrEqual(21);
          for (const e of d.score.events) if (e.pitch) expect(e.pitch.midi).toBeLessThanOrEqual(108);
        }
      }),
      { numRuns: 40 },
    );
  });

  test("scale-rhythm plays the passage key's scale: tonal's Scale.get / Key.minorKey notes (reference: tonal)", () => {
    fc.assert(
      fc.property(passages, (passage) => {
        const { drills } = generateDrills(passage, { families: ["scale-rhythm"] });
        // The key comes from the notes and the signature (a minor passage gets its harmonic minor).
        const pk = passageKey(passage);
        const form = writableForm(pk, "harmonic", passage);
        const pcs = pk.mode === "major" ? Scale.get(`${pk.tonic} major`).notes : Key.minorKey(pk.tonic)[form].scale;
        for (const d of drills) {
          const staff1 = d.score.events.filter((e) => e.pitch && e.staff === 1 && e.tie !== "stop" && e.tie !== "continue");
          const names = staff1.map((e) => Note.pitchClass(pitchName(e.pitch!)));
          expect(names.slice(0, 7)).toEqual(pcs);
          // Two octaves go on up; one octave (when two would pass the bar cap) turns back at the top.
          expect([pcs, [pcs[0], ...pcs.slice(1).reverse()]]).toContainEqual(names.slice(7, 14));
        }
      }),
      { numRuns: 25 },
    );
  });

  test("note-pairs: each drill shows n of N with N = a·b + a·C(b, 2) (combinatorics: every pair, then one key to two)", () => {
    fc.assert(
      fc.property(passages, (passage) => {
        const { drills } = generateDrills(passage, { families: ["note-pairs"], options: { "note-pairs": { maxCells: 1 } } });
        for (const d of drills) {
          // The title names both positions ("C4+E4 → D4+F4+A4"); a and b are their key counts.
          const [from, to] = /^Note pairs (\S+) → (\S+)/.exec(d.title)!.slice(1);
          const a = from.split("+").length;
          const b = to.split("+").length;
          const full = a * b + (a * b * (b - 1)) / 2;
          const m = /\((\d+) of (\d+) cells\)/.exec(d.title);
          if (full === 1) expect(m).toBeNull(); // one cell only: nothing to count
          else {
            expect(Number(m![1])).toBe(1);
            expect(Number(m![2])).toBe(full);
          }
        }
      }),
      { numRuns: 25 },
    );
  });

  test("pivot-walk steps are one semitone, sharps going up and flats going down (common practice); with safety never over the profile", () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 30, max: 100 }),
        fc.constantFrom<1 | -1>(1, -1),
        fc.uniqueArray(fc.integer({ min: -7, max: 7 }), { maxLength: 3 }),
        fc.integer({ min: 90, max: 230 }),
        (start, dir, offsets, spanMm) => {
          const profile = { spanMm, octaveMm: 165.1 };
          const p0 = spellMidi(start, { fifths: 0, mode: "major" });
          const others = offsets.filter((o) => o !== 0).map((o) => start + o);
          const otherPitches = others.map((m) => pitchFromName(Note.fromMidi(m)));
          const fits = (p: typeof p0) => !pitchSpan([...otherPitches, p], profile).overComfortable;
          const steps = walkSteps(p0, dir, 6, others, fits);
          let prev = p0;
          for (const s of steps) {
            expect(s.midi - prev.midi).toBe(dir);
            if (dir > 0) expect(s.alter).toBeGreaterThanOrEqual(0);
            else expect(s.alter).toBeLessThanOrEqual(0);
            expect(fits(s)).toBe(true);
            expect(others).not.toContain(s.midi);
            prev = s;
          }
        },
      ),
      { numRuns: 200 },
    );
  });

  test("with safety on, pivot-walk never writes a step past the profile", () => {
    fc.assert(
      fc.property(passages, fc.integer({ min: 100, max: 230 }), (passage, spanMm) => {
        const { drills } = generateDrills(passage, { families: ["pivot-walk"], profile: { spanMm, octaveMm: 165.1 } });
        for (const d of drills) expect(d.warnings.filter((w) => w.message.startsWith("With "))).toEqual([]);
      }),
      { numRuns: 25 },
    );
  });
});
