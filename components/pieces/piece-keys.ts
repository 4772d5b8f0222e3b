/** TanStack Query keys for pieces. */
export const pieceKeys = {
  all: ["pieces"] as const,
  list: () => [...pieceKeys.all, "list"] as const,
};

export interface PieceListRow {
  id: string;
  title: string;
  composer: string | null;
  bars: number;
  createdAt: string;
  knots: number;
}

export async function fetchPieces(): Promise<PieceListRow[]> {
  const res = await fetch("/api/pieces", { headers: { accept: "application/json" } });
  if (!res.ok) throw new Error("The pieces could not be loaded.");
  return ((await res.json()) as { pieces: PieceListRow[] }).pieces;
}

const dateFormat = new Intl.DateTimeFormat("en-GB", { day: "numeric", month: "short", year: "numeric" });

/** The upload day as the pieces table shows it, e.g. "3 Mar 2025". */
export function formatUploaded(iso: string): string {
  return dateFormat.format(new Date(iso));
}
