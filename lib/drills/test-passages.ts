/**
 * Hand-built passages for drill tests, from a tiny text notation:
 * `"C4/8@1 D4/8 [C4,E4,G4]/4@1,3,5 r/4 E4/8t"` — note or chord, `/` note value (1 2 4 8 16),
 * dots, `t` for a triplet (3 in the time of 2), `@` the fingering (one per chord note).
 */
import Fraction from "fraction.js";
import type { Hand, KeySignature, Measure, NoteEvent, NoteGroup, Passage, Sonority, TimeSignature } from "../score/types";
import { pitchFromName } from "./spell";
import { barLength } from "./layout";

export interface PassageSpec {
  readonly right?: string;
  readonly left?: string;
  readonly time?: TimeSignature;
  readonly key?: KeySignature;
  /** Length of a pickup bar in quarter notes. */
  readonly pickup?: Fraction;
  readonly tempo?: number;
}

const TYPES: Record<string, string> = { "1": "whole", "2": "half", "4": "quarter", "8": "eighth", "16": "16th", "32": "32nd" };

function parseHand(text: string, hand: Hand, staff: number, start: Fraction, ids: { n: number }): NoteEvent[] {
  const out: NoteEvent[] = [];
  let t = start;
  for (const tok of text.trim().split(/\s+/).filter(Boolean)) {
    const m = /^(\[[^\]]+\]|r|[A-G][#b]*-?\d)\/(\d+)(\.*)(t?)(?:@([\d,]+))?$/.exec(tok);
    if (!m) throw new Error(`bad token: ${tok}`);
    const [, head, denom, dots, trip, fing] = m;
    let dur = new Fraction(4, Number(denom));
    for (let i = 1, add = dur; i <= dots.length; i++) { add = add.div(2); dur = dur.add(add); }
    if (trip) dur = dur.mul(2, 3);
    const written = { type: TYPES[denom] ?? null, dots: dots.length, tuplet: trip ? { actual: 3, normal: 2 } : null };
    const names = head === "r" ? [] : head.startsWith("[") ? head.slice(1, -1).split(",") : [head];
    const fingers = fing ? fing.split(",").map(Number) : [];
    const base = { part: "P1", staff, voice: String(staff), measure: 0, onset: t, duration: dur, written, tie: "none" as const };
    if (names.length === 0) out.push({ ...base, id: `n${++ids.n}`, pitch: null, chord: false });
    names.map(pitchFromName).sort((a, b) => a.midi - b.midi).forEach((pitch, i) => {
      const f = fingers[i];
      out.push({ ...base, id: `n${++ids.n}`, pitch, chord: i > 0, ...(f ? { fingering: [{ finger: f }], fingeringSource: "score" as const } : {}) });
    });
    t = t.add(dur);
  }
  void hand;
  return out;
}

function sonoritiesOf(events: readonly NoteEvent[], hand: Hand): Sonority[] {
  const map = new Map<string, NoteEvent[]>();
  for (const e of events) if (e.pitch && !e.grace) map.set(e.onset.toFraction(), [...(map.get(e.onset.toFraction()) ?? []), e]);
  return [...map.values()]
    .map((notes) => ({
      hand,
      onset: notes[0].onset,
      duration: notes.reduce((d, n) => (n.duration.compare(d) > 0 ? n.duration : d), new Fraction(0)),
      notes: [...notes].sort((a, b) => a.pitch!.midi - b.pitch!.midi),
    }))
    .sort((a, b) => a.onset.compare(b.onset));
}

function beatGroups(sons: readonly Sonority[], hand: Hand, beat: Fraction, origin: Fraction): NoteGroup[] {
  const groups: NoteGroup[] = [];
  for (const s of sons) {
    const idx = s.onset.sub(origin).div(beat).floor();
    const last = groups[groups.length - 1];
    if (last && last.onset.sub(origin).div(beat).floor().equals(idx)) {
      groups[groups.length - 1] = { ...last, sonorities: [...last.sonorities, s], duration: s.onset.add(s.duration).sub(last.onset) };
    } else groups.push({ hand, kind: "beat", onset: s.onset, duration: s.duration, sonorities: [s] });
  }
  return groups;
}

/**
 * A passage of one piano part from text, one or both hands.
 *
 * @example
 * const p = makePassage({ right: "C4/8@1 D4/8 E4/8 F4/8 G4/2" });
 * p.sonorities.right.length; // 5
 */
export function makePassage(spec: PassageSpec): Passage {
  const time = spec.time ?? { beats: 4, beatType: 4 };
  const key = spec.key ?? { fifths: 0, mode: "major" };
  const bar = barLength(time);
  const pickup = spec.pickup ?? new Fraction(0);
  const ids = { n: 0 };
  const right = spec.right ? parseHand(spec.right, "right", 1, new Fraction(0), ids) : [];
  const left = spec.left ? parseHand(spec.left, "left", 2, new Fraction(0), ids) : [];
  const end = [...right, ...left].reduce((m, e) => (e.onset.add(e.duration).compare(m) > 0 ? e.onset.add(e.duration) : m), new Fraction(0));
  const starts: Fraction[] = [new Fraction(0)];
  let s = pickup.compare(0) > 0 ? pickup : bar;
  while (s.compare(end) < 0) { starts.push(s); s = s.add(bar); }
  const measures: Measure[] = starts.map((start, i) => ({
    index: i, number: String(pickup.compare(0) > 0 ? i : i + 1), implicit: i === 0 && pickup.compare(0) > 0,
    start, length: i === 0 && pickup.compare(0) > 0 ? pickup : bar, time, key,
    clefs: [{ staff: 1, sign: "G", line: 2 }, { staff: 2, sign: "F", line: 4 }],
    divisions: 12, changes: [], ...(i === 0 && spec.tempo ? { tempo: spec.tempo } : {}),
  }));
  const measureOf = (t: Fraction) => starts.filter((st) => st.compare(t) <= 0).length - 1;
  const events = [...right, ...left]
    .map((e) => ({ ...e, measure: measureOf(e.onset) }))
    .sort((a, b) => a.onset.compare(b.onset) || a.staff - b.staff || (a.pitch?.midi ?? 0) - (b.pitch?.midi ?? 0));
  const beat = time.beatType === 8 && time.beats % 3 === 0 ? new Fraction(3, 2) : new Fraction(4, time.beatType);
  const origin = pickup.compare(0) > 0 ? pickup.sub(bar) : new Fraction(0);
  const sr = sonoritiesOf(right, "right");
  const sl = sonoritiesOf(left, "left");
  return {
    part: "P1",
    hand: spec.right && spec.left ? "both" : spec.left ? "left" : "right",
    from: 0,
    to: measures.length - 1,
    measures,
    events,
    sonorities: { right: sr, left: sl },
    groups: { right: beatGroups(sr, "right", beat, origin), left: beatGroups(sl, "left", beat, origin) },
    key,
    time,
    meta: { title: "Study in C", composer: "Knotwork" },
    staffOf: { right: 1, left: 2 },
  };
}

/**
 * A drill staff as text, one item per sonority: `"C4+E4:1/2"`, rests as `"r:1"`; marks after `!`.
 *
 * @example
 * drillText(drill.score.events, 1); // ["C4+E4+G4:2", "D4+F4+A4:2"]
 */
export function drillText(events: readonly NoteEvent[], staff = 1): string[] {
  const out: string[] = [];
  for (const e of events.filter((x) => x.staff === staff)) {
    const name = e.pitch ? `${e.pitch.step}${e.pitch.alter > 0 ? "#".repeat(e.pitch.alter) : "b".repeat(-e.pitch.alter)}${e.pitch.octave}` : "r";
    if (e.chord) {
      const [head, dur] = out[out.length - 1].split(":");
      out[out.length - 1] = `${head}+${name}:${dur}`;
    } else out.push(`${name}:${e.duration.toFraction()}${e.marks?.length ? `!${e.marks.join(",")}` : ""}`);
  }
  return out.map((s) => {
    const [body, marks] = s.split("!");
    const [head, dur] = body.split(":");
    return marks ? `${head}:${dur}!${marks}` : `${head}:${dur}`;
  });
}
