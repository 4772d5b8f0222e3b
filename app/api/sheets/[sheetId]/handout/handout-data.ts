import type { Db } from "@/db";
import { getAssignment, latestAssignmentOfSheet, sheetSource } from "@/db/queries/assignments";
import { getHandProfile } from "@/db/queries/knot-drills";
import { getSheet } from "@/db/queries/sheets";
import type { HandoutInput, Paper } from "@/lib/handout";
import { HANDOUT_WARNING_MAX } from "@/lib/handout/input";
import { drillWarningsFor, profileOrDefault } from "@/lib/students/span";
import type { StudioContext } from "@/lib/auth/session";
import { fileStem } from "@/lib/knots/files";

/** Tempo limits the handout accepts (its zod schema). */
const MIN_TEMPO = 20;
const MAX_TEMPO = 320;
/** A drill with no stored tempo: common practice is to start slowly, at about 60 % of the goal. */
const DEFAULT_TARGET = 80;
const clampTempo = (n: number) => Math.round(Math.min(MAX_TEMPO, Math.max(MIN_TEMPO, n)));

const HANDS = { right: "right hand", left: "left hand", both: "both hands" } as const;

/** The drill's warnings one a line, dropping whole warnings (never half of one) past the handout's limit. */
export function joinWarnings(warnings: readonly string[]): string {
  let out = "";
  for (const w of warnings) {
    const next = out ? `${out}\n${w}` : w;
    if (next.length > HANDOUT_WARNING_MAX) break;
    out = next;
  }
  return out;
}

/** "bars 5–6, right hand" (one bar: "bar 5"). */
export function barsLabel(src: { fromBar: number; toBar: number; hand: keyof typeof HANDS } | null): string {
  if (!src) return "selected bars";
  const bars = src.fromBar === src.toBar ? `bar ${src.fromBar}` : `bars ${src.fromBar}–${src.toBar}`;
  return `${bars}, ${HANDS[src.hand]}`;
}

/** A file name for the handout: the sheet title in lower-case ASCII words. */
export function handoutFileName(title: string, paper: Paper): string {
  return `${fileStem(title, "drill-sheet")}-${paper}.pdf`;
}

/**
 * Everything the renderer needs for one sheet, as the caller may see it: a student gets their
 * own name and tempo goals; a teacher gets a student's when `assignmentId` names one of theirs.
 * Null when the sheet (or the named assignment) is not in the caller's studio.
 */
export async function loadHandoutInput(
  database: Db,
  ctx: Pick<StudioContext, "role" | "studioId" | "membershipId" | "user" | "studioName">,
  sheetId: string,
  paper: Paper,
  assignmentId: string | null,
  now: Date = new Date(),
): Promise<HandoutInput | null> {
  const sheet = await getSheet(database, ctx.studioId, sheetId);
  if (!sheet || sheet.drills.length === 0) return null;
  let studentName: string | undefined;
  let goals: Record<string, number> = {};
  /** Whose hand the spans are checked against: the student the handout is printed for, if any. */
  let studentMembershipId: string | null = null;
  if (ctx.role === "student") {
    studentName = ctx.user.name;
    studentMembershipId = ctx.membershipId;
    goals = (await latestAssignmentOfSheet(database, ctx.studioId, sheetId, ctx.membershipId))?.tempoGoals ?? {};
  } else if (assignmentId) {
    const a = await getAssignment(database, ctx.studioId, assignmentId, null);
    if (!a || a.assignment.sheetId !== sheetId) return null;
    studentName = a.studentName;
    studentMembershipId = a.assignment.studentMembershipId;
    goals = a.assignment.tempoGoals;
  }
  const profile = studentMembershipId
    ? profileOrDefault(await getHandProfile(database, ctx.studioId, studentMembershipId))
    : null;
  const src = await sheetSource(database, ctx.studioId, sheet.passageId);
  return {
    sheetTitle: sheet.title,
    pieceTitle: src?.pieceTitle ?? "Drill sheet",
    bars: barsLabel(src),
    studentName,
    date: now.toLocaleDateString("en-GB", { day: "numeric", month: "long", year: "numeric", timeZone: "UTC" }),
    paper,
    studioName: ctx.studioName,
    drills: sheet.drills.map((d) => {
      const target = clampTempo(goals[d.id] ?? d.meta.tempo?.target ?? DEFAULT_TARGET);
      const start = clampTempo(Math.min(d.meta.tempo?.start ?? target * 0.6, target));
      // For a student: spans re-measured for their hand; otherwise the warnings saved with the sheet.
      const warnings = profile ? drillWarningsFor(d, profile).warnings : d.meta.warnings?.filter(Boolean) ?? [];
      return {
        title: d.title,
        musicxml: d.musicxml,
        studentNote: (d.studentNote ?? "").slice(0, 2000),
        tempo: { start, target },
        // One warning a line, each whole (the handout schema allows HANDOUT_WARNING_MAX characters).
        ...(warnings.length ? { spanWarning: joinWarnings(warnings) } : {}),
      };
    }),
  };
}
