/**
 * Shared by the generate, preview-download and sheet-saving handlers: load a studio's knot and the
 * hand profile named in a request, then generate.
 */
import { db } from "../../db";
import { getHandProfile, getKnotSource } from "../../db/queries/knot-drills";
import type { GenerateRequest } from "./generate-request";
import { generateForKnot, type KnotDrills } from "./generate";

/** The knot's drills for the request, or null when the knot or the profile is not in the studio. */
export async function drillsForStudioKnot(studioId: string, knotId: string, req: GenerateRequest): Promise<KnotDrills | null> {
  const knot = await getKnotSource(db, studioId, knotId);
  if (!knot) return null;
  let profile: { spanMm: number; octaveMm: number } | undefined;
  if (req.profile) {
    const row = await getHandProfile(db, studioId, req.profile);
    if (!row) return null;
    profile = row;
  }
  return generateForKnot(knot, req, profile);
}
