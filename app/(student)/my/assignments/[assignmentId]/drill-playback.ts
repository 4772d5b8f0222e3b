import { readScore } from "@/lib/score/read";
import type { StudentDrill } from "./sheet-drills";

/** Notes to play for one drill (ties merged, graces left out), or null when the drill cannot be read. */
export function drillPlayback(musicxml: string): StudentDrill["playback"] {
  try {
    const { score } = readScore(musicxml);
    const first = score.measures[0];
    if (!first) return null;
    return {
      beatsPerBar: first.time.beats,
      beatUnitQ: 4 / first.time.beatType,
      events: score.events
        .filter((e) => e.pitch && !e.grace && e.tie !== "stop" && e.tie !== "continue")
        .map((e) => ({ midi: e.pitch!.midi, onsetQ: e.onset.valueOf(), durationQ: e.duration.valueOf(), velocity: 0.7 })),
    };
  } catch {
    return null;
  }
}
