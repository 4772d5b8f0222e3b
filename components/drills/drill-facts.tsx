import type { SheetDrillMeta } from "@/db/schema";
import { spanParts } from "./span-label";

type Span = { semitones: number; mm: number; overComfortable?: boolean };

/** Span badge, estimated-fingering marker and warnings of one drill. */
export function DrillFacts({
  maxSpan,
  overSpan,
  estimatedFingering,
  warnings,
}: {
  maxSpan: SheetDrillMeta["maxSpan"] | { right?: Span; left?: Span };
  overSpan: boolean;
  estimatedFingering: boolean;
  warnings: string[];
}) {
  const spans = spanParts(maxSpan);
  return (
    <div className="flex flex-col gap-1.5">
      <div className="flex flex-wrap gap-1.5 text-xs font-bold">
        {spans.length > 0 && (
          <span
            data-testid="span-badge"
            data-over={overSpan || undefined}
            className={`rounded-full px-2.5 py-0.5 ${overSpan ? "bg-madder-soft text-madder" : "bg-sage-soft text-ink"}`}
          >
            {overSpan ? "Over span: " : "Span: "}
            {spans.join(", ")}
          </span>
        )}
        {estimatedFingering && (
          <span data-testid="estimated-fingering" className="rounded-full bg-rosin-soft px-2.5 py-0.5 text-walnut" title="Some fingerings were estimated by Knotwork, not taken from the piece.">
            Fingering partly estimated
          </span>
        )}
      </div>
      {warnings.length > 0 && (
        <ul className="list-disc pl-5 text-sm text-madder" aria-label="Warnings">
          {warnings.map((w, i) => (
            <li key={i}>{w}</li>
          ))}
        </ul>
      )}
    </div>
  );
}
