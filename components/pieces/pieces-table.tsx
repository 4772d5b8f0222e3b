"use client";
import Link from "next/link";
import { useEffect, useMemo, useState } from "react";
import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import {
  createColumnHelper,
  getCoreRowModel,
  getFilteredRowModel,
  getSortedRowModel,
  useReactTable,
  type SortingState,
} from "@tanstack/react-table";
import { QueryProvider } from "../providers";
import { SortableHead, TableRows, type TableLook } from "../ui/sortable-table";
import { DeletePieceDialog } from "./delete-piece-dialog";
import { fetchPieces, formatUploaded, pieceKeys, type PieceListRow } from "./piece-keys";

const col = createColumnHelper<PieceListRow>();

const LOOK: TableLook = {
  th: "px-4 py-2.5 font-bold text-walnut",
  button: "inline-flex items-center gap-1 rounded hover:underline",
  tr: "hover:bg-paper/60",
  td: "px-4 py-2.5 align-middle",
  sortLabel: (label, sorted) => (
    <>
      {label}
      <span aria-hidden="true" className="text-xs text-muted">{sorted === "asc" ? "▲" : sorted === "desc" ? "▼" : "↕"}</span>
    </>
  ),
};

/**
 * The studio's pieces: sortable columns, a filter box, and delete with confirmation. Loaded lazily
 * by the pieces list, so TanStack Query and Table are not part of the page's first load.
 */
export function PiecesTable({ initial }: { initial: PieceListRow[] }) {
  return (
    <QueryProvider>
      <InteractivePiecesTable initial={initial} />
    </QueryProvider>
  );
}

function InteractivePiecesTable({ initial }: { initial: PieceListRow[] }) {
  const queryClient = useQueryClient();
  const { data = [], isError } = useQuery({ queryKey: pieceKeys.list(), queryFn: fetchPieces, initialData: initial });
  // The server's list is the freshest: it arrives again after an upload refreshes the page.
  useEffect(() => {
    queryClient.setQueryData(pieceKeys.list(), initial);
  }, [initial, queryClient]);
  const [sorting, setSorting] = useState<SortingState>([{ id: "createdAt", desc: true }]);
  const [filter, setFilter] = useState("");
  const [toDelete, setToDelete] = useState<PieceListRow | null>(null);
  const remove = useMutation({
    mutationFn: async (id: string) => {
      const res = await fetch(`/api/pieces/${id}`, { method: "DELETE" });
      if (!res.ok) throw new Error(((await res.json().catch(() => ({}))) as { error?: string }).error ?? "The piece could not be deleted.");
    },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: pieceKeys.all }),
  });

  const columns = useMemo(
    () => [
      col.accessor("title", {
        header: "Title",
        cell: (c) => <Link href={`/pieces/${c.row.original.id}`} className="font-bold text-walnut underline-offset-2 hover:underline">{c.getValue()}</Link>,
      }),
      col.accessor((r) => r.composer ?? "", { id: "composer", header: "Composer", cell: (c) => c.getValue() || <span className="text-muted">not given</span> }),
      col.accessor("bars", { header: "Bars", cell: (c) => <span className="font-mono">{c.getValue()}</span> }),
      col.accessor("createdAt", { header: "Uploaded", cell: (c) => formatUploaded(c.getValue()), enableGlobalFilter: false }),
      col.accessor("knots", { header: "Knots", cell: (c) => <span className="font-mono">{c.getValue()}</span> }),
      col.display({
        id: "actions",
        header: () => <span className="sr-only">Actions</span>,
        cell: (c) => (
          <button type="button" onClick={() => setToDelete(c.row.original)} className="rounded-full px-3 py-1 text-sm font-bold text-madder hover:bg-madder-soft">
            Delete<span className="sr-only"> {c.row.original.title}</span>
          </button>
        ),
      }),
    ],
    [],
  );
  const table = useReactTable({
    data,
    columns,
    state: { sorting, globalFilter: filter },
    onSortingChange: setSorting,
    onGlobalFilterChange: setFilter,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
  });

  return (
    <div className="flex flex-col gap-3">
      <label className="flex max-w-sm flex-col gap-1 text-sm font-bold text-walnut">
        Filter pieces
        <input
          type="search"
          value={filter}
          onChange={(e) => setFilter(e.target.value)}
          placeholder="Title or composer"
          className="rounded-xl border border-line bg-card px-3.5 py-2 text-base font-normal text-ink outline-none focus:border-walnut"
        />
      </label>
      {isError ? <p role="alert" className="text-sm text-madder">The list could not be refreshed.</p> : null}
      <div className="relative overflow-x-auto rounded-2xl border border-line bg-card">
        <table className="w-full min-w-[36rem] text-left text-sm" aria-label="Pieces">
          <SortableHead table={table} look={LOOK} />
          <tbody className="divide-y divide-line">
            <TableRows table={table} look={LOOK} />
            {table.getRowModel().rows.length === 0 ? (
              <tr>
                <td colSpan={columns.length} className="px-4 py-6 text-center text-muted">
                  {data.length === 0 ? "No pieces yet — upload one above." : "No piece matches the filter."}
                </td>
              </tr>
            ) : null}
          </tbody>
        </table>
      </div>
      <DeletePieceDialog
        piece={toDelete}
        onCancel={() => setToDelete(null)}
        onConfirm={async (p) => {
          try {
            await remove.mutateAsync(p.id);
            setToDelete(null);
            return null;
          } catch (e) {
            return (e as Error).message;
          }
        }}
      />
    </div>
  );
}
