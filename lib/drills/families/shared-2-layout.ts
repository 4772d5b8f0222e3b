/**
 * Timeline helpers for the second group of drill families: passage notes at absolute onsets
 * turned into back-to-back slots (gaps become rests), tuplet ratios for durations that need them,
 * two voices on one staff, prescribed fingering, and a bar check per staff and voice.
 */
import Fraction from "fraction.js";
import type { Hand, NoteEvent, Passage, Pitch, Score, Sonority } from "../../score/types";
import { barLength, buildDrill, type DrillSpec, type Segment, type Slot, type SlotNote } from "../build";
import { measureSpan } from "../span";
import type { Drill, DrillContext, DrillWarning, SpanReport } from "../types";

type Tuplet = { readonly actual: number; readonly normal: number };

const isPowerOfTwo = (n: bigint) => n > 0n && (n & (n - 1n)) === 0n;

/**
 * The tuplet ratio a duration needs to be written, or undefined for plain values: the hint first
 * (the source note's ratio), then triplets, quintuplets, sextuplets and septuplets.
 * @example tupletFor(new Fraction(1, 3)) // { actual: 3, normal: 2 }
 */
export function tupletFor(duration: Fraction, hint?: Tuplet | null): Tuplet | undefined {
  if (isPowerOfTwo(duration.d)) return undefined;
  const candidates: Tuplet[] = [...(hint ? [hint] : []), { actual: 3, normal: 2 }, { actual: 5, normal: 4 }, { actual: 6, normal: 4 }, { actual: 7, normal: 4 }];
  return candidates.find((t) => isPowerOfTwo(duration.mul(t.actual, t.normal).d)) ?? candidates[0];
}

/** Something that sounds at an absolute onset for a time: notes, or nothing (a rest). */
export interface TimedItem {
  readonly onset: Fraction;
  readonly duration: Fraction;
  readonly notes: readonly SlotNote[];
  readonly tuplet?: Tuplet | null;
  readonly marks?: Slot["marks"];
  readonly words?: string;
  readonly dynamic?: string;
}

/**
 * Back-to-back slots from timed items starting at `origin`: gaps become rests and an item that
 * overlaps the next is cut at the next onset; `end` pads with a final rest.
 * @example timelineSlots([{ onset: q(1), duration: q(1), notes }], q(0)) // [rest 1, note 1]
 */
export function timelineSlots(items: readonly TimedItem[], origin: Fraction, end?: Fraction): Slot[] {
  const sorted = [...items].sort((a, b) => a.onset.compare(b.onset));
  const slots: Slot[] = [];
  let t = origin;
  sorted.forEach((it, i) => {
    if (it.onset.compare(t) < 0) return;
    if (it.onset.compare(t) > 0) slots.push(restOf(it.onset.sub(t)));
    const next = sorted[i + 1]?.onset;
    let dur = it.duration;
    if (next && it.onset.add(dur).compare(next) > 0) dur = next.sub(it.onset);
    if (dur.compare(0) <= 0) return;
    const tuplet = tupletFor(dur, it.tuplet);
    slots.push({
      duration: dur,
      notes: it.notes,
      ...(tuplet ? { tuplet } : {}),
      ...(it.marks ? { marks: it.marks } : {}),
      ...(it.words ? { words: it.words } : {}),
      ...(it.dynamic ? { dynamic: it.dynamic } : {}),
    });
    t = it.onset.add(dur);
  });
  if (end && end.compare(t) > 0) slots.push(restOf(end.sub(t)));
  return slots;
}

/**
 * A rest slot with the tuplet ratio its length needs.
 * @example restOf(new Fraction(2, 3)).tuplet // { actual: 3, normal: 2 }
 */
export function restOf(duration: Fraction): Slot {
  const tuplet = tupletFor(duration);
  return { duration, notes: [], ...(tuplet ? { tuplet } : {}) };
}

/**
 * A slot note with a fingering prescribed by the drill itself (marked "drill" in the drill).
 * @example fingered(pitchFromName("C4"), 1).fingering // [{ finger: 1 }]
 */
export function fingered(pitch: Pitch, finger: number): SlotNote {
  return { pitch, fingering: [{ finger }] };
}

