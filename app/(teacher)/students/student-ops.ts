import { and, eq } from "drizzle-orm";
import type { Db } from "@/db";
import { isStudentOf, saveHandProfile } from "@/db/queries/students";
import { membership, user } from "@/db/schema";
import { fail, fromZodError, ok, type ActionResult } from "@/lib/action-result";
import { OCTAVE_WIDTHS, profileFromInches } from "@/lib/drills/hand";
import { createInvitation } from "@/lib/students/invitations";
import { invitationMail, sendMail } from "@/lib/mail";
import type { StudioContext } from "@/lib/auth/session";
import { HandProfileInput, InviteInput } from "./student-inputs";

type TeacherCtx = Pick<StudioContext, "role" | "studioId" | "studioName" | "user">;

/** Invites a student by e-mail: an invitation row and a mail with the one-time link. */
export async function inviteStudent(database: Db, ctx: TeacherCtx, raw: unknown, origin: string): Promise<ActionResult<{ email: string; delivered: boolean }>> {
  if (ctx.role !== "teacher") return fail("Only teachers invite students.");
  const parsed = InviteInput.safeParse(raw);
  if (!parsed.success) return fromZodError(parsed.error);
  const email = parsed.data.email.trim().toLowerCase();
  const [member] = await database
    .select({ id: membership.id })
    .from(membership)
    .innerJoin(user, eq(user.id, membership.userId))
    .where(and(eq(user.email, email), eq(membership.studioId, ctx.studioId)))
    .limit(1);
  if (member) return fail("This person is already in your studio.", { email: ["Already a member of your studio."] });
  const invite = await createInvitation({ studioId: ctx.studioId, email, invitedBy: ctx.user.id }, database);
  const mail = invitationMail({ studioName: ctx.studioName, teacherName: ctx.user.name, link: `${origin}/invite/${invite.token}`, expiresAt: invite.expiresAt });
  const sent = await sendMail({ to: email, ...mail, studioId: ctx.studioId }, database);
  return ok({ email, delivered: !sent.error });
}

/** Saves a student's hand profile; spans in inches are measured full spans, turned into a comfortable span in mm. */
export async function updateHandProfile(database: Db, ctx: TeacherCtx, raw: unknown): Promise<ActionResult<{ spanMm: number; octaveMm: number }>> {
  if (ctx.role !== "teacher") return fail("Only teachers edit hand profiles.");
  const parsed = HandProfileInput.safeParse(raw);
  if (!parsed.success) return fromZodError(parsed.error);
  const v = parsed.data;
  if (!(await isStudentOf(database, ctx.studioId, v.membershipId))) return fail("That student was not found.");
  const octaveMm = OCTAVE_WIDTHS.find((o) => o.id === v.octave)!.mm;
  const spanMm = Math.round((v.unit === "mm" ? v.span : profileFromInches(v.span, octaveMm).spanMm) * 10) / 10;
  await saveHandProfile(database, v.membershipId, { spanMm, octaveMm });
  return ok({ spanMm, octaveMm });
}
