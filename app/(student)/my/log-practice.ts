import type { Db } from "@/db";
import { getAssignment } from "@/db/queries/assignments";
import { insertPracticeEntry } from "@/db/queries/practice";
import { fail, fromZodError, ok, type ActionResult } from "@/lib/action-result";
import type { StudioContext } from "@/lib/auth/session";
import { PracticeEntryInput } from "./practice-input";

/**
 * Checks and stores one practice entry for the signed-in student: only on their own assignment,
 * with tempos only for drills of that sheet. Nothing is stored when anything is off.
 */
export async function logPractice(
  database: Db,
  ctx: Pick<StudioContext, "role" | "studioId" | "membershipId">,
  raw: unknown,
): Promise<ActionResult<{ id: string }>> {
  if (ctx.role !== "student") return fail("Only students log practice.");
  const parsed = PracticeEntryInput.safeParse(raw);
  if (!parsed.success) return fromZodError(parsed.error);
  const input = parsed.data;
  const a = await getAssignment(database, ctx.studioId, input.assignmentId, ctx.membershipId);
  if (!a) return fail("That drill sheet was not found.");
  const drillIds = new Set(a.drills.map((d) => d.id));
  const tempos: Record<string, number> = {};
  for (const [id, bpm] of Object.entries(input.tempos)) {
    if (bpm === undefined) continue;
    if (!drillIds.has(id)) return fail("A tempo was given for a drill that is not on this sheet.");
    tempos[id] = bpm;
  }
  const id = await insertPracticeEntry(database, {
    studioId: ctx.studioId,
    assignmentId: a.assignment.id,
    studentMembershipId: ctx.membershipId,
    practisedOn: input.practisedOn,
    minutes: input.minutes,
    tempos,
    ease: input.ease,
    comment: input.comment?.trim() ? input.comment.trim() : null,
  });
  return ok({ id });
}
