/**
 * Per-bar facts for one hand of one part: rule points, the widest stretch and the counts behind the
 * plain-word reasons of the difficulty map.
 */
import type { Hand, KeySignature, NoteEvent, Pitch, Score } from "../score/types";
import { estimateFingering } from "./fingering";
import type { FingeringModel, RuleCosts } from "./fingering-rules";
import { keyDistanceMm } from "./hand";

/** What one bar asks of one hand. */
export interface BarFacts {
  readonly cost: number;
  readonly rules: RuleCosts | null;
  readonly notes: number;
  /** Widest stretch held in one position: semitones, mm on the profile's keyboard, spelled pitches. */
  readonly span: { readonly semitones: number; readonly mm: number; readonly low: Pitch; readonly high: Pitch } | null;
  /** Repeated keys struck by finger 4 or 5. */
  readonly weakRepeats: number;
}

/** Share of a voice's notes one staff must hold to be the voice's home staff. */
const HOME_SHARE = 0.75;

/**
 * Home staff of each voice of a part (key `part|voice`): the staff that holds at least 75% of the
 * voice's notes. Notation programs keep a voice's number when its notes cross to the other staff of a
 * piano part (a left-hand arpeggio written on the treble staff), so a note away from its voice's home
 * staff is played by the home staff's hand. A voice spread evenly over both staves has no home.
 *
 * @example
 * voiceHomes(score.events).get("P1|5") // 2
 */
export function voiceHomes(events: readonly NoteEvent[]): Map<string, number> {
  const counts = new Map<string, Map<number, number>>();
  for (const e of events) {
    if (!e.pitch) continue;
    const key = `${e.part}|${e.voice}`;
    const byStaff = counts.get(key) ?? new Map<number, number>();
    byStaff.set(e.staff, (byStaff.get(e.staff) ?? 0) + 1);
    counts.set(key, byStaff);
  }
  const homes = new Map<string, number>();
  for (const [key, byStaff] of counts) {
    const total = [...byStaff.values()].reduce((a, b) => a + b, 0);
    for (const [staff, n] of byStaff) if (n >= HOME_SHARE * total) homes.set(key, staff);
  }
  return homes;
}

/**
 * Split a score's notes by hand: in a part with two or more staves, staff 1 is the right hand and the
 * others the left — a note that crossed from its voice's home staff (`voiceHomes`) goes with the home
 * staff's hand; a one-staff part goes to the left hand under a bass (F) clef, else the right.
 *
 * @example
 * handsOf(score).get("P1")?.left.length
 */
export function handsOf(score: Score): Map<string, Record<Hand, NoteEvent[]>> {
  const out = new Map<string, Record<Hand, NoteEvent[]>>();
  const first = score.measures[0];
  const homes = voiceHomes(score.events);
  for (const part of score.parts) out.set(part.id, { right: [], left: [] });
  for (const e of score.events) {
    const part = score.parts.find((p) => p.id === e.part);
    const slot = out.get(e.part);
    if (!part || !slot) continue;
    let hand: Hand = "right";
    if (part.staves >= 2) hand = (homes.get(`${e.part}|${e.voice}`) ?? e.staff) === 1 ? "right" : "left";
    else if (first?.clefs.find((c) => c.staff === e.staff)?.sign === "F") hand = "left";
    slot[hand].push(e);
  }
  return out;
}

/**
 * Facts per bar index for one hand's events: rule points from the fingering estimate, the widest
 * stretch (notes struck together, and consecutive notes on different fingers without a crossing).
 *
 * @example
 * barFacts(events, "right", 4, 165.1, "parncutt", (m) => score.measures[m]?.key)[0].cost
 */
export function barFacts(events: readonly NoteEvent[], hand: Hand, bars: number, octaveMm: number, model: FingeringModel, keyOf?: (measure: number) => KeySignature | undefined): BarFacts[] {
  const { fingers, costPerBar, rulesPerBar } = estimateFingering(events, hand, { model, ...(keyOf ? { keyOf } : {}) });
  type Mutable = { -readonly [K in keyof BarFacts]: BarFacts[K] };
  const facts: Mutable[] = Array.from({ length: bars }, (_, i) => ({
    cost: costPerBar.get(i) ?? 0, rules: rulesPerBar.get(i) ?? null, notes: 0, span: null, weakRepeats: 0,
  }));
  const consider = (bar: number, a: Pitch, b: Pitch) => {
    const f = facts[bar];
    if (!f) return;
    const [low, high] = a.midi <= b.midi ? [a, b] : [b, a];
    const mm = keyDistanceMm(low.midi, high.midi, octaveMm);
    if (!f.span || mm > f.span.mm) f.span = { semitones: high.midi - low.midi, mm, low, high };
  };
  const struck = events.map((e, i) => ({ e, f: fingers[i] ?? null })).filter((x) => x.e.pitch && x.e.tie !== "stop" && x.e.tie !== "continue");
  const byOnset = new Map<number, typeof struck>();
  for (const x of struck) {
    const k = x.e.onset.valueOf();
    byOnset.set(k, [...(byOnset.get(k) ?? []), x]);
    if (facts[x.e.measure]) facts[x.e.measure]!.notes += 1;
  }
  const onsets = [...byOnset.keys()].sort((a, b) => a - b);
  let prev: typeof struck | null = null;
  for (const k of onsets) {
    const chord = byOnset.get(k)!;
    const bar = chord[0]!.e.measure;
    const pitches = chord.map((x) => x.e.pitch!).sort((a, b) => a.midi - b.midi);
    if (pitches.length > 1) consider(bar, pitches[0]!, pitches.at(-1)!);
    if (prev && prev.length === 1 && chord.length === 1) {
      const a = prev[0]!, b = chord[0]!;
      const up = b.e.pitch!.midi - a.e.pitch!.midi;
      const fingerUp = (b.f ?? 0) - (a.f ?? 0);
      const natural = hand === "right" ? up * fingerUp > 0 : up * fingerUp < 0;
      if (a.f && b.f && natural) consider(bar, a.e.pitch!, b.e.pitch!);
      if (up === 0 && (b.f === 4 || b.f === 5) && facts[bar]) facts[bar]!.weakRepeats += 1;
    }
    prev = chord;
  }
  return facts;
}

const ORDINALS = ["unison", "second", "third", "fourth", "fifth", "sixth", "seventh", "octave", "ninth", "tenth", "eleventh", "twelfth", "thirteenth", "fourteenth", "double octave"];
const STEPS = "CDEFGAB";

/**
 * Interval name from spelled pitches, by staff steps: C4–E5 is "a tenth".
 *
 * @example
 * intervalName({ step: "C", alter: 0, octave: 4, midi: 60 }, { step: "E", alter: 0, octave: 5, midi: 76 }) // "a tenth"
 */
export function intervalName(low: Pitch, high: Pitch): string {
  const steps = Math.abs(high.octave * 7 + STEPS.indexOf(high.step) - (low.octave * 7 + STEPS.indexOf(low.step)));
  const name = ORDINALS[steps] ?? `${steps + 1}th`;
  return `${/^[aeiou]/.test(name) ? "an" : "a"} ${name}`;
}
