import Link from "next/link";
import { HandProfileEditor } from "./hand-profile-editor";
import type { StudentRow } from "./student-row";

const HEADERS = ["Name", "E-mail", "Hand profile", "Assignments"];

/** One student's assignments, linked to their progress (shared by the plain and the sortable table). */
export function AssignmentLinks({ row }: { row: StudentRow }) {
  if (row.assignments.length === 0) return <span className="text-muted">none</span>;
  return (
    <ul className="flex flex-col gap-0.5">
      {row.assignments.map((a) => (
        <li key={a.id}>
          <Link className="underline" href={`/progress?assignment=${a.id}`}>{a.sheetTitle}</Link>
          <span className="font-mono text-xs text-muted"> {a.dueDate ? `due ${a.dueDate}` : ""}</span>
        </li>
      ))}
    </ul>
  );
}

/**
 * The students as the server sends them, by name: a plain table with the hand-profile editors,
 * readable before any script runs. The sortable table replaces it once loaded.
 */
export function StudentsPlainTable({ rows }: { rows: StudentRow[] }) {
  const sorted = [...rows].sort((a, b) => a.name.localeCompare(b.name));
  return (
    <div className="overflow-x-auto rounded-xl border border-line bg-card">
      <table className="w-full text-left text-sm" data-testid="students-table">
        <thead className="border-b border-line bg-paper">
          <tr>
            {HEADERS.map((h) => (
              <th key={h} scope="col" className="px-3 py-2" aria-sort={h === "Name" ? "ascending" : undefined}>
                <span className="font-bold text-walnut">{h}{h === "Name" ? " ▲" : ""}</span>
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {sorted.map((r) => (
            <tr key={r.membershipId} className="border-b border-line align-top last:border-0">
              <td className="px-3 py-2"><span className="font-bold">{r.name}</span></td>
              <td className="px-3 py-2">{r.email}</td>
              <td className="px-3 py-2">
                <HandProfileEditor membershipId={r.membershipId} name={r.name} spanMm={r.spanMm} octaveMm={r.octaveMm} />
              </td>
              <td className="px-3 py-2"><AssignmentLinks row={r} /></td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
