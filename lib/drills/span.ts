/**
 * Span and fingering for drill scores: the widest chord per hand against the hand profile, and
 * estimated fingering for notes the score left unfingered.
 */
import type { Hand, NoteEvent, Passage, Pitch } from "../score/types";
import type { FingeringMemo, HandProfile, SpanReport } from "./types";
import { DEFAULT_PROFILE, spanOf } from "./hand";
import { estimateFingering } from "./fingering";
import { mergeTies } from "../score/ties";

/** The profile drills use when none is given (hand.ts `DEFAULT_PROFILE`). */
export const PROFILE: HandProfile = DEFAULT_PROFILE;

/**
 * The widest stretch among notes that sound together in these events (one hand), or null when
 * there are no notes. "Together" means overlapping in time, not only struck together: a note held
 * (ties merged) while others are struck counts with them, as in a held-tone drill. The set of
 * sounding notes only grows at an onset, so each onset's sounding set is measured. Fingering
 * narrows the limit when every note of the set has one.
 *
 * @example
 * measureSpan(drill.score.events.filter((e) => e.staff === 1), PROFILE)?.semitones;
 */
export function measureSpan(events: readonly NoteEvent[], profile: HandProfile): SpanReport | null {
  const notes = mergeTies(events.filter((e) => e.pitch && !e.grace)).sort((a, b) => a.onset.compare(b.onset));
  if (notes.length === 0) return null;
  let worst: SpanReport | null = null;
  let sounding: { e: NoteEvent; end: number }[] = [];
  for (let i = 0; i < notes.length; ) {
    // Onsets as numbers: different onsets with small denominators never share a double.
    const t = notes[i]!.onset.valueOf();
    sounding = sounding.filter((s) => s.end > t);
    for (; i < notes.length && notes[i]!.onset.valueOf() === t; i++) {
      const e = notes[i]!;
      sounding.push({ e, end: e.onset.add(e.duration).valueOf() });
    }
    if (sounding.length < 2) continue;
    const set = sounding.map((s) => s.e);
    const fingers = set.map((e) => e.fingering?.[0]?.finger ?? null);
    const report = spanOf(set, fingers.every((f) => f !== null) ? fingers : null, profile);
    if (!worst || report.mm > worst.mm || (report.mm === worst.mm && report.overComfortable && !worst.overComfortable)) {
      worst = report;
    }
  }
  return worst ?? spanOf([notes[0]!], null, profile);
}

/**
 * Span of pitches one hand holds in one position (no fingering), for generators that move notes.
 *
 * @example
 * pitchSpan([pitchFromName("C4"), pitchFromName("E5")], PROFILE).overComfortable; // true for the default hand
 */
export function pitchSpan(pitches: readonly Pitch[], profile: HandProfile): SpanReport {
  return spanOf(pitches.map((p) => ({ midi: p.midi })), null, profile);
}

export type { FingeringMemo } from "./types";

/**
 * An empty fingering memo.
 *
 * @example
 * const memo = newFingeringMemo();
 */
export function newFingeringMemo(): FingeringMemo {
  return { passage: new WeakMap(), sequences: new Map() };
}

/**
 * The passage's estimated (or written) finger per note id for one hand, computed once per memo.
 *
 * @example
 * passageFingers(passage, "right", newFingeringMemo()).get(passage.events[0].id); // 1
 */
export function passageFingers(passage: Passage, hand: Hand, memo: FingeringMemo): ReadonlyMap<string, number> {
  let byHand = memo.passage.get(passage);
  if (!byHand) memo.passage.set(passage, (byHand = new Map()));
  let found = byHand.get(hand);
  if (!found) {
    const events = passage.events.filter((e) => e.staff === passage.staffOf[hand]);
    const { fingers } = estimateFingering(events, hand, { costs: false, keyOf: () => passage.key });
    const map = new Map<string, number>();
    events.forEach((e, i) => { if (fingers[i] != null) map.set(e.id, fingers[i]!); });
    byHand.set(hand, (found = map));
  }
  return found;
}

