/**
 * `octave-shift`: one group of the passage repeated in successive octaves, up and back or down
 * and back, within A0–C8, with a clef change at the bars where the music moves to the other staff
 * register — the hand learns the shape independent of where it sits on the keyboard.
 */
import { z } from "zod";
import type { Clef, Hand, Measure, Passage } from "../../score/types";
import { buildDrill, defaultTempo, passageHands, type Slot } from "../build";
import { countOf } from "../length";
import { shiftOctave } from "../spell";
import type { Drill, DrillContext, DrillFamily, FamilyResult } from "../types";
import { sonorityItem, timelineSlots } from "./shared-2-layout";
import { onPiano } from "./shared-2";

/** Options: which group, how many octaves away, which directions. */
export const octaveShiftOptions = z.object({
  group: z.number().int().min(0).default(0),
  octaves: z.number().int().min(1).max(4).default(2),
  directions: z.array(z.enum(["up", "down"])).min(1).default(["up", "down"]),
});
export type OctaveShiftOptions = z.output<typeof octaveShiftOptions>;

/**
 * Octave offsets for one direction: out to `n` and back (0, 1, 2, 1, 0 for "up", n = 2).
 * @example octavePath("down", 2) // [0, -1, -2, -1, 0]
 */
export function octavePath(direction: "up" | "down", n: number): number[] {
  const s = direction === "up" ? 1 : -1;
  const out = Array.from({ length: n + 1 }, (_, i) => i * s);
  return [...out, ...out.slice(0, -1).reverse()];
}

/** Treble or bass clef per bar by the bar's average pitch, with a change where it differs (common practice: switch around middle C). */
function withClefChanges(d: Drill): Drill {
  let current: Clef | undefined = d.score.measures[0]?.clefs[0];
  const measures: Measure[] = d.score.measures.map((m) => {
    const midis = d.score.events.filter((e) => e.measure === m.index && e.pitch).map((e) => e.pitch!.midi);
    if (!midis.length || !current) return { ...m, clefs: current ? [current] : m.clefs };
    const mean = midis.reduce((a, b) => a + b, 0) / midis.length;
    const treble: Clef = { staff: 1, sign: "G", line: 2 };
    const bass: Clef = { staff: 1, sign: "F", line: 4 };
    if (m.index === 0) current = mean >= 60 ? treble : bass;
    const want: Clef = m.index === 0 ? current : current.sign === "G" ? (mean < 57 ? bass : current) : mean > 64 ? treble : current;
    const changed = want !== current && m.index > 0;
    current = want;
    return { ...m, clefs: [want], changes: changed ? [...m.changes, { offset: m.start.sub(m.start), clef: want }] : m.changes };
  });
  return { ...d, score: { ...d.score, measures } };
}

function drillsForHand(passage: Passage, hand: Hand, o: OctaveShiftOptions, ctx: DrillContext): Drill[] {
  const groups = passage.groups[hand].filter((g) => g.sonorities.length > 0);
  if (groups.length === 0) return [];
  const g = groups[Math.min(o.group, groups.length - 1)];
  const end = g.onset.add(g.duration);
  const drills: Drill[] = [];
  for (const dir of o.directions) {
    const path = octavePath(dir, o.octaves).filter((k) => onPiano(g.sonorities.flatMap((s) => s.notes.map((n) => shiftOctave(n.pitch!, k)))));
    if (!path.some((k) => k !== 0)) continue;
    const slots: Slot[] = path.flatMap((k) =>
      timelineSlots(
        g.sonorities.map((s) => ({ ...sonorityItem(s), notes: s.notes.map((n) => (k === 0 ? { pitch: n.pitch!, source: n } : { pitch: shiftOctave(n.pitch!, k), like: n })) })),
        g.onset,
        end,
      ),
    );
    const reach = Math.max(...path.map(Math.abs));
    const warnings = reach < o.octaves ? [{ code: "range", message: `Only ${countOf(reach, "octave")} ${dir}: the keyboard ends there (A0–C8).` }] : [];
    drills.push(withClefChanges(buildDrill(passage, {
      family: "octave-shift", variant: dir, hands: hand, tempo: defaultTempo(passage), warnings,
      title: `Group in octaves ${dir} and back${passageHands(passage).length > 1 ? ` (${hand} hand)` : ""}`,
      teacherNote: "The same shape in another octave needs the arm to carry the hand there, so the fingers stop relying on one spot of the keyboard.",
      studentNote: `Play the group, then the same notes an octave ${dir === "up" ? "higher" : "lower"} each time, and back; let the arm move, keep the fingers' shape.`,
      segments: [{ [hand]: slots }],
    }, ctx)));
  }
  return drills;
}

/**
 * Generate the octave-shift drills (one per direction that fits on the keyboard).
 * @example generateOctaveShift(makePassage({ right: "C4/8 E4/8 G4/8 E4/8" }), octaveShiftOptions.parse({}), makeContext()).drills.length // 2
 */
export function generateOctaveShift(passage: Passage, options: OctaveShiftOptions, ctx: DrillContext): FamilyResult {
  const drills = passageHands(passage).flatMap((h) => drillsForHand(passage, h, options, ctx));
  return drills.length ? { drills } : { drills: [], skipped: "no group fits in another octave" };
}

/** The `octave-shift` family for the registry. */
export const octaveShift: DrillFamily<typeof octaveShiftOptions> = {
  id: "octave-shift",
  label: "Octave shifts",
  describe: "One group repeated in successive octaves up or down and back, within the keyboard, with clef changes where needed.",
  options: octaveShiftOptions,
  generate: generateOctaveShift,
};
