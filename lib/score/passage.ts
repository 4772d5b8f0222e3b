/**
 * Passages (a teacher's knot): bars of one part and hand, with their sonorities and groups, plus the
 * mapping between printed bar numbers and measure indexes.
 */
import { ScoreError } from "./errors";
import { beatGroups, figureGroups, sonorities } from "./passage-groups";
import { handsOfPart, pianoPart } from "./parts";
import { partMeasure } from "./part-measure";
import type { Hand, NoteEvent, NoteGroup, Passage, Score } from "./types";

export { beatGroups, beatLength, figureGroups, sonorities } from "./passage-groups";

/** What `selectPassage` needs: measure indexes are 0-based and inclusive. */
export interface PassageRequest {
  readonly part?: string;
  readonly hand: Hand | "both";
  readonly from: number;
  readonly to: number;
}

/**
 * Cut a passage out of a score. Without a part, the piano part is used (found by staves and name, see
 * parts.ts). Staff 1 is the right hand and staff 2 the left, and a cross-staff note follows its voice's
 * hand; in a one-staff part both hands read staff 1, and "both" then gives all notes to the right hand.
 *
 * @example
 * const knot = selectPassage(score, { hand: "left", from: 4, to: 7 });
 * knot.sonorities.left[0].notes.map((n) => n.pitch?.midi); // [43, 50, 55]
 */
export function selectPassage(score: Score, request: PassageRequest): Passage {
  const part = request.part ? score.parts.find((p) => p.id === request.part) : (pianoPart(score) ?? score.parts[0]);
  if (!part) throw new ScoreError("bad-passage", `The score has no part "${request.part}"`);
  const { from, to, hand } = request;
  const last = score.measures.length - 1;
  if (!Number.isInteger(from) || !Number.isInteger(to) || from < 0 || to > last || from > to) {
    throw new ScoreError("bad-passage", `Bars ${from}–${to} are not a range inside 0–${last}`);
  }
  const staffOf = { right: 1, left: part.staves >= 2 ? 2 : 1 };
  const inBars = score.events.filter((e) => e.part === part.id && e.measure >= from && e.measure <= to);
  const oneStaff = staffOf.left === staffOf.right;
  const handOf = oneStaff ? null : handsOfPart(score.events.filter((e) => e.part === part.id), part.id);
  const handEvents = (h: Hand): NoteEvent[] =>
    oneStaff ? (h === "right" || hand === "left" ? inBars : []) : inBars.filter((e) => handOf!(e) === h);
  const events = hand === "both" ? inBars : handEvents(hand);
  const measures = score.measures.slice(from, to + 1).map((m) => partMeasure(m, part.id));
  const build = (h: Hand) => {
    if (hand !== "both" && hand !== h) return { sons: [], groups: [] as NoteGroup[] };
    const sons = sonorities(handEvents(h), h);
    const groups = [...beatGroups(sons, measures), ...figureGroups(sons)].sort(
      (a, b) => a.onset.compare(b.onset) || (a.kind === b.kind ? 0 : a.kind === "beat" ? -1 : 1),
    );
    return { sons, groups };
  };
  const right = build("right");
  const left = build("left");
  return {
    part: part.id,
    hand,
    from,
    to,
    measures,
    events,
    sonorities: { right: right.sons, left: left.sons },
    groups: { right: right.groups, left: left.groups },
    key: measures[0].key,
    time: measures[0].time,
    meta: score.meta,
    staffOf,
  };
}

/**
 * Printed bar numbers by measure index (a pickup is usually "0"; repeated numbers stay repeated).
 *
 * @example
 * barNumbers(score); // ["0", "1", "2", …]
 */
export function barNumbers(score: Score): string[] {
  return score.measures.map((m) => m.number);
}

/**
 * Measure index of a printed bar number; `occurrence` picks among bars that share a number
 * (1 = first). Returns undefined when no such bar exists.
 *
 * @example
 * barIndex(score, "1"); // 1 when bar 0 is a pickup
 * barIndex(score, "5", 2); // the second bar printed "5" (e.g. after a repeat written out)
 */
export function barIndex(score: Score, printedNumber: string | number, occurrence = 1): number | undefined {
  const wanted = String(printedNumber).trim();
  let seen = 0;
  for (const m of score.measures) {
    if (m.number === wanted && ++seen === occurrence) return m.index;
  }
  return undefined;
}
