"use client";
import { useSortable } from "@dnd-kit/sortable";
import { CSS } from "@dnd-kit/utilities";
import type { DrillDto } from "@/lib/knots/dto";

export interface PickedDrill {
  key: string;
  drill: DrillDto;
  studentNote: string;
  tempo: { start: number; target: number };
}

const moveClass = "rounded-md px-2 py-0.5 text-sm leading-none hover:bg-rosin-soft/60 disabled:opacity-40";
const numClass = "w-full max-w-24 rounded-lg border border-line bg-card px-2 py-1 text-sm focus:border-walnut focus:outline-none";

/** One picked drill in the sheet builder: drag handle, move buttons, note and tempo goals. */
export function SheetItem({
  item,
  index,
  count,
  onMove,
  onRemove,
  onChange,
}: {
  item: PickedDrill;
  index: number;
  count: number;
  onMove(to: number): void;
  onRemove(): void;
  onChange(next: PickedDrill): void;
}) {
  const { attributes, listeners, setNodeRef, transform, transition, isDragging } = useSortable({ id: item.key });
  const base = `sheet-${item.key.replace(/[^\w-]/g, "-")}`;
  const title = item.drill.title;
  return (
    <li
      ref={setNodeRef}
      style={{ transform: CSS.Transform.toString(transform), transition }}
      data-testid="sheet-item"
      data-key={item.key}
      className={`flex flex-col gap-2 rounded-xl border border-line bg-card p-3 ${isDragging ? "z-10 shadow-lg" : ""}`}
    >
      <div className="flex items-start gap-2">
        <div className="flex flex-col items-center">
          <button type="button" className={moveClass} disabled={index === 0} onClick={() => onMove(index - 1)} aria-label={`Move ${title} up`}>
            ↑
          </button>
          <button
            type="button"
            className="cursor-grab touch-none rounded-md px-2 py-0.5 text-lg leading-none text-muted hover:bg-rosin-soft/60"
            aria-label={`Drag to reorder ${title}`}
            data-testid="drag-handle"
            {...attributes}
            {...listeners}
          >
            ⠿
          </button>
          <button type="button" className={moveClass} disabled={index === count - 1} onClick={() => onMove(index + 1)} aria-label={`Move ${title} down`}>
            ↓
          </button>
        </div>
        <p className="flex-1 pt-1 leading-snug">
          <span className="font-mono text-sm text-muted">{index + 1}. </span>
          <span className="font-bold" data-testid="sheet-item-title">{title}</span>
        </p>
        <button type="button" className="rounded-md px-2 py-1 text-sm text-madder hover:bg-madder-soft" onClick={onRemove} aria-label={`Remove ${title}`}>
          ✕
        </button>
      </div>
      <label htmlFor={`${base}-note`} className="text-xs font-bold text-walnut">
        Note for the student
      </label>
      <textarea
        id={`${base}-note`}
        rows={3}
        className="rounded-lg border border-line bg-card px-2.5 py-1.5 text-sm focus:border-walnut focus:outline-none"
        value={item.studentNote}
        onChange={(e) => onChange({ ...item, studentNote: e.target.value })}
      />
      <div className="grid grid-cols-2 gap-3 text-sm">
        <div className="flex flex-col gap-1">
          <label htmlFor={`${base}-start`} className="text-xs font-bold text-walnut">Start ♩ =</label>
          <input id={`${base}-start`} type="number" min={20} max={300} className={numClass} value={item.tempo.start}
            onChange={(e) => onChange({ ...item, tempo: { ...item.tempo, start: Number(e.target.value) } })} />
        </div>
        <div className="flex flex-col gap-1">
          <label htmlFor={`${base}-target`} className="text-xs font-bold text-walnut">Goal ♩ =</label>
          <input id={`${base}-target`} type="number" min={20} max={300} className={numClass} value={item.tempo.target}
            onChange={(e) => onChange({ ...item, tempo: { ...item.tempo, target: Number(e.target.value) } })} />
        </div>
      </div>
    </li>
  );
}
