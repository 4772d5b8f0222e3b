import { db } from "@/db";
import { latestAssignmentOfSheet } from "@/db/queries/assignments";
import { getSheetOverview } from "@/db/queries/sheets";
import { apiMember, notFoundResponse } from "@/lib/auth/api-session";
import { canReadSheet } from "@/lib/sheets/access";

export const dynamic = "force-dynamic";

/**
 * GET → the drill sheet as JSON: title, notes, its knot and piece, and its drills in order with their
 * metadata and tempo goals (a student's goals come from their newest assignment of the sheet).
 * The drills' MusicXML only with `?include=musicxml`. Teachers of the studio and students with the
 * sheet assigned may read it (lib/sheets/access); 401 signed out, 404 for anyone else.
 */
export async function GET(request: Request, { params }: { params: Promise<{ sheetId: string }> }) {
  const ctx = await apiMember();
  if (ctx instanceof Response) return ctx;
  const { sheetId } = await params;
  if (!(await canReadSheet(ctx, sheetId))) return notFoundResponse();
  const include = new URL(request.url).searchParams.getAll("include").flatMap((v) => v.split(","));
  const student = ctx.role === "student";
  const withMusicXml = include.includes("musicxml");
  const [sheet, assigned] = await Promise.all([
    getSheetOverview(db, ctx.studioId, sheetId, { musicxml: withMusicXml }),
    student ? latestAssignmentOfSheet(db, ctx.studioId, sheetId, ctx.membershipId) : Promise.resolve(null),
  ]);
  if (!sheet) return notFoundResponse();
  const goals = assigned?.tempoGoals ?? {};
  return Response.json({
    sheet: {
      id: sheet.id,
      title: sheet.title,
      notes: sheet.notes,
      createdAt: sheet.createdAt.toISOString(),
      updatedAt: sheet.updatedAt.toISOString(),
      knot: sheet.knotId
        ? {
            id: sheet.knotId,
            part: sheet.part,
            hand: sheet.hand,
            fromBar: sheet.fromBar,
            toBar: sheet.toBar,
            piece: sheet.pieceId ? { id: sheet.pieceId, title: sheet.pieceTitle, composer: sheet.composer } : null,
          }
        : null,
      ...(assigned ? { assignment: { id: assigned.id, dueDate: assigned.dueDate } } : {}),
      drills: sheet.drills.map((d) => ({
        id: d.id,
        position: d.position,
        family: d.family,
        variant: d.variant,
        title: d.title,
        studentNote: d.studentNote,
        // The teacher's own note stays with teachers.
        ...(student ? {} : { teacherNote: d.teacherNote }),
        meta: d.meta,
        tempoGoal: {
          start: d.meta.tempo?.start ?? null,
          target: goals[d.id] ?? d.meta.tempo?.target ?? null,
        },
        ...(withMusicXml ? { musicxml: d.musicxml } : {}),
      })),
    },
  });
}
