import { revalidatePath } from "next/cache";
import { db } from "@/db";
import { saveSheet } from "@/db/queries/sheets";
import { apiTeacher, jsonError, notFoundResponse } from "@/lib/auth/api-session";
import { requestProblems } from "@/lib/knots/generate-request";
import { drillsForStudioKnot } from "@/lib/knots/request";
import { pickedDrills, SaveSheetRequest } from "@/lib/sheets/save";
import { readJsonCapped } from "@/lib/limits/body";
import { isWorkLimitError } from "@/lib/limits/work";
import { busyResponse, heavyWork, QueueFullError } from "@/lib/jobs/gate";
import { isScoreError } from "@/lib/score";

export const dynamic = "force-dynamic";

/** POST { knotId, title, request, drills } → { id } of the saved sheet (one transaction). */
export async function POST(request: Request) {
  const ctx = await apiTeacher();
  if (ctx instanceof Response) return ctx;
  let body: unknown;
  try {
    body = await readJsonCapped(request);
  } catch {
    return jsonError(413, "The sheet is too large to save.");
  }
  const parsed = SaveSheetRequest.safeParse(body);
  if (!parsed.success) return jsonError(400, "The sheet could not be saved.", requestProblems(parsed.error));
  const { knotId, title, request: req, drills } = parsed.data;
  let out;
  try {
    out = await heavyWork.run(() => drillsForStudioKnot(ctx.studioId, knotId, req));
  } catch (err) {
    if (err instanceof QueueFullError) return busyResponse(err);
    if (isWorkLimitError(err)) return jsonError(422, err.message);
    if (isScoreError(err)) return jsonError(422, `The knot's bars could not be read: ${err.message}`);
    throw err;
  }
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
