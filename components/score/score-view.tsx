"use client";
/**
 * The engraved piece with bar selection: click a bar, shift-click to extend, drag across bars,
 * or use the keyboard (arrows move, shift+arrows extend, Enter confirms, Escape clears).
 * OSMD loads on demand; a skeleton shows meanwhile.
 */
import { useEffect, useId, useMemo, useRef, useState } from "react";
import type { IOSMDOptions } from "opensheetmusicdisplay";
import { BarOverlay, type HeatMap } from "./bar-overlay";
import {
  describeSelection,
  handAfterPointing,
  handOfStaff,
  isHandStaff,
  moveCell,
  sameSelection,
  spanSelection,
  type BarCell,
  type BarSelection,
  type GridKey,
  type SelectionHand,
  type StaffHands,
} from "./bar-selection";
import { HandChooser, ZoomControls } from "./score-toolbar";
import { hitTest, unitToPx } from "./score-layout";
import { useOsmd } from "./use-osmd";

export interface ScoreViewProps {
  musicxml: string;
  /** Initial zoom (1 = 100 %); by default 100 %, or 70 % on a phone-sized screen. */
  zoom?: number;
  selection?: BarSelection | null;
  onSelectionChange?(sel: BarSelection | null): void;
  /** Enter on the keyboard (or a double click) confirms the selection. */
  onConfirm?(sel: BarSelection): void;
  selectable?: boolean;
  /** Difficulty 0–1 per bar index, per hand. */
  heat?: HeatMap | null;
  /** Playback position in quarter notes from the start of the score. */
  cursorTime?: number | null;
  /** Shows the right / left / both chooser (default: when selectable). */
  showHandChooser?: boolean;
  /** The hand of each engraved staff; null marks a staff that is shown but cannot be selected (a voice). */
  staffHands?: StaffHands;
  label?: string;
  className?: string;
}

const OSMD_OPTIONS: IOSMDOptions = {
  drawFingerings: true,
  drawMeasureNumbers: true,
  measureNumberInterval: 1,
  drawPartNames: false,
  autoGenerateMultipleRestMeasuresFromRestMeasures: false,
  disableCursor: true,
};
const GRID_KEYS = new Set(["ArrowLeft", "ArrowRight", "ArrowUp", "ArrowDown", "Home", "End"]);
const ZOOM_MIN = 0.5;
const ZOOM_MAX = 2;
const PHONE_WIDTH = 640;
const PHONE_ZOOM = 0.7;

