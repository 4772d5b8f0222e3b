/** One row of the students table, as the page builds it. */
export interface StudentRow {
  membershipId: string;
  name: string;
  email: string;
  spanMm: number | null;
  octaveMm: number | null;
  assignments: { id: string; sheetTitle: string; dueDate: string | null }[];
}
