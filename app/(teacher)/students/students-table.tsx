"use client";
import { createColumnHelper, getCoreRowModel, getSortedRowModel, useReactTable, type SortingState } from "@tanstack/react-table";
import { useState } from "react";
import { SortableHead, TableRows, type TableLook } from "@/components/ui/sortable-table";
import { HandProfileEditor } from "./hand-profile-editor";
import type { StudentRow } from "./student-row";
import { AssignmentLinks } from "./students-plain-table";

export type { StudentRow };

const col = createColumnHelper<StudentRow>();
const columns = [
  col.accessor("name", { header: "Name", cell: (c) => <span className="font-bold">{c.getValue()}</span> }),
  col.accessor("email", { header: "E-mail" }),
  col.accessor("spanMm", {
    header: "Hand profile",
    enableSorting: false,
    cell: (c) => <HandProfileEditor membershipId={c.row.original.membershipId} name={c.row.original.name} spanMm={c.getValue()} octaveMm={c.row.original.octaveMm} />,
  }),
  col.accessor((r) => r.assignments.length, {
    id: "assignments",
    header: "Assignments",
    cell: (c) => <AssignmentLinks row={c.row.original} />,
  }),
];

const LOOK: TableLook = {
  th: "px-3 py-2",
  button: "font-bold text-walnut",
  tr: "border-b border-line align-top last:border-0",
  td: "px-3 py-2",
  sortLabel: (label, sorted) => <>{label} {sorted === "asc" ? "▲" : sorted === "desc" ? "▼" : ""}</>,
  plainLabel: (label) => <span className="font-bold text-walnut">{label}</span>,
};

/** The studio's students, sortable by name, e-mail or number of assignments (loaded after the first paint). */
export function StudentsTable({ rows }: { rows: StudentRow[] }) {
  const [sorting, setSorting] = useState<SortingState>([{ id: "name", desc: false }]);
  const table = useReactTable({ data: rows, columns, state: { sorting }, onSortingChange: setSorting, getCoreRowModel: getCoreRowModel(), getSortedRowModel: getSortedRowModel() });
  return (
    <div className="overflow-x-auto rounded-xl border border-line bg-card">
      <table className="w-full text-left text-sm" data-testid="students-table">
        <SortableHead table={table} look={LOOK} />
        <tbody>
          <TableRows table={table} look={LOOK} />
        </tbody>
      </table>
    </div>
  );
}
