"use client";
import dynamic from "next/dynamic";

const DrillPreview = dynamic(() => import("@/components/score/drill-preview").then((m) => m.DrillPreview), {
  ssr: false,
  loading: () => <div className="min-h-32 animate-pulse rounded border border-line bg-stone-100" aria-hidden="true" />,
});

/** A drill's (or a knot's) MusicXML engraved, client-side only. */
export function DrillEngraving({ musicxml, label, zoom }: { musicxml: string; label: string; zoom?: number }) {
  return <DrillPreview musicxml={musicxml} label={label} zoom={zoom} />;
}
