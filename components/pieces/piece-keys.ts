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
