/**
 * `sequence`: a short figure of the passage moved by an interval at each repetition — by scale
 * steps in the key (default) or by semitones — and a contrary-motion mirror for the other hand.
 * Repetitions stop at the keyboard's ends and, with safety on, before a chord grows past the
 * hand profile; both are reported as warnings.
 */
import type Fraction from "fraction.js";
import { z } from "zod";
import type { Hand, KeySignature, Passage, Pitch, Sonority } from "../../score/types";
import { buildDrill, defaultTempo, passageHands, type Slot, type SlotNote } from "../build";
import { measureSpan, pitchSpan } from "../span";
import { asSignature, passageKey, writableForm, type MinorForm } from "../key-mode";
import { countOf } from "../length";
import { spellMidi } from "../spell";
import type { Drill, DrillContext, DrillFamily, DrillWarning, FamilyResult, HandProfile } from "../types";
import { restOf, tupletFor } from "./shared-2-layout";
import { degreeDistance, diatonicShift, onPiano } from "./shared-2";

/** Options: diatonic or chromatic motion, the step, repetitions, figure length, the mirror. */
export const sequenceOptions = z.object({
  motion: z.enum(["diatonic", "chromatic"]).default("diatonic"),
  /** Scale steps per repetition (diatonic); negative moves down. */
  steps: z.number().int().min(-7).max(7).refine((n) => n !== 0, "a sequence must move").default(1),
  /** Semitones per repetition (chromatic); negative moves down. */
  semitones: z.number().int().min(-12).max(12).refine((n) => n !== 0, "a sequence must move").default(1),
  repetitions: z.number().int().min(2).max(12).default(4),
  figureNotes: z.number().int().min(2).max(12).default(4),
  mirror: z.boolean().default(true),
});
export type SequenceOptions = z.output<typeof sequenceOptions>;

/**
 * Pitch of `p` in repetition `k`: k × steps scale degrees (diatonic, in the passage's key), or
 * k × semitones spelled the key's way (chromatic: flats in flat keys, sharps in sharp keys).
 * @example movePitch(pitchFromName("E4"), 1, sequenceOptions.parse({}), { fifths: 0, mode: "major" }) // F4
 */
export function movePitch(p: Pitch, k: number, o: SequenceOptions, key: KeySignature, form: MinorForm = "harmonic"): Pitch {
  if (k === 0) return p;
  if (o.motion === "diatonic") return diatonicShift(p, k * o.steps, key, form);
  const by = k * o.semitones;
  return spellMidi(p.midi + by, key, by > 0 ? "up" : "down");
}

/**
 * The contrary-motion mirror of `p` around `axis`, landing on `target` (the axis in the other
 * hand): scale degrees reflected (diatonic) or semitones reflected (chromatic).
 * @example mirrorPitch(pitchFromName("C4"), pitchFromName("E4"), pitchFromName("C3"), sequenceOptions.parse({}), { fifths: 0, mode: "major" }) // A2
 */
export function mirrorPitch(axis: Pitch, p: Pitch, target: Pitch, o: SequenceOptions, key: KeySignature, form: MinorForm = "harmonic"): Pitch {
  if (o.motion === "diatonic") return diatonicShift(target, -degreeDistance(axis, p, key), key, form);
  const by = p.midi - axis.midi;
  return spellMidi(target.midi - by, key, by > 0 ? "down" : "up");
}

/** The figure: the first sonorities of the hand, with their durations up to the next one. */
function figureOf(sons: readonly Sonority[], n: number): { sons: Sonority[]; durations: Fraction[] } {
  const fig = sons.slice(0, n);
  const durations = fig.map((s, i) => (fig[i + 1] ? fig[i + 1].onset.sub(s.onset) : s.duration));
  return { sons: fig, durations };
}

/**
 * True when a chord of the drill, after the first `from` quarter notes, is over the profile
 * (measured per staff as the drill reports spans, fingering included).
 * @example overAfter(drill, new Fraction(2), PROFILE) // false
 */
export function overAfter(d: Drill, from: Fraction, profile: HandProfile): boolean {
  const late = d.score.events.filter((e) => e.onset.compare(from) >= 0);
  return [1, 2].some((staff) => measureSpan(late.filter((e) => e.staff === staff), profile)?.overComfortable ?? false);
}

function over(pitches: readonly Pitch[], profile: HandProfile): boolean {
  return pitches.length > 1 && pitchSpan(pitches, profile).overComfortable;
}

