/**
 * Where each bar sits on the engraved page, in CSS pixels relative to the rendered SVG,
 * read from OSMD's graphic sheet; plus hit-testing and the playback cursor position.
 */
import type { OpenSheetMusicDisplay } from "opensheetmusicdisplay";

/** One bar on one staff. */
export interface BarBox {
  bar: number;
  staff: number;
  x: number;
  y: number;
  w: number;
  h: number;
}

/** One bar in time: its start and length in quarter notes, and where its notes are drawn. */
export interface BarTiming {
  bar: number;
  /** Printed bar number. */
  number: number;
  startQ: number;
  lengthQ: number;
  /** Note positions (quarter time → x), sorted by time. */
  entries: { q: number; x: number }[];
}

export interface ScoreLayout {
  boxes: BarBox[];
  bars: BarTiming[];
  staffCount: number;
}

export const EMPTY_LAYOUT: ScoreLayout = { boxes: [], bars: [], staffCount: 0 };

/** OSMD's unit is 10 px at zoom 1. */
export function unitToPx(zoom: number): number {
  return 10 * zoom;
}

/**
 * Reads bar boxes and timings after `osmd.render()`, for every engraved staff (a song's voice staff
 * too; the score view's staff map decides which staves are hands).
 */
export function readLayout(osmd: OpenSheetMusicDisplay): ScoreLayout {
  const scale = unitToPx(osmd.Zoom);
  const sheet = osmd.Sheet;
  const sourceMeasures = sheet.SourceMeasures;
  const boxes: BarBox[] = [];
  const bars: BarTiming[] = [];
  let staffCount = 0;
  osmd.GraphicSheet.MeasureList.forEach((row) => {
    const first = row.find((m) => m !== undefined);
    if (!first) return;
    const bar = sourceMeasures.indexOf(first.parentSourceMeasure);
    if (bar < 0) return;
    const entries: { q: number; x: number }[] = [];
    const startQ = first.parentSourceMeasure.AbsoluteTimestamp.RealValue * 4;
    row.forEach((gm, staff) => {
      if (!gm) return;
      staffCount = Math.max(staffCount, staff + 1);
      const ps = gm.PositionAndShape;
      boxes.push({
        bar,
        staff,
        x: (ps.AbsolutePosition.x + ps.BorderLeft) * scale,
        y: (ps.AbsolutePosition.y + ps.BorderTop) * scale,
        w: (ps.BorderRight - ps.BorderLeft) * scale,
        h: (ps.BorderBottom - ps.BorderTop) * scale,
      });
      for (const se of gm.staffEntries) {
        entries.push({
          q: startQ + se.relInMeasureTimestamp.RealValue * 4,
          x: se.PositionAndShape.AbsolutePosition.x * scale,
        });
      }
    });
    entries.sort((a, b) => a.q - b.q || a.x - b.x);
    bars.push({
      bar,
      number: first.MeasureNumber,
      startQ,
      lengthQ: first.parentSourceMeasure.Duration.RealValue * 4,
      entries,
    });
  });
  bars.sort((a, b) => a.bar - b.bar);
  return { boxes, bars, staffCount };
}

/**
 * The bar cell under a point: a box whose x-range holds the point, nearest vertically,
 * within `reach` pixels above or below the staff.
 */
export function hitTest(boxes: readonly BarBox[], x: number, y: number, reach: number): BarBox | null {
  let best: BarBox | null = null;
  let bestDist = Infinity;
  for (const b of boxes) {
    if (x < b.x || x > b.x + b.w) continue;
    const dist = y < b.y ? b.y - y : y > b.y + b.h ? y - (b.y + b.h) : 0;
    if (dist <= reach && dist < bestDist) {
      best = b;
      bestDist = dist;
    }
  }
  return best;
}

/** The bar sounding at a quarter-note time, or null outside the score. */
export function barAtTime(bars: readonly BarTiming[], q: number): BarTiming | null {
  for (const b of bars) if (q >= b.startQ && q < b.startQ + b.lengthQ) return b;
  return null;
}

/**
 * The cursor's x at a quarter-note time: between the note drawn at or before the time and the
 * next one (or the bar's right edge), in proportion to the time passed.
 */
export function cursorX(bar: BarTiming, q: number, barRight: number): number {
  const { entries } = bar;
  if (entries.length === 0) return barRight;
  let i = -1;
  for (let k = 0; k < entries.length; k++) if (entries[k].q <= q + 1e-9) i = k;
  if (i < 0) return entries[0].x;
  const here = entries[i];
  let next: { q: number; x: number } | undefined;
  for (let k = i + 1; k < entries.length; k++) {
    if (entries[k].q > here.q + 1e-9) {
      next = entries[k];
      break;
    }
  }
  const nextQ = next ? next.q : bar.startQ + bar.lengthQ;
  const nextX = next ? next.x : barRight;
  const t = nextQ > here.q ? Math.min(1, Math.max(0, (q - here.q) / (nextQ - here.q))) : 0;
  return here.x + t * (nextX - here.x);
}
