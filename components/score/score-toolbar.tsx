"use client";
/** Small controls beside the engraved score: the hand chooser and the zoom buttons. */
import type { SelectionHand } from "./bar-selection";

const HANDS: { value: SelectionHand; label: string }[] = [
  { value: "right", label: "Right hand" },
  { value: "left", label: "Left hand" },
  { value: "both", label: "Both hands" },
];

const BUTTON =
  "min-h-11 min-w-11 rounded-md border border-line px-3 text-sm font-medium focus-visible:outline-3 focus-visible:outline-offset-2 focus-visible:outline-rosin disabled:opacity-40";

export function HandChooser({ value, onChange }: { value: SelectionHand; onChange(hand: SelectionHand): void }) {
  return (
    <div role="group" aria-label="Hand" className="inline-flex gap-1">
      {HANDS.map((h) => (
        <button
          key={h.value}
          type="button"
          aria-pressed={value === h.value}
          onClick={() => onChange(h.value)}
          className={`${BUTTON} ${value === h.value ? "border-walnut bg-walnut text-white" : "bg-card text-ink hover:bg-rosin-soft"}`}
        >
          {h.label}
        </button>
      ))}
    </div>
  );
}

export function ZoomControls({
  zoom,
  min,
  max,
  onChange,
}: {
  zoom: number;
  min: number;
  max: number;
  onChange(zoom: number): void;
}) {
  const step = (dir: 1 | -1) => onChange(Math.round(Math.min(max, Math.max(min, zoom + dir * 0.1)) * 10) / 10);
  return (
    <div role="group" aria-label="Zoom" className="inline-flex items-center gap-1">
      <button type="button" aria-label="Zoom out" disabled={zoom <= min} onClick={() => step(-1)} className={`${BUTTON} bg-card`}>
        −
      </button>
      <output aria-live="polite" className="w-14 text-center text-sm tabular-nums">
        {Math.round(zoom * 100)}%
      </output>
      <button type="button" aria-label="Zoom in" disabled={zoom >= max} onClick={() => step(1)} className={`${BUTTON} bg-card`}>
        +
      </button>
    </div>
  );
}
