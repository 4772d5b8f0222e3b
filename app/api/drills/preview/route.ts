import { apiTeacher, jsonError, notFoundResponse } from "@/lib/auth/api-session";
import { DRILL_FORMATS, downloadResponse, drillFile, type DrillFormat } from "@/lib/knots/files";
import { GenerateRequest, requestProblems } from "@/lib/knots/generate-request";
import { drillsForStudioKnot } from "@/lib/knots/request";
import { isWorkLimitError } from "@/lib/limits/work";
import { busyResponse, heavyWork, QueueFullError } from "@/lib/jobs/gate";
import { writeMusicXML } from "@/lib/score";

export const dynamic = "force-dynamic";

/** GET ?knot=…&request=<json>&key=…&format=… → a generated (not yet saved) drill as a file. */
export async function GET(request: Request) {
  const ctx = await apiTeacher();
  if (ctx instanceof Response) return ctx;
  const url = new URL(request.url);
  const knotId = url.searchParams.get("knot") ?? "";
  const key = url.searchParams.get("key") ?? "";
  const format = url.searchParams.get("format") as DrillFormat;
  if (!DRILL_FORMATS.includes(format)) return notFoundResponse();
  let raw: unknown;
  try {
    raw = JSON.parse(url.searchParams.get("request") ?? "");
  } catch {
    return jsonError(400, "The drill request is not valid JSON.");
  }
  const parsed = GenerateRequest.safeParse(raw);
  if (!parsed.success) return jsonError(400, "The drill request is not valid.", requestProblems(parsed.error));
  let out;
  try {
    out = await heavyWork.run(() => drillsForStudioKnot(ctx.studioId, knotId, parsed.data));
  } catch (err) {
    if (err instanceof QueueFullError) return busyResponse(err);
    if (isWorkLimitError(err)) return jsonError(422, err.message);
    throw err;
  }
  const found = out?.drills.find((d) => d.key === key);
  if (!found) return notFoundResponse();
  return downloadResponse(drillFile(writeMusicXML(found.drill.score), found.drill.title, format));
}
