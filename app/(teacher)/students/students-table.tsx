"use client";
import { createColumnHelper, flexRender, getCoreRowModel, getSortedRowModel, useReactTable, type SortingState } from "@tanstack/react-table";
import { useState } from "react";
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
    cell: (c) => <HandProfileEditor membershipId={c.row.original.membershipId} name={c.row.original.name} spanMm={c.getValue()} octaveMm={c.row.original.octaveMm} />,
  }),
  col.accessor((r) => r.assignments.length, {
    id: "assignments",
    header: "Assignments",
    cell: (c) => <AssignmentLinks row={c.row.original} />,
  }),
];

/** The studio's students, sortable by name, e-mail or number of assignments (loaded after the first paint). */
export function StudentsTable({ rows }: { rows: StudentRow[] }) {
  const [sorting, setSorting] = useState<SortingState>([{ id: "name", desc: false }]);
  const table = useReactTable({ data: rows, columns, state: { sorting }, onSortingChange: setSorting, getCoreRowModel: getCoreRowModel(), getSortedRowModel: getSortedRowModel() });
  return (
    <div className="overflow-x-auto rounded-xl border border-line bg-card">
      <table className="w-full text-left text-sm" data-testid="students-table">
        <thead className="border-b border-line bg-paper">
          {table.getHeaderGroups().map((hg) => (
            <tr key={hg.id}>
              {hg.headers.map((h) => {
                const sorted = h.column.getIsSorted();
                return (
                  <th key={h.id} scope="col" className="px-3 py-2" aria-sort={sorted ? (sorted === "asc" ? "ascending" : "descending") : undefined}>
                    {h.column.getCanSort() && h.column.id !== "spanMm" ? (
                      <button type="button" onClick={h.column.getToggleSortingHandler()} className="font-bold text-walnut">
                        {flexRender(h.column.columnDef.header, h.getContext())} {sorted === "asc" ? "▲" : sorted === "desc" ? "▼" : ""}
                      </button>
                    ) : (
                      <span className="font-bold text-walnut">{flexRender(h.column.columnDef.header, h.getContext())}</span>
                    )}
                  </th>
                );
              })}
            </tr>
          ))}
        </thead>
        <tbody>
          {table.getRowModel().rows.map((r) => (
            <tr key={r.id} className="border-b border-line align-top last:border-0">
              {r.getVisibleCells().map((c) => <td key={c.id} className="px-3 py-2">{flexRender(c.column.columnDef.cell, c.getContext())}</td>)}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
