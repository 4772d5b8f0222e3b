import { and, desc, eq } from "drizzle-orm";
import { inStudio } from "../scope";
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
      createdAt: passage.createdAt,
    })
    .from(passage)
    .innerJoin(score, eq(score.id, passage.scoreId))
    .where(inStudio(passage, studioId))
    .orderBy(desc(passage.createdAt));
}

/** What every knot query returns about the knot itself. */
export const knotColumns = {
  id: passage.id,
  part: passage.part,
  hand: passage.hand,
  fromBar: passage.fromBar,
  toBar: passage.toBar,
  tags: passage.tags,
  note: passage.note,
} as const;

/** The knots marked in one piece of the studio, in bar order. */
export async function listPassagesForScore(database: Db, studioId: string, scoreId: string) {
  return database
    .select({ ...knotColumns, createdAt: passage.createdAt })
    .from(passage)
    .where(inStudio(passage, studioId, eq(passage.scoreId, scoreId)))
    .orderBy(passage.fromBar, passage.toBar, desc(passage.createdAt));
}

/** One knot of the studio with its piece's title, or null (unknown id or another studio). */
export async function getPassage(database: Db, studioId: string, passageId: string) {
  const [row] = await database
    .select({ ...knotColumns, scoreId: passage.scoreId, scoreTitle: score.title, createdAt: passage.createdAt })
    .from(passage)
    .innerJoin(score, and(eq(score.id, passage.scoreId), eq(score.studioId, studioId)))
    .where(inStudio(passage, studioId, eq(passage.id, passageId)))
    .limit(1);
  return row ?? null;
}

export interface NewPassage {
  studioId: string;
  scoreId: string;
  createdBy: string;
  part: string;
  hand: "right" | "left" | "both";
  /** Printed bar numbers. */
  fromBar: number;
  toBar: number;
  tags: string[];
  note: string | null;
}

/**
 * Inserts a knot when its piece belongs to the same studio. Returns the new id, or null when the
 * piece is unknown to this studio.
 */
export async function insertPassage(database: Db, input: NewPassage): Promise<string | null> {
  return database.transaction(async (tx) => {
    const [owner] = await tx
      .select({ id: score.id })
      .from(score)
      .where(inStudio(score, input.studioId, eq(score.id, input.scoreId)))
      .limit(1);
    if (!owner) return null;
    const [row] = await tx.insert(passage).values(input).returning({ id: passage.id });
    return row?.id ?? null;
  });
}
