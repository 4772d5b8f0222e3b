import { and, eq, type SQL } from "drizzle-orm";
import type { SQLiteColumn } from "drizzle-orm/sqlite-core";

/** Any table that belongs to a studio. */
export interface StudioOwned {
  studioId: SQLiteColumn;
}

/**
 * The WHERE clause every studio query starts from: rows of this studio only, plus any extra
 * conditions. `db/queries/*` build on it so no page can forget the studio.
 */
export function inStudio(table: StudioOwned, studioId: string, ...extra: (SQL | undefined)[]): SQL {
  if (!studioId) throw new Error("A studio id is required to scope a query.");
  const clause = and(eq(table.studioId, studioId), ...extra);
  if (!clause) throw new Error("Unreachable: empty studio clause");
  return clause;
}

/** Guards a row loaded by id: null unless it belongs to the caller's studio. */
export function ownedBy<T extends { studioId: string | null }>(row: T | undefined | null, studioId: string): T | null {
  if (!row || row.studioId !== studioId) return null;
  return row;
}
