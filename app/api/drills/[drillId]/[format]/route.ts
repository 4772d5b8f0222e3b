import { db } from "@/db";
import { getSheetDrill } from "@/db/queries/sheets";
import { apiMember, notFoundResponse } from "@/lib/auth/api-session";
import { DRILL_FORMATS, downloadResponse, drillFile, type DrillFormat } from "@/lib/knots/files";
import { canReadSheet } from "@/lib/sheets/access";

export const dynamic = "force-dynamic";

/** GET /api/drills/:drillId/(musicxml|mxl|midi) → one saved drill as a file. */
export async function GET(_request: Request, { params }: { params: Promise<{ drillId: string; format: string }> }) {
  const ctx = await apiMember();
  if (ctx instanceof Response) return ctx;
  const { drillId, format } = await params;
  if (!DRILL_FORMATS.includes(format as DrillFormat)) return notFoundResponse();
  const drill = await getSheetDrill(db, drillId);
  if (!drill || !(await canReadSheet(ctx, drill.sheetId))) return notFoundResponse();
  return downloadResponse(drillFile(drill.musicxml, drill.title, format as DrillFormat));
}
