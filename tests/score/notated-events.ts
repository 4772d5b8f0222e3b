// Notated events as comparable text rows, for read → write → read checks: pitch, onset, duration,
// written type, dots and tuplet, grace order and slash, tremolo, arpeggio and octave line.
import { mergeTies } from "../../lib/score/ties";
import type { NoteEvent } from "../../lib/score/types";

/**
 * One row per sounding note (tied notes merged, since splitting at barlines may re-cut ties; the
 * written type is compared only for notes that are not tied, whose value must come back unchanged)
 * and one per grace note in the order the part lists them.
 */
export function notatedRows(source: readonly NoteEvent[]): string[] {
  const events = withoutHalfTies(source);
  const untied = new Set(events.filter((e) => e.tie === "none").map((e) => e.id));
  const rows = mergeTies(events)
    .filter((e) => e.pitch && !e.grace)
    .map((e) => {
      const written = untied.has(e.id) ? `${e.written.type} ${e.written.dots} ${e.written.tuplet ? `${e.written.tuplet.actual}:${e.written.tuplet.normal}` : "-"}` : "tied";
      const tremolo = e.tremolo ? `trem ${e.tremolo.type} ${e.tremolo.marks}` : "";
      return [e.part, e.staff, e.pitch!.midi, e.onset.toFraction(), e.duration.toFraction(), written, tremolo, e.arpeggio ?? "", e.octaveShift ?? 0].join(" ");
    })
    .sort();
  const graces = events
    .filter((e) => e.grace && e.pitch)
    .map((e) => [e.part, e.staff, e.onset.toFraction(), "grace", e.pitch!.midi, e.graceSlash ? "slash" : "", e.octaveShift ?? 0].join(" "));
  return [...rows, ...graces];
}

/**
 * The tie flags the writer keeps: a tie stop with no start before it has no MusicXML form and is dropped;
 * a start with no stop is written as `<tied type="let-ring">` (MusicXML 4.0 <tied>: "let-ring" — the
 * note sounds on, tied to nothing) and reads back as a start. Never half a pair.
 */
export function withoutHalfTies(events: readonly NoteEvent[]): NoteEvent[] {
  const ends = new Set(events.filter((e) => e.pitch && (e.tie === "start" || e.tie === "continue")).map((e) => `${e.part} ${e.pitch!.midi} ${e.onset.add(e.duration).toFraction()}`));
  return events.map((e) => {
    if (!e.pitch || (e.tie !== "stop" && e.tie !== "continue") || ends.has(`${e.part} ${e.pitch.midi} ${e.onset.toFraction()}`)) return e;
    return { ...e, tie: e.tie === "continue" ? "start" : "none" };
  });
}
