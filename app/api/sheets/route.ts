import { revalidatePath } from "next/cache";
import { db } from "@/db";
import { saveSheet } from "@/db/queries/sheets";
import { apiTeacher, jsonError, notFoundResponse } from "@/lib/auth/api-session";
import { requestProblems } from "@/lib/knots/generate-request";
import { drillsForStudioKnot } from "@/lib/knots/request";
import { pickedDrills, SaveSheetRequest } from "@/lib/sheets/save";

export const dynamic = "force-dynamic";

/** POST { knotId, title, request, drills } → { id } of the saved sheet (one transaction). */
export async function POST(request: Request) {
  const ctx = await apiTeacher();
  if (ctx instanceof Response) return ctx;
  const parsed = SaveSheetRequest.safeParse(await request.json().catch(() => undefined));
  if (!parsed.success) return jsonError(400, "The sheet could not be saved.", requestProblems(parsed.error));
  const { knotId, title, request: req, drills } = parsed.data;
  const out = await drillsForStudioKnot(ctx.studioId, knotId, req);
  if (!out) return notFoundResponse();
  let rows;
  try {
    rows = pickedDrills(out, drills);
  } catch (err) {
    return jsonError(409, (err as Error).message);
  }
  const id = await saveSheet(db, { studioId: ctx.studioId, createdBy: ctx.user.id, passageId: knotId, title, drills: rows });
  revalidatePath("/sheets");
  revalidatePath("/home");
  return Response.json({ id }, { status: 201 });
}