/**
 * A passage sonority as a timed item (its notes keep their fingering).
 * @example sonorityItem(passage.sonorities.right[0]).notes.length
 */
export function sonorityItem(s: Sonority, notes: readonly NoteEvent[] = s.notes): TimedItem {
  return {
    onset: s.onset,
    duration: s.duration,
    notes: notes.map((e) => ({ pitch: e.pitch!, source: e })),
    tuplet: notes[0]?.written.tuplet ?? null,
  };
}

/**
 * Where the passage's music starts: its first bar's start, and the lead that keeps a pickup in place.
 * @example passageOrigin(passage).origin.toFraction() // "0"
 */
export function passageOrigin(passage: Passage): { origin: Fraction; end: Fraction } {
  const first = passage.measures[0];
  const last = passage.measures[passage.measures.length - 1];
  const origin = first ? first.start : new Fraction(0);
  const end = last ? last.start.add(last.length) : origin;
  return { origin, end };
}

/**
 * A one-staff drill with two voices: `upper` as voice 1 and `lower` as voice 2, both in `hand`.
 * The span is measured over both voices together, as one hand plays them.
 * @example buildVoicedDrill(passage, spec, "right", upperSlots, lowerSlots, ctx).score.parts[0].staves // 1
 */
export function buildVoicedDrill(
  passage: Passage,
  spec: Omit<DrillSpec, "segments" | "hands">,
  hand: Hand,
  upper: readonly Slot[],
  lower: readonly Slot[],
  ctx: DrillContext,
): Drill {
  const segments: Segment[] = [{ right: upper, left: lower }];
  const raw = buildDrill(passage, { ...spec, segments, hands: "both", oneHand: hand }, ctx);
  const clef = raw.score.measures[0]?.clefs.find((c) => c.staff === 1) ?? { staff: 1, sign: "G" as const, line: 2 };
  const mean = meanMidi(raw.score.events);
  const oneClef = mean >= 58 ? { ...clef, sign: "G" as const, line: 2 } : { ...clef, sign: "F" as const, line: 4 };
  const events = raw.score.events
    .map((e) => ({ ...e, staff: 1, voice: e.staff === 2 ? "2" : "1" }))
    .sort((a, b) => a.onset.compare(b.onset) || Number(a.voice) - Number(b.voice) || (a.pitch?.midi ?? 0) - (b.pitch?.midi ?? 0));
  const warnings: DrillWarning[] = raw.warnings.filter((w) => w.code !== "span");
  const report = measureSpan(events, ctx.profile);
  const maxSpan: { right?: SpanReport; left?: SpanReport } = report ? { [hand]: report } : {};
  if (report?.overComfortable) {
    warnings.push({ code: "span", message: `The ${hand} hand needs ${report.semitones} semitones (${Math.round(report.mm)} mm), more than its comfortable span.` });
  }
  const score: Score = {
    ...raw.score,
    parts: raw.score.parts.map((p) => ({ ...p, staves: 1 })),
    measures: raw.score.measures.map((m) => ({ ...m, clefs: [oneClef] })),
    events,
  };
  return { ...raw, hands: hand, score, maxSpan, warnings };
}

function meanMidi(events: readonly NoteEvent[]): number {
  const m = events.filter((e) => e.pitch).map((e) => e.pitch!.midi);
  return m.length ? m.reduce((a, b) => a + b, 0) / m.length : 60;
}

/**
 * Bars whose notes and rests, per staff and voice, do not add up to the time signature
 * (MusicXML 4.0 `<time>`: beats × 4 / beat-type quarter notes). Empty when every bar is exact.
 * @example barProblems(drill.score) // []
 */
export function barProblems(score: Score): string[] {
  const problems: string[] = [];
  for (const m of score.measures) {
    const sums = new Map<string, Fraction>();
    for (const e of score.events) {
      if (e.measure !== m.index || e.chord || e.grace) continue;
      const k = `${e.staff}/${e.voice}`;
      sums.set(k, (sums.get(k) ?? new Fraction(0)).add(e.duration));
    }
    for (const [k, sum] of sums) {
      if (!sum.equals(barLength(m.time))) problems.push(`bar ${m.number} staff/voice ${k}: ${sum.toFraction()}`);
    }
  }
  return problems;
}
