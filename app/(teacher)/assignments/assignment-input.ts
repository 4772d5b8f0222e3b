import { z } from "zod";
import { COMMENT_MAX, isoDate, tempoField, utcDay } from "../../(student)/my/practice-input";

/**
 * Assigning a sheet, as the form sends it and the server checks it. The due date may not be in
 * the past: it must be on or after yesterday in UTC, the earliest "today" of any time zone.
 */
export const AssignmentInput = z.object({
  sheetId: z.string().min(1, "Pick a drill sheet."),
  studentMembershipIds: z.array(z.string().min(1)).min(1, "Pick at least one student."),
  dueDate: isoDate.refine((s) => s >= utcDay(-1), "The due date cannot be in the past."),
  tempoGoals: z.record(z.string(), tempoField.optional()),
  note: z.string().max(COMMENT_MAX, `Keep the note under ${COMMENT_MAX.toLocaleString("en")} characters.`).optional(),
});

export type AssignmentInput = z.infer<typeof AssignmentInput>;
