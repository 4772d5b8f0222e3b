import { playbackOf } from "@/lib/knots/dto";
import { readScore } from "@/lib/score/read";
import type { StudentDrill } from "./sheet-drills";

/** Notes to play for one drill (ties merged, as on the teacher's pages), or null when it cannot be read. */
export function drillPlayback(musicxml: string): StudentDrill["playback"] {
  try {
    return playbackOf(readScore(musicxml).score);
  } catch {
    return null;
  }
}
