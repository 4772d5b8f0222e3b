import { desc } from "drizzle-orm";
import { inStudio } from "../../lib/studio-scope";
import type { Db } from "../index";
import { score } from "../schema";

/** The studio's pieces, newest first, without their MusicXML. */
export async function listScores(database: Db, studioId: string) {
  return database
    .select({ id: score.id, title: score.title, composer: score.composer, bars: score.bars, createdAt: score.createdAt })
    .from(score)
    .where(inStudio(score, studioId))
    .orderBy(desc(score.createdAt));
}
