import Link from "next/link";
import { formatUploaded, type PieceListRow } from "./piece-keys";

const HEADERS = ["Title", "Composer", "Bars", "Uploaded", "Knots"];

/**
 * The pieces as the server sends them: a plain table, newest first, readable and linked before any
 * script runs. The interactive table (sort, filter, delete) replaces it once loaded; until then its
 * filter box is shown disabled so nothing moves when it arrives.
 */
export function PiecesPlainTable({ pieces }: { pieces: PieceListRow[] }) {
  const rows = [...pieces].sort((a, b) => b.createdAt.localeCompare(a.createdAt));
  return (
    <div className="flex flex-col gap-3">
      <label className="flex max-w-sm flex-col gap-1 text-sm font-bold text-walnut">
        Filter pieces
        <input
          type="search"
          disabled
          placeholder="Title or composer"
          className="rounded-xl border border-line bg-card px-3.5 py-2 text-base font-normal text-ink outline-none"
        />
      </label>
      <div className="relative overflow-x-auto rounded-2xl border border-line bg-card">
        <table className="w-full min-w-[36rem] text-left text-sm" aria-label="Pieces">
          <thead className="border-b border-line bg-paper">
            <tr>
              {HEADERS.map((h) => (
                <th key={h} scope="col" className="px-4 py-2.5 font-bold text-walnut" aria-sort={h === "Uploaded" ? "descending" : undefined}>
                  {h}
                </th>
              ))}
              <th scope="col" className="px-4 py-2.5 font-bold text-walnut">
                <span className="sr-only">Actions</span>
              </th>
            </tr>
          </thead>
          <tbody className="divide-y divide-line">
            {rows.map((p) => (
              <tr key={p.id} className="hover:bg-paper/60">
                <td className="px-4 py-2.5 align-middle">
                  <Link href={`/pieces/${p.id}`} className="font-bold text-walnut underline-offset-2 hover:underline">{p.title}</Link>
                </td>
                <td className="px-4 py-2.5 align-middle">{p.composer || <span className="text-muted">not given</span>}</td>
                <td className="px-4 py-2.5 align-middle"><span className="font-mono">{p.bars}</span></td>
                <td className="px-4 py-2.5 align-middle">{formatUploaded(p.createdAt)}</td>
                <td className="px-4 py-2.5 align-middle"><span className="font-mono">{p.knots}</span></td>
                <td className="px-4 py-2.5 align-middle" />
              </tr>
            ))}
            {rows.length === 0 ? (
              <tr>
                <td colSpan={HEADERS.length + 1} className="px-4 py-6 text-center text-muted">No pieces yet — upload one above.</td>
              </tr>
            ) : null}
          </tbody>
        </table>
      </div>
    </div>
  );
}
