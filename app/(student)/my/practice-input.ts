import { z } from "zod";

/** Tempo a student can log or a teacher can set, in beats per minute (common practice: metronomes run 40–208; 20–300 leaves room for slow subdivisions and fast counts). */
export const TEMPO_MIN = 20;
export const TEMPO_MAX = 300;
export const MINUTES_MAX = 600;
export const COMMENT_MAX = 2000;

export const tempoField = z
  .number({ error: "Enter a tempo in beats per minute." })
  .int("Whole beats per minute, please.")
  .min(TEMPO_MIN, `Tempo must be at least ${TEMPO_MIN} bpm.`)
  .max(TEMPO_MAX, `Tempo must be at most ${TEMPO_MAX} bpm.`);

export const isoDate = z.string().regex(/^\d{4}-\d{2}-\d{2}$/, "Use a date like 2025-03-14.").refine((s) => {
  const d = new Date(`${s}T00:00:00Z`);
  return !Number.isNaN(d.getTime()) && d.toISOString().slice(0, 10) === s;
}, "That date does not exist.");

/** Today as YYYY-MM-DD in UTC, shifted by `days`. */
export function utcDay(days = 0, now: Date = new Date()): string {
  return new Date(now.getTime() + days * 86_400_000).toISOString().slice(0, 10);
}

/**
 * One practice entry, as the form sends it and the server checks it. Tempo per drill is optional
 * (a drill not played that day is left empty). The practice day may be at most one day ahead of
 * UTC, so every time zone's "today" passes.
 */
export const PracticeEntryInput = z.object({
  assignmentId: z.string().min(1),
  practisedOn: isoDate.refine((s) => s <= utcDay(1), "Practice cannot be logged for a future day."),
  minutes: z
    .number({ error: "Enter the minutes you practised." })
    .int("Whole minutes, please.")
    .min(1, "At least 1 minute.")
    .max(MINUTES_MAX, `At most ${MINUTES_MAX} minutes in one entry.`),
  tempos: z.record(z.string(), tempoField.optional()),
  ease: z
    .number({ error: "Pick how easy it felt." })
    .int()
    .min(1, "Ease runs from 1 (hard) to 5 (easy).")
    .max(5, "Ease runs from 1 (hard) to 5 (easy)."),
  comment: z.string().max(COMMENT_MAX, `Keep the comment under ${COMMENT_MAX.toLocaleString("en")} characters.`).optional(),
});

export type PracticeEntryInput = z.infer<typeof PracticeEntryInput>;