/** Where a drill's notes come from, so the passage's fingering can be carried onto them. */
export interface FingeringCarry {
  readonly passage: Passage;
  /** Per event (same order as the events): the passage note it plays, if any. */
  readonly sources: readonly (NoteEvent | undefined)[];
  /** Per event: the passage note a moved note stands for (same finger suggested, any interval). */
  readonly likes?: readonly (NoteEvent | undefined)[];
  readonly memo: FingeringMemo;
}

function sequenceKey(hand: Hand, events: readonly NoteEvent[], hints: readonly (number | null)[] | undefined): string {
  let key = hand;
  for (let i = 0; i < events.length; i++) {
    const e = events[i]!;
    if (!e.pitch) continue;
    key += `|${e.pitch.midi}@${e.onset.n}/${e.onset.d}${e.grace ? "g" : ""}${e.tie[0]}${e.fingering?.[0]?.finger ?? ""}:${hints?.[i] ?? ""}`;
  }
  return key;
}

/**
 * The estimated finger for each unfingered note (null where the note keeps its written finger, is
 * a rest or a tied continuation), estimating each hand's notes together. `handOf(i)` is event i's
 * hand. With `carry`, a note that plays a passage note (same key, or octaves apart) is steered
 * towards the finger the passage's own estimate gives it, so a drill is fingered as the piece is,
 * and only new notes are searched freely; estimates are shared through the memo.
 *
 * @example
 * estimatedFingers(events, () => "right"); // [null, 2, 3, …] when the first note is fingered
 */
export function estimatedFingers(events: readonly NoteEvent[], handOf: (i: number) => Hand, carry?: FingeringCarry): (number | null)[] {
  const out: (number | null)[] = new Array<number | null>(events.length).fill(null);
  const byHand = new Map<Hand, number[]>();
  events.forEach((_, i) => {
    const h = handOf(i);
    const list = byHand.get(h);
    if (list) list.push(i); else byHand.set(h, [i]);
  });
  for (const [hand, idx] of byHand) {
    const handEvents = idx.map((i) => events[i]!);
    let hints: (number | null)[] | undefined;
    if (carry) {
      const fromPassage = passageFingers(carry.passage, hand, carry.memo);
      const staff = carry.passage.staffOf[hand];
      hints = idx.map((i) => {
        const src = carry.sources[i];
        const e = events[i]!;
        if (!e.pitch) return null;
        if (src?.pitch && src.staff === staff && (e.pitch.midi - src.pitch.midi) % 12 === 0) return fromPassage.get(src.id) ?? null;
        const like = carry.likes?.[i];
        return like && like.staff === staff ? fromPassage.get(like.id) ?? null : null;
      });
    }
    const key = carry ? sequenceKey(hand, handEvents, hints) : "";
    let fingers = carry ? carry.memo.sequences.get(key) : undefined;
    if (!fingers) {
      fingers = estimateFingering(handEvents, hand, { hints, costs: false, ...(carry ? { keyOf: () => carry.passage.key } : {}) }).fingers;
      if (carry) carry.memo.sequences.set(key, fingers);
    }
    idx.forEach((i, k) => {
      const e = events[i]!;
      const f = fingers[k];
      if (!e.pitch || e.fingering?.length || f == null || e.tie === "stop" || e.tie === "continue") return;
      out[i] = f;
    });
  }
  return out;
}

/**
 * Add estimated fingering (marked "estimated", from `estimateFingering`) to unfingered notes, per
 * staff; the score's own fingerings stay as they are and steer the estimate. Tied continuations
 * get no finger. `carry` as for `estimatedFingers`.
 *
 * @example
 * addEstimatedFingering(events, () => "right");
 */
export function addEstimatedFingering(events: NoteEvent[], handOfStaff: (staff: number) => Hand, carry?: FingeringCarry): NoteEvent[] {
  const fingers = estimatedFingers(events, (i) => handOfStaff(events[i]!.staff), carry);
  return events.map((e, i) => (fingers[i] == null ? e : { ...e, fingering: [{ finger: fingers[i]! }], fingeringSource: "estimated" }));
}
