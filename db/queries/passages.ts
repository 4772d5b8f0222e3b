import { desc, eq } from "drizzle-orm";
import { inStudio } from "../../lib/studio-scope";
import type { Db } from "../index";
import { passage, score } from "../schema";

/** The studio's knots with their piece's title, newest first. */
export async function listPassages(database: Db, studioId: string) {
  return database
    .select({
      id: passage.id,
      scoreId: passage.scoreId,
      scoreTitle: score.title,
      hand: passage.hand,
      fromBar: passage.fromBar,
      toBar: passage.toBar,
      tags: passage.tags,
      note: passage.note,
    })
    .from(passage)
    .innerJoin(score, eq(score.id, passage.scoreId))
    .where(inStudio(passage, studioId))
    .orderBy(desc(passage.createdAt));
}
