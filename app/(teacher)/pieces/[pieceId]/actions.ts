"use server";
import { revalidatePath } from "next/cache";
import { notFound } from "next/navigation";
import { z } from "zod";
import { db } from "@/db";
import { insertPassage } from "@/db/queries/passages";
import { getScore } from "@/db/queries/scores";
import { fail, fromZodError, ok, type ActionResult } from "@/lib/action-result";
import { PROBLEM_TAGS } from "@/lib/drills";
import { knotLengthProblem } from "@/lib/limits/work";
import { readScore } from "@/lib/score";
import { requireTeacher } from "@/lib/auth/session";
import { knotPart, printedBar } from "./piece-data";

const KnotInput = z
  .object({
    scoreId: z.string().min(1),
    from: z.number().int().min(0),
    to: z.number().int().min(0),
    hand: z.enum(["right", "left", "both"]),
    part: z.string().min(1).max(200).optional(),
    tags: z.array(z.enum(PROBLEM_TAGS)).min(1, "Tick at least one problem.").max(PROBLEM_TAGS.length),
    note: z.string().trim().max(500, "Keep the note under 500 characters.").optional(),
  })
  .refine((v) => v.from <= v.to, { message: "The first bar must come before the last.", path: ["to"] });

export type KnotInput = Omit<z.input<typeof KnotInput>, "scoreId">;

/** Marks a knot on the selected bars of a piece of the teacher's studio. */
export async function createKnot(scoreId: string, raw: KnotInput): Promise<ActionResult<{ id: string }>> {
  const ctx = await requireTeacher();
  const parsed = KnotInput.safeParse({ ...raw, scoreId });
  if (!parsed.success) return fromZodError(parsed.error, "Please check the knot.");
  const input = parsed.data;
  const row = await getScore(db, ctx.studioId, input.scoreId);
  if (!row) notFound();
  const { score } = readScore(row.musicxml);
  const from = score.measures[input.from];
  const to = score.measures[input.to];
  if (!from || !to) return fail("Those bars are not in this piece.", { to: ["Select bars inside the piece."] });
  const tooLong = knotLengthProblem(input.to - input.from + 1);
  if (tooLong) return fail(tooLong, { to: [tooLong] });
  const part = knotPart(score, input.part);
  if (!part) return fail("That part cannot be played as a piano hand.", { part: ["Pick the piano part."] });
  const id = await insertPassage(db, {
    studioId: ctx.studioId,
    scoreId: row.id,
    createdBy: ctx.user.id,
    part,
    hand: input.hand,
    fromBar: printedBar(from.number, from.index),
    toBar: printedBar(to.number, to.index),
    tags: input.tags,
    note: input.note ? input.note : null,
  });
  if (!id) notFound();
  revalidatePath(`/pieces/${row.id}`);
  revalidatePath("/pieces");
  revalidatePath("/knots");
  revalidatePath("/home");
  return ok({ id });
}
