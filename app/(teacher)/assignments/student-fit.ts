import type { HandProfile } from "@/lib/drills/types";
import { profileOrDefault, safeSpanForProfile, type SpanHands } from "@/lib/students/span";

/** A drill of the sheet being assigned that is too wide for one student's hand. */
export interface OverSpan {
  drillId: string;
  /** "2. Held C, reach for E" — the drill's place on the sheet and its title. */
  label: string;
  /** "RH 16 semitones / 212 mm", one per hand over the student's comfortable span. */
  stretches: string[];
}

interface FitDrill {
  id: string;
  title: string;
  musicxml: string;
  meta: { hands?: SpanHands };
}

/**
 * Per student (membership id): the sheet's drills that stretch beyond that student's comfortable
 * span (their hand profile, or the default hand when none). Each drill is measured once per
 * distinct profile.
 */
export function overSpanByStudent(
  drills: readonly FitDrill[],
  students: readonly { membershipId: string; spanMm: number | null; octaveMm: number | null }[],
): Record<string, OverSpan[]> {
  const byProfile = new Map<string, OverSpan[]>();
  const out: Record<string, OverSpan[]> = {};
  for (const s of students) {
    const profile: HandProfile = profileOrDefault(s.spanMm != null ? { spanMm: s.spanMm, octaveMm: s.octaveMm ?? 165.1 } : null);
    const key = `${profile.spanMm}|${profile.octaveMm}`;
    let list = byProfile.get(key);
    if (!list) {
      list = [];
      drills.forEach((d, i) => {
        const span = safeSpanForProfile(d.musicxml, profile, d.meta.hands);
        const stretches = (["right", "left"] as const)
          .filter((h) => span[h]?.overComfortable)
          .map((h) => `${h === "right" ? "RH" : "LH"} ${span[h]!.semitones} semitones / ${Math.round(span[h]!.mm)} mm`);
        if (stretches.length || (!span.right && !span.left && span.warnings.length)) {
          list!.push({ drillId: d.id, label: `${i + 1}. ${d.title}`, stretches: stretches.length ? stretches : ["could not be checked"] });
        }
      });
      byProfile.set(key, list);
    }
    out[s.membershipId] = list;
  }
  return out;
}
