/** Name of the tempo-goal input of one drill in the assign form. */
export const tempoGoalName = (drillId: string) => `tempoGoal.${drillId}`;

/**
 * The assign form's fields as the object the assignment schema checks: the ticked students, the due
 * date, a tempo goal per drill (an empty box is no goal; anything else is passed on as a number for
 * the schema to judge) and the note. Types are left to the schema.
 */
export function assignmentFromForm(form: FormData): Record<string, unknown> {
  const text = (name: string) => {
    const v = form.get(name);
    return typeof v === "string" ? v : undefined;
  };
  const tempoGoals: Record<string, number> = {};
  for (const [name, value] of form.entries()) {
    if (!name.startsWith("tempoGoal.") || typeof value !== "string" || value.trim() === "") continue;
    tempoGoals[name.slice("tempoGoal.".length)] = Number(value);
  }
  return {
    sheetId: text("sheetId"),
    studentMembershipIds: form.getAll("studentMembershipIds").filter((v): v is string => typeof v === "string"),
    dueDate: text("dueDate"),
    tempoGoals,
    note: text("note"),
  };
}
