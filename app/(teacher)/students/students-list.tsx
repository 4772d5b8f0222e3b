"use client";
import type { ReactNode } from "react";
import { Progressive } from "@/components/progressive";
import type { StudentRow } from "./student-row";

const loadTable = () => import("./students-table").then((m) => m.StudentsTable);

/** The server's plain students table (`children`) first, then the sortable TanStack table in its place. */
export function StudentsList({ rows, children }: { rows: StudentRow[]; children: ReactNode }) {
  return (
    <Progressive load={loadTable} props={{ rows }}>
      {children}
    </Progressive>
  );
}