function drillsForHand(passage: Passage, hand: Hand, o: SequenceOptions, ctx: DrillContext): Drill[] {
  const { sons, durations } = figureOf(passage.sonorities[hand], o.figureNotes);
  if (sons.length < 2) return [];
  const pk = passageKey(passage);
  const key = asSignature(pk);
  const form = writableForm(pk, "harmonic", passage);
  const other: Hand = hand === "right" ? "left" : "right";
  const axis = sons[0].notes[0].pitch!;
  const target: Pitch = { ...axis, octave: axis.octave + (hand === "right" ? -1 : 1), midi: axis.midi + (hand === "right" ? -12 : 12) };
  const warnings: DrillWarning[] = [];
  const reps: { main: Pitch[][]; mirror: Pitch[][] }[] = [];
  let withMirror = o.mirror;
  for (let k = 0; k < o.repetitions; k++) {
    let main: Pitch[][] = [];
    let mirror: Pitch[][] = [];
    let fits = true;
    try {
      main = sons.map((s) => s.notes.map((n) => movePitch(n.pitch!, k, o, key, form)));
      if (k === 0 && withMirror) {
        try {
          mirror = main.map((ps) => ps.map((p) => mirrorPitch(axis, p, target, o, key, form)));
        } catch {
          mirror = [];
        }
        if (!mirror.length || !onPiano(mirror.flat())) {
          // The figure upside down an octave away leaves the keyboard: the sequence goes on alone.
          withMirror = false;
          warnings.push({ code: "range", message: "No mirror: upside down, the figure leaves the keyboard (A0–C8)." });
        }
      }
      if (withMirror) mirror = main.map((ps) => ps.map((p) => mirrorPitch(axis, p, target, o, key, form)));
      fits = onPiano([...main.flat(), ...(withMirror ? mirror.flat() : [])]);
    } catch {
      fits = false; // far off the keyboard: tonal cannot even name the note
    }
    if (!fits) {
      warnings.push({ code: "range", message: `Stopped after ${countOf(k, "repetition")}: the next one leaves the keyboard (A0–C8).` });
      break;
    }
    if (k === 0 && withMirror && ctx.safety && mirror.some((ps) => over(ps, ctx.profile))) {
      withMirror = false;
      warnings.push({ code: "span", message: "No mirror: upside down, a chord of the figure stretches past the hand profile." });
    }
    if (k > 0 && ctx.safety && [...main, ...(withMirror ? mirror : [])].some((ps) => over(ps, ctx.profile))) {
      warnings.push({ code: "span", message: `Stopped after ${countOf(k, "repetition")}: the next one stretches past the hand profile.` });
      break;
    }
    reps.push({ main, mirror });
  }
  const slotsOf = (which: "main" | "mirror", n: number): Slot[] =>
    reps.slice(0, n).flatMap((r, k) =>
      r[which].map((ps, i) => {
        const notes: SlotNote[] = ps.map((pitch, j) => (k === 0 && which === "main" ? { pitch, source: sons[i].notes[j] } : which === "main" ? { pitch, like: sons[i].notes[j] } : { pitch }));
        const tuplet = tupletFor(durations[i], sons[i].notes[0].written.tuplet);
        return { duration: durations[i], notes, ...(tuplet ? { tuplet } : {}) };
      }),
    );
  const figureLength = durations.reduce((a, b) => a.add(b));
  const motion = o.motion === "diatonic" ? countOf(Math.abs(o.steps), "scale step") : countOf(Math.abs(o.semitones), "semitone");
  const up = (o.motion === "diatonic" ? o.steps : o.semitones) > 0 ? "up" : "down";
  const make = (n: number, extra: readonly DrillWarning[]): Drill[] => {
    const base = { family: "sequence", tempo: defaultTempo(passage), warnings: [...warnings, ...extra] };
    const out = [
      buildDrill(passage, {
        ...base, variant: "sequence", hands: hand, title: `Figure moved ${up} by ${motion}${passageHands(passage).length > 1 ? ` (${hand} hand)` : ""}`,
        teacherNote: "Moving the figure through the key keeps its shape while the keys under the fingers change, so the hand learns the shape, not one set of keys.",
        studentNote: `Play the figure, then again ${motion} ${up}, keeping the same fingering shape and a steady pulse.`,
        segments: [{ [hand]: [...slotsOf("main", n), ...(n ? [] : [restOf(durations[0])])] }],
      }, ctx),
    ];
    if (withMirror) {
      out.push(buildDrill(passage, {
        ...base, variant: "mirror", hands: "both", title: `Figure with its mirror in the other hand${passageHands(passage).length > 1 ? ` (${hand} hand leads)` : ""}`,
        teacherNote: "In contrary motion both hands use the same fingers at the same moment, which makes the fingering easy to learn and to check.",
        studentNote: `The ${other} hand plays the figure upside down while the ${hand} hand plays it as written; match the fingers of both hands.`,
        segments: [{ [hand]: slotsOf("main", n), [other]: slotsOf("mirror", n) }],
      }, ctx));
    }
    return out;
  };
  // A "sequence" that never moves is no sequence (DRILL-RUBRIC sequence: a moved figure must move).
  if (reps.length < 2) return [];
  let drills = make(reps.length, []);
  if (!ctx.safety || reps.length <= 1) return drills;
  // With fingering, a moved chord can be over the profile even when its bare span is not:
  // keep fewer repetitions until nothing after the figure as written stretches past the profile.
  let n = reps.length;
  while (n > 1 && drills.some((d) => overAfter(d, figureLength, ctx.profile))) {
    n--;
    drills = make(n, [{ code: "span", message: `Stopped after ${countOf(n, "repetition")}: the next one stretches past the hand profile.` }]);
  }
  return n < 2 ? [] : drills;
}

/**
 * Generate the sequence drills: the figure moved, and its mirror in the other hand.
 * @example generateSequence(makePassage({ right: "C4/8 E4/8 G4/8 E4/8" }), sequenceOptions.parse({}), makeContext()).drills.length // 2
 */
export function generateSequence(passage: Passage, options: SequenceOptions, ctx: DrillContext): FamilyResult {
  const drills = passageHands(passage).flatMap((h) => drillsForHand(passage, h, options, ctx));
  return drills.length ? { drills } : { drills: [], skipped: "No figure of two or more notes that can move a step and stay on the keyboard and within the hand." };
}

/** The `sequence` family for the registry. */
export const sequence: DrillFamily<typeof sequenceOptions> = {
  id: "sequence",
  label: "Sequence and mirror",
  describe: "A short figure moved step by step through the key (or chromatically), with a contrary-motion mirror for the other hand.",
  options: sequenceOptions,
  generate: generateSequence,
};
