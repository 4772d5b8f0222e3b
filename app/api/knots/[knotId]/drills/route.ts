import { db } from "@/db";
import { getHandProfile, getKnotStamp, getScoreMusicXml } from "@/db/queries/knot-drills";
import { apiTeacher, jsonError, notFoundResponse } from "@/lib/auth/api-session";
import { GenerateRequest, requestProblems } from "@/lib/knots/generate-request";
import { knotDrillsBody } from "@/lib/knots/cache";
import { readJsonCapped } from "@/lib/limits/body";
import { isWorkLimitError } from "@/lib/limits/work";
import { busyResponse, QueueFullError } from "@/lib/jobs/gate";
import { JobLimitError, limitResponse } from "@/lib/jobs/pool";
import { isScoreError } from "@/lib/score";

export const dynamic = "force-dynamic";

/**
 * POST { families, options, profile?, seed? } → { drills, skipped } for one knot of the teacher's
 * studio. The answer is deterministic, so it comes from lib/knots/cache when the knot, its
 * piece, the request and the hand are unchanged.
 */
export async function POST(request: Request, { params }: { params: Promise<{ knotId: string }> }) {
  const ctx = await apiTeacher();
  if (ctx instanceof Response) return ctx;
  const { knotId } = await params;
  let body: unknown;
  try {
    body = await readJsonCapped(request);
  } catch {
    return jsonError(413, "The drill request is too large.");
  }
  const parsed = GenerateRequest.safeParse(body);
  if (!parsed.success) return jsonError(400, "The drill request is not valid.", requestProblems(parsed.error));
  const req = parsed.data;
  const [knot, profile] = await Promise.all([
    getKnotStamp(db, ctx.studioId, knotId),
    req.profile ? getHandProfile(db, ctx.studioId, req.profile) : Promise.resolve(undefined),
  ]);
  if (!knot || profile === null) return notFoundResponse();
  try {
    const json = await knotDrillsBody(knot, req, profile, () => getScoreMusicXml(db, ctx.studioId, knot.scoreId));
    if (json === null) return notFoundResponse();
    return new Response(json, { headers: { "content-type": "application/json", "content-length": String(json.byteLength) } });
  } catch (err) {
    if (isScoreError(err)) return jsonError(422, `The knot's bars could not be read: ${err.message}`);
    if (isWorkLimitError(err)) return jsonError(422, err.message);
    if (err instanceof QueueFullError) return busyResponse(err);
    if (err instanceof JobLimitError) return limitResponse(err);
    throw err;
  }
}
