/**
 * The JSON shape of a drill as the browser sees it: what the generate handler returns and what a
 * saved sheet drill is built from. One place turns a `Drill` (or a stored MusicXML score) into it.
 */
import type { Drill, SpanReport } from "./drills/types";
import type { Score } from "./score/types";
import { writeMusicXML } from "./score/write";

export interface PlaybackData {
  events: { midi: number; onsetQ: number; durationQ: number; velocity: number }[];
  beatsPerBar: number;
  beatUnitQ: number;
}

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

/** Notes to sound (ties merged by skipping continuations, grace notes left out) and the metre. */
export function playbackOf(score: Score): PlaybackData {
  const first = score.measures[0];
  const origin = first ? first.start.valueOf() : 0;
  return {
    events: score.events
      .filter((e) => e.pitch && !e.grace && e.tie !== "stop" && e.tie !== "continue")
      .map((e) => ({ midi: e.pitch!.midi, onsetQ: e.onset.valueOf() - origin, durationQ: e.duration.valueOf(), velocity: 0.7 })),
    beatsPerBar: first?.time.beats ?? 4,
    beatUnitQ: first ? 4 / first.time.beatType : 1,
  };
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
