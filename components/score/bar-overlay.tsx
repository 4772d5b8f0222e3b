"use client";
/** The layer over the engraved SVG: one cell per bar per staff for hover, selection, focus, heat and the playback cursor. */
import { memo } from "react";
import { handOfStaff, isHandStaff, staffInHand, type BarCell, type BarSelection, type StaffHands } from "./bar-selection";
import { barAtTime, cursorX, type BarBox, type ScoreLayout } from "./score-layout";

export interface HeatMap {
  right: readonly number[];
  left: readonly number[];
}

interface Props {
  layout: ScoreLayout;
  offset: { x: number; y: number };
  /** Vertical padding around each staff's box, in px. */
  pad: number;
  selection: BarSelection | null;
  hover: BarCell | null;
  focus: BarCell | null;
  heat: HeatMap | null;
  cursorTime: number | null;
  /** Which staves are hands (others are greyed and never selected). */
  staffHands?: StaffHands;
}

function heatOf(heat: HeatMap | null, box: BarBox, hands?: StaffHands): number {
  if (!heat || !isHandStaff(box.staff, hands)) return 0;
  const v = (handOfStaff(box.staff, hands) === "left" ? heat.left : heat.right)[box.bar] ?? 0;
  return Math.max(0, Math.min(1, v));
}

function isSelected(sel: BarSelection | null, box: BarBox, hands?: StaffHands): boolean {
  return !!sel && box.bar >= sel.from && box.bar <= sel.to && staffInHand(box.staff, sel.hand, hands);
}

function BarOverlayInner({ layout, offset, pad, selection, hover, focus, heat, cursorTime, staffHands }: Props) {
  const current = cursorTime == null ? null : barAtTime(layout.bars, cursorTime);
  const currentBoxes = current ? layout.boxes.filter((b) => b.bar === current.bar) : [];
  let cursor: { x: number; top: number; bottom: number } | null = null;
  if (current && currentBoxes.length > 0 && cursorTime != null) {
    const right = Math.max(...currentBoxes.map((b) => b.x + b.w));
    cursor = {
      x: cursorX(current, cursorTime, right),
      top: Math.min(...currentBoxes.map((b) => b.y)) - pad,
      bottom: Math.max(...currentBoxes.map((b) => b.y + b.h)) + pad,
    };
  }
  return (
    <div
      aria-hidden="true"
      className="pointer-events-none absolute top-0 left-0"
      style={{ transform: `translate(${offset.x}px, ${offset.y}px)` }}
    >
      {layout.boxes.map((box) => {
        const selected = isSelected(selection, box, staffHands);
        const handStaff = isHandStaff(box.staff, staffHands);
        const hovered = hover?.bar === box.bar && hover.staff === box.staff;
        const focused = focus?.bar === box.bar && focus.staff === box.staff;
        const h = heatOf(heat, box, staffHands);
        const playing = current?.bar === box.bar;
        const background = selected
          ? "rgba(208, 138, 60, 0.3)"
          : playing
            ? "rgba(86, 115, 94, 0.16)"
            : h > 0.02
              ? `rgba(165, 64, 44, ${(0.04 + 0.22 * h).toFixed(3)})`
              : hovered && handStaff
                ? "rgba(107, 95, 87, 0.1)"
                : !handStaff
                  ? "rgba(107, 95, 87, 0.06)"
                  : "transparent";
        return (
          <div
            key={`${box.bar}-${box.staff}`}
            data-bar={box.bar}
            data-staff={box.staff}
            data-selected={selected ? "true" : undefined}
            data-hand={handStaff ? handOfStaff(box.staff, staffHands) : "none"}
            data-heat={h > 0 ? h.toFixed(2) : undefined}
            className={[
              "absolute rounded-sm",
              selected ? "ring-2 ring-walnut/70 ring-inset" : "",
              focused ? "outline-2 outline-offset-1 outline-dashed outline-walnut" : "",
            ].join(" ")}
            style={{ left: box.x, top: box.y - pad, width: box.w, height: box.h + 2 * pad, background }}
          />
        );
      })}
      {cursor && (
        <div
          data-cursor="true"
          className="absolute w-0.5 rounded bg-sage"
          style={{ left: cursor.x - 1, top: cursor.top, height: cursor.bottom - cursor.top }}
        />
      )}
    </div>
  );
}

export const BarOverlay = memo(BarOverlayInner);
