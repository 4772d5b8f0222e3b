import { and, count, desc, eq, inArray, sql } from "drizzle-orm";
import { inStudio } from "../scope";
import type { Db } from "../index";
import { passage, score, sheet, type ScorePartSummary } from "../schema";
import { preparedFor } from "./prepared";

/** The studio's pieces, newest first, without their MusicXML. */
export async function listScores(database: Db, studioId: string) {
  return database
    .select({ id: score.id, title: score.title, composer: score.composer, bars: score.bars, createdAt: score.createdAt })
    .from(score)
    .where(inStudio(score, studioId))
    .orderBy(desc(score.createdAt));
}

/** The pieces-table query, built once per database handle. */
const piecesTable = preparedFor((database: Db) =>
  database
    .select({
      id: score.id,
      title: score.title,
      composer: score.composer,
      bars: score.bars,
      createdAt: score.createdAt,
      knots: count(passage.id),
    })
    .from(score)
    .leftJoin(passage, eq(passage.scoreId, score.id))
    .where(eq(score.studioId, sql.placeholder("studioId")))
    .groupBy(score.id)
    .orderBy(desc(score.createdAt))
    .prepare(),
);

/**
 * The studio's pieces for the pieces table: newest first, with how many knots each has. One query
 * (no per-piece look-ups), only the table's columns (never the MusicXML).
 */
export async function listScoresWithKnots(database: Db, studioId: string) {
  if (!studioId) throw new Error("A studio id is required to scope a query.");
  return piecesTable(database).all({ studioId });
}

/** One piece of the studio with its cleaned MusicXML, or null (unknown id or another studio). */
export async function getScore(database: Db, studioId: string, scoreId: string) {
  const [row] = await database
    .select()
    .from(score)
    .where(inStudio(score, studioId, eq(score.id, scoreId)))
    .limit(1);
  return row ?? null;
}

export interface NewScore {
  studioId: string;
  uploadedBy: string;
  title: string;
  composer: string | null;
  bars: number;
  parts: ScorePartSummary[];
  musicxml: string;
  storageKey: string;
  originalName: string;
}

/** Inserts a piece in its own transaction and returns its id. */
export async function insertScore(database: Db, input: NewScore): Promise<string> {
  return database.transaction(async (tx) => {
    const [row] = await tx.insert(score).values(input).returning({ id: score.id });
    if (!row) throw new Error("The piece was not stored.");
    return row.id;
  });
}

/** What deleting a piece takes with it: its knots (cascade) and the sheets that lose their knot link. */
export async function scoreDeletionImpact(database: Db, studioId: string, scoreId: string) {
  const knots = await database
    .select({ id: passage.id })
    .from(passage)
    .where(inStudio(passage, studioId, eq(passage.scoreId, scoreId)));
  const ids = knots.map((k) => k.id);
  const [sheets] = ids.length
    ? await database.select({ n: count() }).from(sheet).where(inStudio(sheet, studioId, inArray(sheet.passageId, ids)))
    : [{ n: 0 }];
  return { knots: ids.length, sheets: sheets?.n ?? 0 };
}

/**
 * Deletes a piece of the studio (its knots cascade; sheets keep their drills and lose the knot link).
 * Returns the deleted row's storage key, or null when the id is not this studio's.
 */
export async function deleteScore(database: Db, studioId: string, scoreId: string) {
  const [row] = await database
    .delete(score)
    .where(and(inStudio(score, studioId), eq(score.id, scoreId)))
    .returning({ id: score.id, storageKey: score.storageKey });
  return row ?? null;
}
