import { apiTeacher, jsonError, notFoundResponse } from "@/lib/api-session";
import { GenerateRequest, requestProblems } from "@/lib/generate-request";
import { knotDrillsJson } from "@/lib/knot-generate";
import { drillsForStudioKnot } from "@/lib/knot-request";
import { isScoreError } from "@/lib/score";

export const dynamic = "force-dynamic";

/** POST { families, options, profile? } → { drills, skipped } for one knot of the teacher's studio. */
export async function POST(request: Request, { params }: { params: Promise<{ knotId: string }> }) {
  const ctx = await apiTeacher();
  if (ctx instanceof Response) return ctx;
  const { knotId } = await params;
  const body = await request.json().catch(() => undefined);
  const parsed = GenerateRequest.safeParse(body);
  if (!parsed.success) return jsonError(400, "The drill request is not valid.", requestProblems(parsed.error));
  try {
    const out = await drillsForStudioKnot(ctx.studioId, knotId, parsed.data);
    if (!out) return notFoundResponse();
    return Response.json(knotDrillsJson(out));
  } catch (err) {
    if (isScoreError(err)) return jsonError(422, `The knot's bars could not be read: ${err.message}`);
    throw err;
  }
}
