/**
 * Parsed pieces reused across requests: reading a stored MusicXML copy is the slowest step of
 * generating drills, and a Score is plain read-only data. Keyed by piece id and its last change,
 * so an edited or replaced piece is read afresh; a few pieces at most are held.
 */
import { Lru } from "../lru";
import { readScore } from "../score/index";
import type { Score } from "../score/types";
import { checkScoreBounds } from "../score/limits";

const MAX_PIECES = 8;
const scores = new Lru<string, Score>({ maxEntries: MAX_PIECES });

export interface ScoreStamp {
  id: string;
  updatedAt: Date;
}

const keyOf = (stamp: ScoreStamp) => `${stamp.id}@${stamp.updatedAt.getTime()}`;

/** The parsed piece from the cache, or undefined (nothing is read). */
export function cachedScore(stamp: ScoreStamp): Score | undefined {
  return scores.get(keyOf(stamp));
}

/**
 * The piece parsed from its MusicXML, reusing the cached copy when the stamp is known. Throws ScoreError
 * like readScore, and when a number in it is out of bounds (a piece stored before the bounds existed).
 */
export function parsedScore(musicxml: string, stamp?: ScoreStamp): Score {
  if (!stamp) return bounded(readScore(musicxml).score);
  const key = keyOf(stamp);
  const hit = scores.get(key);
  if (hit) return hit;
  const score = bounded(readScore(musicxml).score);
  scores.set(key, score);
  return score;
}

function bounded(score: Score): Score {
  checkScoreBounds(score);
  return score;
}

/** Empties the cache (tests). */
export function clearScoreCache(): void {
  scores.clear();
}
