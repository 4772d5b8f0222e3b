/**
 * Tied notes → sounding notes: a tie start and the stops that continue it become one note whose
 * duration is the sum of the written pieces.
 */
import type { NoteEvent, TieFlag } from "./types";

/**
 * Merge tied written notes into sounding notes. A tie joins a note to the next note of the same part
 * and MIDI pitch that starts exactly where it ends; the merged note keeps the first note's id, onset,
 * written form and fingering, and gets tie "none" when the chain is complete. Rests, grace notes and
 * untied notes pass through; a dangling tie keeps its flag. Input order is kept.
 *
 * @example
 * // C4 half tied to C4 quarter → one C4 lasting three quarters
 * mergeTies(events).map((e) => e.duration.toFraction()); // ["3"]
 */
export function mergeTies(events: readonly NoteEvent[]): NoteEvent[] {
  const out: NoteEvent[] = [];
  const open = new Map<string, number>();
  for (const e of events) {
    const key = e.pitch && !e.grace ? `${e.part}|${e.pitch.midi}` : null;
    if (key && (e.tie === "stop" || e.tie === "continue")) {
      const at = open.get(key);
      const prev = at === undefined ? undefined : out[at];
      if (prev && prev.onset.add(prev.duration).equals(e.onset)) {
        // A chain that began here closes to "none"; one that came from before the input closes to "stop".
        const closed: TieFlag = prev.tie === "start" ? "none" : "stop";
        out[at!] = { ...prev, duration: prev.duration.add(e.duration), tie: e.tie === "continue" ? prev.tie : closed };
        if (e.tie === "stop") open.delete(key);
        continue;
      }
    }
    out.push(e);
    if (key && (e.tie === "start" || e.tie === "continue")) open.set(key, out.length - 1);
  }
  return out;
}