export function ScoreView({
  musicxml,
  zoom: initialZoom,
  selection: selectionProp = null,
  onSelectionChange,
  onConfirm,
  selectable = true,
  heat = null,
  cursorTime = null,
  showHandChooser,
  staffHands,
  label = "Score",
  className = "",
}: ScoreViewProps) {
  const host = useRef<HTMLDivElement>(null);
  const frame = useRef<HTMLDivElement>(null);
  const [zoom, setZoom] = useState(initialZoom ?? 1);
  useEffect(() => {
    if (initialZoom === undefined && window.innerWidth < PHONE_WIDTH) setZoom(PHONE_ZOOM);
  }, [initialZoom]);
  const { status, error, layout, offset } = useOsmd(host, frame, { musicxml, zoom, options: OSMD_OPTIONS });
  const [sel, setSel] = useState<BarSelection | null>(selectionProp);
  const [hover, setHover] = useState<BarCell | null>(null);
  const [focusCell, setFocusCell] = useState<BarCell | null>(null);
  const [focused, setFocused] = useState(false);
  const [announcement, setAnnouncement] = useState("");
  const [preferredHand, setPreferredHand] = useState<SelectionHand>(selectionProp?.hand ?? "right");
  const currentHand = sel?.hand ?? preferredHand;
  const anchor = useRef<number | null>(selectionProp?.from ?? null);
  const dragging = useRef(false);
  const helpId = useId();

  useEffect(() => {
    setSel((cur) => (sameSelection(cur, selectionProp) ? cur : selectionProp));
  }, [selectionProp?.from, selectionProp?.to, selectionProp?.hand]); // eslint-disable-line react-hooks/exhaustive-deps

  const barNumbers = useMemo(() => layout.bars.map((b) => b.number), [layout]);
  const barCount = layout.bars.length;
  const staffCount = Math.max(1, layout.staffCount);
  // The staves a selection may use: all, or only the hand staves of the score's staff map.
  const handStaves = staffHands ? staffHands.map((h, i) => (h ? i : -1)).filter((i) => i >= 0) : null;
  const firstHandStaff = handStaves?.[0] ?? 0;
  const handStaffCount = handStaves ? handStaves.length : staffCount;
  const pad = unitToPx(zoom) * 1.2;

  function commit(next: BarSelection | null, confirm = false) {
    setSel(next);
    setAnnouncement(describeSelection(next, barNumbers) + (confirm && next ? ", confirmed" : ""));
    onSelectionChange?.(next);
    if (confirm && next) onConfirm?.(next);
  }

  function cellAt(e: React.PointerEvent, reach: number): BarCell | null {
    const rect = frame.current!.getBoundingClientRect();
    const hit = hitTest(layout.boxes, e.clientX - rect.left - offset.x, e.clientY - rect.top - offset.y, reach);
    return hit && isHandStaff(hit.staff, staffHands) ? { bar: hit.bar, staff: hit.staff } : null;
  }

  function onPointerDown(e: React.PointerEvent<HTMLDivElement>) {
    if (!selectable || e.button !== 0) return;
    const cell = cellAt(e, pad * 2);
    if (!cell) return;
    e.preventDefault();
    frame.current?.focus({ preventScroll: true });
    const hand = handAfterPointing(currentHand, cell.staff, staffHands);
    const next =
      e.shiftKey && anchor.current !== null
        ? spanSelection(anchor.current, cell.bar, currentHand)
        : spanSelection((anchor.current = cell.bar), cell.bar, hand);
    setSel(next);
    setFocusCell(cell);
    dragging.current = true;
    e.currentTarget.setPointerCapture(e.pointerId);
  }

  function onPointerMove(e: React.PointerEvent<HTMLDivElement>) {
    if (!selectable) return;
    if (dragging.current && anchor.current !== null && sel) {
      const cell = cellAt(e, Infinity);
      if (cell && (cell.bar !== sel.to || cell.bar < sel.from)) {
        setSel(spanSelection(anchor.current, cell.bar, sel.hand));
        setFocusCell({ bar: cell.bar, staff: focusCell?.staff ?? cell.staff });
      }
      return;
    }
    const cell = cellAt(e, pad * 2);
    if (cell?.bar !== hover?.bar || cell?.staff !== hover?.staff) setHover(cell);
  }

  function onPointerUp() {
    if (!dragging.current) return;
    dragging.current = false;
    commit(sel);
  }

  function onKeyDown(e: React.KeyboardEvent<HTMLDivElement>) {
    if (!selectable || barCount === 0) return;
    const cur = focusCell ?? { bar: sel?.from ?? 0, staff: firstHandStaff + (sel?.hand === "left" ? 1 : 0) };
    if (GRID_KEYS.has(e.key)) {
      e.preventDefault();
      const key = e.key as GridKey;
      const moved = moveCell({ ...cur, staff: cur.staff - firstHandStaff }, key, barCount, handStaffCount);
      const cell = { ...moved, staff: moved.staff + firstHandStaff };
      const vertical = key === "ArrowUp" || key === "ArrowDown";
      setFocusCell(cell);
      if (vertical) {
        const hand: SelectionHand = e.shiftKey && handStaffCount > 1 ? "both" : handOfStaff(cell.staff, staffHands);
        commit(sel ? { ...sel, hand } : spanSelection((anchor.current = cell.bar), cell.bar, hand));
      } else if (e.shiftKey) {
        if (anchor.current === null) anchor.current = cur.bar;
        commit(spanSelection(anchor.current, cell.bar, currentHand));
      } else {
        anchor.current = cell.bar;
        commit(spanSelection(cell.bar, cell.bar, handAfterPointing(currentHand, cell.staff, staffHands)));
      }
    } else if (e.key === "Enter" || e.key === " ") {
      e.preventDefault();
      commit(sel ?? spanSelection(cur.bar, cur.bar, handOfStaff(cur.staff, staffHands)), true);
    } else if (e.key === "Escape" && sel) {
      e.preventDefault();
      anchor.current = null;
      commit(null);
    }
  }

  function chooseHand(hand: SelectionHand) {
    setPreferredHand(hand);
    if (sel) commit({ ...sel, hand });
    else setAnnouncement(`${hand === "both" ? "Both hands" : hand === "right" ? "Right hand" : "Left hand"} chosen; select bars`);
  }

  return (
    <section className={`flex flex-col gap-2 ${className}`} aria-label={label} data-status={status}>
      <div className="flex flex-wrap items-center justify-between gap-2">
        {(showHandChooser ?? selectable) && handStaffCount > 1 ? (
          <HandChooser value={currentHand} onChange={chooseHand} />
        ) : (
          <span />
        )}
        <ZoomControls zoom={zoom} min={ZOOM_MIN} max={ZOOM_MAX} onChange={setZoom} />
      </div>
      <div className="relative w-full overflow-auto rounded-md border border-line bg-card">
        <div
          ref={frame}
          tabIndex={selectable ? 0 : -1}
          role="application"
          aria-roledescription="bar selector"
          aria-label={`${label}: bar selection`}
          aria-describedby={helpId}
          aria-busy={status === "loading"}
          data-testid="score-frame"
          className={`relative touch-pan-y ${status === "ready" ? "min-h-40" : "min-h-[60vh]"} outline-none select-none focus-visible:ring-4 focus-visible:ring-rosin/70 focus-visible:ring-inset`}
          onPointerDown={onPointerDown}
          onPointerMove={onPointerMove}
          onPointerUp={onPointerUp}
          onPointerCancel={onPointerUp}
          onPointerLeave={() => setHover(null)}
          onDoubleClick={() => sel && onConfirm?.(sel)}
          onKeyDown={onKeyDown}
          onFocus={() => setFocused(true)}
          onBlur={() => setFocused(false)}
        >
          <div ref={host} className="w-full" />
          {status === "ready" && (
            <BarOverlay
              layout={layout}
              offset={offset}
              pad={pad}
              selection={sel}
              hover={hover}
              focus={focused ? (focusCell ?? { bar: sel?.from ?? 0, staff: firstHandStaff + (sel?.hand === "left" ? 1 : 0) }) : null}
              staffHands={staffHands}
              heat={heat}
              cursorTime={cursorTime}
            />
          )}
          {(status === "loading" || status === "idle") && <ScoreSkeleton />}
          {status === "error" && (
            <p role="alert" className="p-4 text-sm text-madder">
              This piece could not be engraved{error ? `: ${error}` : "."}
            </p>
          )}
        </div>
      </div>
      <p id={helpId} className="sr-only">
        Click a bar to select it, shift-click or drag to extend. Keyboard: arrow keys move between bars and
        staves, shift with arrows extends, Enter confirms, Escape clears.
      </p>
      <p className="sr-only" aria-live="polite" data-testid="score-announcement">
        {announcement}
      </p>
    </section>
  );
}

function ScoreSkeleton() {
  return (
    <div className="absolute inset-0 flex flex-col gap-6 p-6" aria-hidden="true" data-testid="score-skeleton">
      {[0, 1, 2].map((i) => (
        <div key={i} className="flex flex-col gap-2">
          {[0, 1, 2, 3, 4].map((l) => (
            <div key={l} className="h-px w-full animate-pulse bg-stone-300" />
          ))}
        </div>
      ))}
    </div>
  );
}
