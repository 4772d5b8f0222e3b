"use client";
/**
 * What every sortable TanStack table in Knotwork shares: header cells that toggle their column's
 * sort and announce it (`aria-sort`), and body rows of rendered cells. Each table keeps its own
 * look through a `TableLook` (class names and how a header label shows its sort arrow).
 */
import { flexRender, type SortDirection, type Table } from "@tanstack/react-table";
import type { ReactNode } from "react";

export interface TableLook {
  th: string;
  /** The sort button inside a sortable header. */
  button: string;
  tr: string;
  td: string;
  /** A sortable header's button content: the column's label and its sort state. */
  sortLabel: (label: ReactNode, sorted: false | SortDirection) => ReactNode;
  /** A header that does not sort (default: the label as it is). */
  plainLabel?: (label: ReactNode) => ReactNode;
}

const ARIA_SORT = { asc: "ascending", desc: "descending" } as const;

/** The `<thead>` of a TanStack table: a button per sortable column, `aria-sort` on the sorted one. */
export function SortableHead<T>({ table, look }: { table: Table<T>; look: TableLook }) {
  return (
    <thead className="border-b border-line bg-paper">
      {table.getHeaderGroups().map((hg) => (
        <tr key={hg.id}>
          {hg.headers.map((h) => {
            const sorted = h.column.getIsSorted();
            const label = flexRender(h.column.columnDef.header, h.getContext());
            return (
              <th key={h.id} scope="col" className={look.th} aria-sort={sorted ? ARIA_SORT[sorted] : undefined}>
                {h.column.getCanSort() ? (
                  <button type="button" onClick={h.column.getToggleSortingHandler()} className={look.button}>
                    {look.sortLabel(label, sorted)}
                  </button>
                ) : look.plainLabel ? (
                  look.plainLabel(label)
                ) : (
                  label
                )}
              </th>
            );
          })}
        </tr>
      ))}
    </thead>
  );
}

/** The body rows of a TanStack table (the caller owns `<tbody>`, so it can add an empty-state row). */
export function TableRows<T>({ table, look }: { table: Table<T>; look: TableLook }) {
  return table.getRowModel().rows.map((row) => (
    <tr key={row.id} className={look.tr}>
      {row.getVisibleCells().map((cell) => (
        <td key={cell.id} className={look.td}>{flexRender(cell.column.columnDef.cell, cell.getContext())}</td>
      ))}
    </tr>
  ));
}
