/**
 * The JSON shape of a drill as the browser sees it: what the generate handler returns and what a
 * saved sheet drill is built from. One place turns a `Drill` (or a stored MusicXML score) into it.
 */
import type { Drill, SpanReport } from "../drills/types";
import { playbackEvents, type ScorePlayback } from "../playback";
import type { Score } from "../score/types";
import { writeMusicXML } from "../score/write";

/** A drill's notes to sound and its metre (see lib/playback). */
export type PlaybackData = Pick<ScorePlayback, "events" | "beatsPerBar" | "beatUnitQ">;

export interface DrillDto {
  /** Stable within one generate request: family, variant and running number. */
  key: string;
  family: string;
  variant: string;
  title: string;
  teacherNote: string;
  studentNote: string;
  hands: "right" | "left" | "both";
  tempo: { start: number; target: number };
  maxSpan: { right?: SpanReport; left?: SpanReport };
  warnings: { code: string; message: string }[];
  /** Some fingerings were estimated by Knotwork rather than taken from the piece. */
  estimatedFingering: boolean;
  /** Some hand needs more than its comfortable span. */
  overSpan: boolean;
  musicxml: string;
  playback: PlaybackData;
}

/** Notes to sound (tied notes as one note of their full length) and the metre. */
export function playbackOf(score: Score): PlaybackData {
  const { events, beatsPerBar, beatUnitQ } = playbackEvents(score);
  return { events, beatsPerBar, beatUnitQ };
}

/** Drill keys for a generated list: `family:variant:n`, n counting repeats of the same pair. */
export function drillKeys(drills: readonly Pick<Drill, "family" | "variant">[]): string[] {
  const seen = new Map<string, number>();
  return drills.map((d) => {
    const base = `${d.family}:${d.variant}`;
    const n = seen.get(base) ?? 0;
    seen.set(base, n + 1);
    return `${base}:${n}`;
  });
}

/** A generated drill as JSON for the browser. */
export function toDrillDto(drill: Drill, key: string): DrillDto {
  const spans = [drill.maxSpan.right, drill.maxSpan.left].filter((s): s is SpanReport => !!s);
  return {
    key,
    family: drill.family,
    variant: drill.variant,
    title: drill.title,
    teacherNote: drill.teacherNote,
    studentNote: drill.studentNote,
    hands: drill.hands,
    tempo: { start: drill.tempo.start, target: drill.tempo.target },
    maxSpan: { ...drill.maxSpan },
    warnings: drill.warnings.map((w) => ({ code: w.code, message: w.message })),
    estimatedFingering: Object.values(drill.fingeringSource).includes("estimated"),
    overSpan: spans.some((s) => s.overComfortable),
    musicxml: writeMusicXML(drill.score),
    playback: playbackOf(drill.score),
  };
}
