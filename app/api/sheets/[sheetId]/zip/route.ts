import { db } from "@/db";
import { getSheet } from "@/db/queries/sheets";
import { apiMember, notFoundResponse } from "@/lib/auth/api-session";
import { downloadResponse, sheetZip } from "@/lib/knots/files";
import { canReadSheet } from "@/lib/sheets/access";

export const dynamic = "force-dynamic";

/** GET → a zip of the sheet's drills as MusicXML, .mxl and MIDI. */
export async function GET(_request: Request, { params }: { params: Promise<{ sheetId: string }> }) {
  const ctx = await apiMember();
  if (ctx instanceof Response) return ctx;
  const { sheetId } = await params;
  if (!(await canReadSheet(ctx, sheetId))) return notFoundResponse();
  // canReadSheet has checked the sheet is in the member's studio; read it scoped to that studio.
  const sheet = await getSheet(db, ctx.studioId, sheetId);
  if (!sheet) return notFoundResponse();
  return downloadResponse(sheetZip(sheet.title, sheet.drills));
}
