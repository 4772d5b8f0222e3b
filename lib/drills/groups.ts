/**
 * Grouping a hand's sonorities the way a teacher would block or stop them: by beat, half bar,
 * bar, hand position (as many notes as fit under the hand), or the passage's own figures.
 */
import Fraction from "fraction.js";
import type { Hand, Passage, Sonority, TimeSignature } from "../score/types";
import type { HandProfile } from "./types";
import { barLength } from "./layout";
import { spanOf } from "./hand";

export const GROUP_BY = ["beat", "half-bar", "bar", "position", "figure"] as const;
export type GroupBy = (typeof GROUP_BY)[number];

/**
 * The beat in quarter notes: a dotted quarter in compound time (6/8, 9/8, 12/8), else one
 * `beat-type` note (common practice).
 *
 * @example
 * beatLength({ beats: 6, beatType: 8 }).toFraction(); // "3/2"
 */
export function beatLength(time: TimeSignature): Fraction {
  if (time.beatType >= 8 && time.beats % 3 === 0 && time.beats > 3) return new Fraction(3 * 4, time.beatType);
  return new Fraction(4, time.beatType);
}

/**
 * Offset of an onset from the start of its (full-length) bar, counting a pickup from its missing part.
 *
 * @example
 * placeInBar(passage, new Fraction(5)); // { bar: 1, offset: 1 } in 4/4
 */
export function placeInBar(passage: Passage, onset: Fraction): { bar: number; offset: Fraction } {
  const m = [...passage.measures].reverse().find((x) => x.start.compare(onset) <= 0) ?? passage.measures[0];
  const full = barLength(m.time);
  const missing = m.length.compare(full) < 0 && m.index === passage.measures[0].index ? full.sub(m.length) : new Fraction(0);
  return { bar: m.index, offset: onset.sub(m.start).add(missing) };
}

/**
 * Consecutive sonorities of one hand, grouped.
 *
 * @example
 * groupSonorities(passage, "right", "beat", PROFILE).map((g) => g.length); // e.g. [2, 2, 2, 2]
 */
export function groupSonorities(passage: Passage, hand: Hand, by: GroupBy, profile: HandProfile): Sonority[][] {
  const sons = passage.sonorities[hand];
  if (by === "figure") {
    const figures = passage.groups[hand].map((g) => [...g.sonorities]).filter((g) => g.length > 0);
    return figures.length ? figures : groupSonorities(passage, hand, "beat", profile);
  }
  if (by === "position") return byPosition(sons, profile);
  const unit =
    by === "beat" ? beatLength(passage.time) : by === "half-bar" ? barLength(passage.time).div(2) : barLength(passage.time);
  const groups: Sonority[][] = [];
  let lastKey = "";
  for (const s of sons) {
    const { bar, offset } = placeInBar(passage, s.onset);
    const key = `${bar}:${offset.div(unit).floor().toFraction()}`;
    if (key === lastKey) groups[groups.length - 1].push(s);
    else groups.push([s]);
    lastKey = key;
  }
  return groups;
}

/** As many consecutive sonorities as fit under the hand without passing its comfortable span. */
function byPosition(sons: readonly Sonority[], profile: HandProfile): Sonority[][] {
  const groups: Sonority[][] = [];
  let current: Sonority[] = [];
  for (const s of sons) {
    const trial = [...current, s].flatMap((x) => x.notes);
    if (current.length && spanOf(trial, null, profile).overComfortable) {
      groups.push(current);
      current = [s];
    } else current.push(s);
  }
  if (current.length) groups.push(current);
  return groups;
}

/**
 * The distinct pitches of a group, low to high, with the first note of each pitch as source.
 *
 * @example
 * distinctNotes(group).map((n) => n.pitch!.midi); // [60, 64, 67]
 */
export function distinctNotes(group: readonly Sonority[]) {
  const seen = new Map<number, Sonority["notes"][number]>();
  for (const s of group) for (const n of s.notes) if (n.pitch && !seen.has(n.pitch.midi)) seen.set(n.pitch.midi, n);
  return [...seen.values()].sort((a, b) => a.pitch!.midi - b.pitch!.midi);
}

/**
 * Total time a group takes: from its first onset to the end of its last sonority.
 *
 * @example
 * groupLength(group).toFraction(); // "1" for four sixteenths
 */
export function groupLength(group: readonly Sonority[]): Fraction {
  const last = group[group.length - 1];
  return last.onset.add(last.duration).sub(group[0].onset);
}
