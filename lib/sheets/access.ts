/**
 * Who may read a drill sheet and its downloads. One function, so the student side can add
 * "a student of the studio with this sheet assigned" in one place.
 */
import { db } from "../../db";
import { studentHasSheet } from "../../db/queries/assignments";
import { sheetStudio } from "../../db/queries/sheets";
import type { StudioContext } from "../auth/session";

/**
 * True when the signed-in member may read the sheet: a teacher of the sheet's studio, or a student
 * of that studio who has the sheet assigned.
 */
export async function canReadSheet(session: Pick<StudioContext, "role" | "studioId" | "membershipId">, sheetId: string): Promise<boolean> {
  const studioId = await sheetStudio(db, sheetId);
  if (!studioId || studioId !== session.studioId) return false;
  if (session.role === "teacher") return true;
  return studentHasSheet(db, studioId, session.membershipId, sheetId);
}
