/** Bar selection on an engraved score: pure state changes for clicks, drags and the keyboard. */

export type SelectionHand = "right" | "left" | "both";

/** Selected bars, as 0-based measure indexes (inclusive), and the hand they belong to. */
export interface BarSelection {
  from: number;
  to: number;
  hand: SelectionHand;
}

/** A cell of the bar grid: a bar index and a 0-based staff (0 = right hand, 1 = left hand). */
export interface BarCell {
  bar: number;
  staff: number;
}

/**
 * The hand of each engraved staff (0-based, counted across all parts), or null for a staff that is not
 * a hand (a voice or another instrument: shown, not selectable). Without it, staff 0 is the right hand
 * and staff 1 the left.
 */
export type StaffHands = readonly ("right" | "left" | null)[];

/** The hand a staff belongs to on a grand staff (or by the score's staff map). */
export function handOfStaff(staff: number, hands?: StaffHands): "right" | "left" {
  if (hands) return hands[staff] ?? "right";
  return staff === 1 ? "left" : "right";
}

/** Whether a staff can be selected as a hand. */
export function isHandStaff(staff: number, hands?: StaffHands): boolean {
  return !hands || hands[staff] != null;
}

/** Whether a staff is part of a selection's hand. */
export function staffInHand(staff: number, hand: SelectionHand, hands?: StaffHands): boolean {
  if (!isHandStaff(staff, hands)) return false;
  return hand === "both" || handOfStaff(staff, hands) === hand;
}

/** The hand after pointing at a staff: "both" stays "both" (chosen on purpose), otherwise the staff's hand. */
export function handAfterPointing(current: SelectionHand | undefined, staff: number, hands?: StaffHands): SelectionHand {
  return current === "both" ? "both" : handOfStaff(staff, hands);
}

/** The selection spanning an anchor bar and another bar, in either order. */
export function spanSelection(anchor: number, bar: number, hand: SelectionHand): BarSelection {
  return { from: Math.min(anchor, bar), to: Math.max(anchor, bar), hand };
}

export type GridKey = "ArrowLeft" | "ArrowRight" | "ArrowUp" | "ArrowDown" | "Home" | "End";

/** Moves the focused cell for a key: left/right by a bar, up/down between staves, Home/End to the ends. */
export function moveCell(cell: BarCell, key: GridKey, barCount: number, staffCount: number): BarCell {
  const clampBar = (b: number) => Math.max(0, Math.min(barCount - 1, b));
  const clampStaff = (s: number) => Math.max(0, Math.min(Math.max(1, staffCount) - 1, s));
  switch (key) {
    case "ArrowLeft":
      return { ...cell, bar: clampBar(cell.bar - 1) };
    case "ArrowRight":
      return { ...cell, bar: clampBar(cell.bar + 1) };
    case "ArrowUp":
      return { ...cell, staff: clampStaff(cell.staff - 1) };
    case "ArrowDown":
      return { ...cell, staff: clampStaff(cell.staff + 1) };
    case "Home":
      return { ...cell, bar: 0 };
    case "End":
      return { ...cell, bar: clampBar(barCount - 1) };
  }
}

const HAND_WORDS: Record<SelectionHand, string> = { right: "right hand", left: "left hand", both: "both hands" };

/**
 * The sentence a screen reader hears, with bar numbers as printed (1-based unless numbers are given).
 * `describeSelection({ from: 2, to: 3, hand: "right" })` → "Bars 3–4 selected, right hand".
 */
export function describeSelection(sel: BarSelection | null, barNumbers?: readonly number[]): string {
  if (!sel) return "No bars selected";
  const num = (i: number) => barNumbers?.[i] ?? i + 1;
  const bars = sel.from === sel.to ? `Bar ${num(sel.from)}` : `Bars ${num(sel.from)}–${num(sel.to)}`;
  return `${bars} selected, ${HAND_WORDS[sel.hand]}`;
}

export function sameSelection(a: BarSelection | null | undefined, b: BarSelection | null | undefined): boolean {
  if (!a || !b) return !a && !b;
  return a.from === b.from && a.to === b.to && a.hand === b.hand;
}
