import { and, eq, sql } from "drizzle-orm";
import { inStudio } from "../scope";
import type { Db } from "../index";
import { handProfile, membership, passage, score, user } from "../schema";
import { preparedFor } from "./prepared";
import { knotColumns } from "./passages";

/** One knot of the studio with its piece's cleaned MusicXML, or null (unknown id or another studio). */
export async function getKnotSource(database: Db, studioId: string, knotId: string) {
  const [row] = await database
    .select({
      ...knotColumns,
      scoreId: passage.scoreId,
      scoreTitle: score.title,
      composer: score.composer,
      knotUpdatedAt: passage.updatedAt,
      scoreUpdatedAt: score.updatedAt,
      musicxml: score.musicxml,
    })
    .from(passage)
    .innerJoin(score, and(eq(score.id, passage.scoreId), eq(score.studioId, studioId)))
    .where(inStudio(passage, studioId, eq(passage.id, knotId)))
    .limit(1);
  return row ?? null;
}

const knotStamp = preparedFor((database: Db) =>
  database
    .select({
      id: passage.id,
      scoreId: passage.scoreId,
      part: passage.part,
      hand: passage.hand,
      fromBar: passage.fromBar,
      toBar: passage.toBar,
      knotUpdatedAt: passage.updatedAt,
      scoreUpdatedAt: score.updatedAt,
    })
    .from(passage)
    .innerJoin(score, and(eq(score.id, passage.scoreId), eq(score.studioId, sql.placeholder("studioId"))))
    .where(and(eq(passage.studioId, sql.placeholder("studioId")), eq(passage.id, sql.placeholder("knotId"))))
    .limit(1)
    .prepare(),
);

/**
 * One knot of the studio with its piece's id and both rows' change stamps, without the MusicXML
 * (the generate handler reads the piece only when its parsed copy is not cached).
 */
export async function getKnotStamp(database: Db, studioId: string, knotId: string) {
  if (!studioId) throw new Error("A studio id is required to scope a query.");
  const [row] = await knotStamp(database).all({ studioId, knotId });
  return row ?? null;
}

/** A piece's cleaned MusicXML, or null (unknown id or another studio). */
export async function getScoreMusicXml(database: Db, studioId: string, scoreId: string): Promise<string | null> {
  const [row] = await database
    .select({ musicxml: score.musicxml })
    .from(score)
    .where(inStudio(score, studioId, eq(score.id, scoreId)))
    .limit(1);
  return row?.musicxml ?? null;
}

/** The studio's students who have a hand profile, for the "whose hand" chooser. */
export async function listHandProfiles(database: Db, studioId: string) {
  return database
    .select({ membershipId: membership.id, name: user.name, spanMm: handProfile.spanMm, octaveMm: handProfile.octaveMm })
    .from(handProfile)
    .innerJoin(membership, eq(membership.id, handProfile.membershipId))
    .innerJoin(user, eq(user.id, membership.userId))
    .where(inStudio(membership, studioId, eq(membership.role, "student")))
    .orderBy(user.name);
}

/** One student's hand profile in this studio, or null. */
export async function getHandProfile(database: Db, studioId: string, membershipId: string) {
  const [row] = await database
    .select({ spanMm: handProfile.spanMm, octaveMm: handProfile.octaveMm })
    .from(handProfile)
    .innerJoin(membership, eq(membership.id, handProfile.membershipId))
    .where(inStudio(membership, studioId, eq(membership.id, membershipId)))
    .limit(1);
  return row ?? null;
}

/** A knot's piece and bars, for links back from a drill sheet; null when the knot is gone or elsewhere. */
export async function getKnotHeading(database: Db, studioId: string, knotId: string) {
  const [row] = await database
    .select({ id: passage.id, scoreId: passage.scoreId, scoreTitle: score.title, fromBar: passage.fromBar, toBar: passage.toBar })
    .from(passage)
    .innerJoin(score, and(eq(score.id, passage.scoreId), eq(score.studioId, studioId)))
    .where(inStudio(passage, studioId, eq(passage.id, knotId)))
    .limit(1);
  return row ?? null;
}
