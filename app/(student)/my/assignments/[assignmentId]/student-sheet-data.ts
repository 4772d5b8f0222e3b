import type { Db } from "@/db";
import { getAssignment } from "@/db/queries/assignments";
import { getHandProfile } from "@/db/queries/knot-drills";
import type { HandProfile } from "@/lib/drills/types";
import { drillWarningsFor, profileOrDefault } from "@/lib/students/span";

/** One drill as the student sees it, its span checked against their own hand profile. */
export interface StudentDrillData {
  id: string;
  title: string;
  musicxml: string;
  studentNote: string | null;
  goal: number | null;
  start: number | null;
  /** Stretches over this student's comfortable span, one per hand. */
  spanWarnings: string[];
  /** Other saved warnings (range, repetition, …). */
  warnings: string[];
}

/**
 * A student's assignment with each drill's warnings re-measured for their hand profile (the default
 * hand when they have none); null when the assignment is not theirs.
 */
export async function loadStudentSheet(database: Db, studioId: string, assignmentId: string, membershipId: string) {
  const a = await getAssignment(database, studioId, assignmentId, membershipId);
  if (!a) return null;
  const profile: HandProfile = profileOrDefault(await getHandProfile(database, studioId, a.assignment.studentMembershipId));
  const goals = a.assignment.tempoGoals;
  const drills: StudentDrillData[] = a.drills.map((d) => {
    const { span, warnings } = drillWarningsFor(d, profile);
    return {
      id: d.id,
      title: d.title,
      musicxml: d.musicxml,
      studentNote: d.studentNote,
      goal: goals[d.id] ?? d.meta.tempo?.target ?? null,
      start: d.meta.tempo?.start ?? null,
      spanWarnings: span.warnings,
      warnings: warnings.filter((w) => !span.warnings.includes(w)),
    };
  });
  return { assignment: a, profile, drills };
}
