"use client";
import type { ReactNode } from "react";
import { Progressive } from "../progressive";
import type { PieceListRow } from "./piece-keys";

const loadTable = () => import("./pieces-table").then((m) => m.PiecesTable);

/**
 * The pieces list: the server's plain table (`children`) first, then the interactive TanStack table
 * (sort, filter, delete), loaded after the first paint, in its place.
 */
export function PiecesList({ initial, children }: { initial: PieceListRow[]; children: ReactNode }) {
  return (
    <Progressive load={loadTable} props={{ initial }}>
      {children}
    </Progressive>
  );
}
