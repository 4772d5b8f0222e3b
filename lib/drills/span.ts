/**
 * Span and fingering for drill scores: the widest chord per hand against the hand profile, and
 * estimated fingering for notes the score left unfingered.
 */
import type { Hand, NoteEvent, Pitch } from "../score/types";
import type { HandProfile, SpanReport } from "./types";
import { DEFAULT_PROFILE, spanOf } from "./hand";
import { estimateFingering } from "./fingering";

/** The profile drills use when none is given (hand.ts `DEFAULT_PROFILE`). */
export const PROFILE: HandProfile = DEFAULT_PROFILE;

/**
 * The widest stretch among notes that sound together in these events (one hand), or null when
 * there are no notes. Fingering narrows the limit when every note of the chord has one.
 *
 * @example
 * measureSpan(drill.score.events.filter((e) => e.staff === 1), PROFILE)?.semitones;
 */
export function measureSpan(events: readonly NoteEvent[], profile: HandProfile): SpanReport | null {
  const byOnset = new Map<string, NoteEvent[]>();
  for (const e of events) {
    if (!e.pitch || e.grace) continue;
    const k = e.onset.toFraction();
    byOnset.set(k, [...(byOnset.get(k) ?? []), e]);
  }
  let worst: SpanReport | null = null;
  for (const chord of byOnset.values()) {
    const fingers = chord.map((e) => e.fingering?.[0]?.finger ?? null);
    const report = spanOf(chord, fingers.every((f) => f !== null) ? fingers : null, profile);
    if (!worst || report.mm > worst.mm || (report.mm === worst.mm && report.overComfortable && !worst.overComfortable)) {
      worst = report;
    }
  }
  return worst;
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

/**
 * Add estimated fingering (marked "estimated", from `estimateFingering`) to unfingered notes, per
 * staff; the score's own fingerings stay as they are and steer the estimate. Tied continuations
 * get no finger.
 *
 * @example
 * addEstimatedFingering(events, () => "right");
 */
export function addEstimatedFingering(events: NoteEvent[], handOfStaff: (staff: number) => Hand): NoteEvent[] {
  const out = [...events];
  const staves = [...new Set(events.map((e) => e.staff))];
  for (const staff of staves) {
    const idx = events.map((e, i) => (e.staff === staff ? i : -1)).filter((i) => i >= 0);
    const { fingers } = estimateFingering(idx.map((i) => events[i]), handOfStaff(staff));
    idx.forEach((i, k) => {
      const e = events[i];
      const f = fingers[k];
      if (!e.pitch || e.fingering?.length || f == null || e.tie === "stop" || e.tie === "continue") return;
      out[i] = { ...e, fingering: [{ finger: f }], fingeringSource: "estimated" };
    });
  }
  return out;
}
