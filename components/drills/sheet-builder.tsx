"use client";
import { closestCenter, DndContext, KeyboardSensor, PointerSensor, useSensor, useSensors, type DragEndEvent } from "@dnd-kit/core";
import { arrayMove, SortableContext, sortableKeyboardCoordinates, verticalListSortingStrategy } from "@dnd-kit/sortable";
import { useState } from "react";
import { SheetItem, type PickedDrill } from "./sheet-item";

/** The drills picked so far, in order: drag or move buttons, notes, tempo goals, a name, save. */
export function SheetBuilder({
  items,
  onItems,
  onSave,
  saving,
  problems,
}: {
  items: PickedDrill[];
  onItems(next: PickedDrill[]): void;
  onSave(title: string): void;
  saving: boolean;
  problems: string[];
}) {
  const [title, setTitle] = useState("");
  const sensors = useSensors(
    useSensor(PointerSensor, { activationConstraint: { distance: 4 } }),
    useSensor(KeyboardSensor, { coordinateGetter: sortableKeyboardCoordinates }),
  );
  const move = (from: number, to: number) => onItems(arrayMove(items, from, to));
  function dragEnd(e: DragEndEvent) {
    if (!e.over || e.active.id === e.over.id) return;
    const from = items.findIndex((i) => i.key === e.active.id);
    const to = items.findIndex((i) => i.key === e.over!.id);
    if (from >= 0 && to >= 0) move(from, to);
  }
  return (
    <section id="sheet-builder" aria-labelledby="sheet-builder-title" className="@container flex scroll-mt-4 flex-col gap-3 rounded-[var(--radius-card)] border border-walnut/25 bg-rosin-soft/25 p-4 lg:sticky lg:top-4 lg:max-h-[calc(100dvh-2rem)]">
      <h2 id="sheet-builder-title" className="text-xl font-semibold">
        Drill sheet <span className="font-mono text-sm text-muted">({items.length} picked)</span>
      </h2>
      {items.length === 0 ? (
        <p className="text-sm text-muted">Pick drills from the previews; they line up here in the order the student plays them.</p>
      ) : (
        <DndContext sensors={sensors} collisionDetection={closestCenter} onDragEnd={dragEnd}>
          <SortableContext items={items.map((i) => i.key)} strategy={verticalListSortingStrategy}>
            {/* On wide screens the list scrolls inside the panel, so the name and Save stay in view. */}
            <ol className="flex flex-col gap-2 lg:-mx-1 lg:min-h-0 lg:overflow-y-auto lg:px-1 lg:py-0.5" aria-label="Drills on the sheet, in order">
              {items.map((item, i) => (
                <SheetItem
                  key={item.key}
                  item={item}
                  index={i}
                  count={items.length}
                  onMove={(to) => move(i, to)}
                  onRemove={() => onItems(items.filter((x) => x.key !== item.key))}
                  onChange={(next) => onItems(items.map((x) => (x.key === item.key ? next : x)))}
                />
              ))}
            </ol>
          </SortableContext>
        </DndContext>
      )}
      <form
        className="flex shrink-0 flex-col gap-2 @md:flex-row @md:items-end"
        onSubmit={(e) => {
          e.preventDefault();
          onSave(title);
        }}
      >
        <div className="flex flex-1 flex-col gap-1">
          <label htmlFor="sheet-title" className="text-sm font-bold text-walnut">Sheet name</label>
          <input id="sheet-title" required maxLength={120} value={title} onChange={(e) => setTitle(e.target.value)}
            className="rounded-xl border border-line bg-card px-3 py-2 focus:border-walnut focus:outline-none" placeholder="e.g. Even triplets, bars 1–2" />
        </div>
        <button type="submit" disabled={saving || items.length === 0} className="rounded-full bg-walnut px-5 py-2.5 text-sm font-bold text-paper hover:bg-walnut-soft disabled:opacity-60">
          {saving ? "Saving…" : "Save sheet"}
        </button>
      </form>
      {problems.length > 0 && (
        <ul role="alert" className="list-disc pl-5 text-sm text-madder">
          {problems.map((p, i) => <li key={i}>{p}</li>)}
        </ul>
      )}
    </section>
  );
}
