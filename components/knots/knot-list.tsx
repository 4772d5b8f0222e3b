import Link from "next/link";
import { Badge } from "@/components/ui/card";

export interface KnotListItem {
  id: string;
  hand: "right" | "left" | "both";
  fromBar: number;
  toBar: number;
  tags: string[];
  note: string | null;
  scoreTitle?: string;
}

const HAND = { right: "right hand", left: "left hand", both: "both hands" } as const;

export function barsLabel(from: number, to: number): string {
  return from === to ? `bar ${from}` : `bars ${from}–${to}`;
}

/** Knots as linked cards: piece (optional), bars and hand, tags and the teacher's note. */
export function KnotList({ knots, empty, showPiece = false }: { knots: KnotListItem[]; empty: React.ReactNode; showPiece?: boolean }) {
  if (knots.length === 0) return <>{empty}</>;
  return (
    <ul className="flex flex-col gap-2" aria-label="Knots">
      {knots.map((k) => (
        <li key={k.id}>
          <Link href={`/knots/${k.id}`} className="block rounded-xl border border-line bg-card px-4 py-3 transition-colors hover:border-walnut/50 focus-visible:ring-4 focus-visible:ring-rosin/60">
            {showPiece && k.scoreTitle ? <span className="block font-bold text-walnut">{k.scoreTitle}</span> : null}
            <span className="font-mono text-xs text-muted">
              {barsLabel(k.fromBar, k.toBar)} · {HAND[k.hand]}
            </span>
            {k.tags.length > 0 ? (
              <span className="mt-1.5 flex flex-wrap gap-1.5">
                {k.tags.map((t) => <Badge key={t}>{t}</Badge>)}
              </span>
            ) : null}
            {k.note ? <span className="mt-1.5 block text-sm">{k.note}</span> : null}
            <span className="mt-1.5 block text-sm font-bold text-walnut underline decoration-rosin">Generate drills →</span>
          </Link>
        </li>
      ))}
    </ul>
  );
}
