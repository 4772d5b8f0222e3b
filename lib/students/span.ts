/**
 * A stored drill's stretch re-measured for one student's hand: the sheet's saved spans and warnings
 * were measured for whatever hand profile was picked when it was generated, so what a student sees
 * is checked again against their own profile (their hand profile, or the default hand).
 */
import { DEFAULT_PROFILE } from "../drills/hand";
import { measureSpan } from "../drills/span";
import type { HandProfile, SpanReport } from "../drills/types";
import { readScore } from "../score/index";

export type SpanHands = "right" | "left" | "both";

export interface StudentSpan {
  right?: SpanReport;
  left?: SpanReport;
  /** One warning per hand over the profile's comfortable span; empty when the drill fits. */
  warnings: string[];
}

const SHORT = { right: "RH", left: "LH" } as const;

/** The hand profile to measure with: the student's stored one, or the default hand when none. */
export function profileOrDefault(row: { spanMm: number; octaveMm: number } | null | undefined): HandProfile {
  return row ? { spanMm: row.spanMm, octaveMm: row.octaveMm } : DEFAULT_PROFILE;
}

/** The warning a student reads for one hand's stretch. */
export function spanWarningText(hand: "right" | "left", r: SpanReport, profile: HandProfile): string {
  const limit = Math.round(profile.spanMm);
  const over = r.mm > profile.spanMm
    ? `more than your comfortable ${limit} mm span`
    : `more than your comfortable reach for the fingers marked (your span is ${limit} mm)`;
  const tail = r.overPractical ? " It is beyond what your hand can reach, so skip it" : " Skip it";
  return `This drill stretches ${SHORT[hand]} ${r.semitones} semitones / ${Math.round(r.mm)} mm — ${over}.${tail} or ask your teacher for another fingering.`;
}

/**
 * Re-measure a stored drill's MusicXML for a hand profile. `hands` is the drill's saved hands
 * ("both": staff 1 right, staff 2 left; one hand: staff 1 is that hand); omitted, a two-staff
 * drill is both hands and a one-staff drill the right hand.
 */
export function spanForProfile(musicxml: string, profile: HandProfile, hands?: SpanHands): StudentSpan {
  const { score } = readScore(musicxml);
  const staves = Math.max(1, ...score.parts.map((p) => p.staves));
  const which: SpanHands = hands ?? (staves >= 2 ? "both" : "right");
  const staffOf: Partial<Record<"right" | "left", number>> =
    which === "both" ? { right: 1, left: 2 } : { [which]: 1 };
  const out: StudentSpan = { warnings: [] };
  for (const hand of ["right", "left"] as const) {
    const staff = staffOf[hand];
    if (staff === undefined) continue;
    const report = measureSpan(score.events.filter((e) => e.staff === staff), profile);
    if (!report) continue;
    out[hand] = report;
    if (report.overComfortable) out.warnings.push(spanWarningText(hand, report, profile));
  }
  return out;
}

/** `spanForProfile`, or a single warning when the stored notation cannot be read. */
export function safeSpanForProfile(musicxml: string, profile: HandProfile, hands?: SpanHands): StudentSpan {
  try {
    return spanForProfile(musicxml, profile, hands);
  } catch {
    return { warnings: ["This drill's notation could not be read to check its stretch against your hand; ask your teacher before playing it."] };
  }
}

/** The stored side of a sheet drill that `drillWarningsFor` reads (as saved in its meta). */
export interface StoredDrill {
  musicxml: string;
  meta: { hands?: SpanHands; warnings?: string[]; warningCodes?: string[] };
}

/**
 * A stored drill's warnings for one student: the span warnings re-measured for their profile, then
 * the saved warnings that are not about span (saved span warnings were for the generating hand).
 * Drills saved before warning kinds were kept have no codes; their saved warnings are kept as they are.
 */
export function drillWarningsFor(d: StoredDrill, profile: HandProfile): { span: StudentSpan; warnings: string[] } {
  const span = safeSpanForProfile(d.musicxml, profile, d.meta.hands);
  const saved = d.meta.warnings ?? [];
  const codes = d.meta.warningCodes;
  const other = codes && codes.length === saved.length ? saved.filter((_, i) => codes[i] !== "span") : saved;
  return { span, warnings: [...span.warnings, ...other.filter((w) => w && !span.warnings.includes(w))] };
}
