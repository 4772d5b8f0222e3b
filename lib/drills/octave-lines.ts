/**
 * Octave lines for drills: a note that would need four or more ledger lines on its staff is written
 * under an 8va line (above the staff) or an 8vb line (below), and the line runs over the stretch of
 * notes around it on that staff (common practice, DRILL-RUBRIC.md §2: read at a glance). The line is
 * `NoteEvent.octaveShift`, the same field the writer turns into `<octave-shift>` for quoted passages;
 * the pitch data stays the sounding pitch (MusicXML 4.0 `<octave-shift>` changes only the display).
 */
import type { Clef, NoteEvent, Pitch, Score } from "../score/types";
import type { Drill } from "./types";

/** Ledger lines from which a note goes under an octave line (common practice: three is the most read at sight). */
export const MAX_LEDGER_LINES = 3;

const STEPS = ["C", "D", "E", "F", "G", "A", "B"] as const;

/** Diatonic position (C0 = 0, one per staff step) of a pitch as it sounds. */
function diatonic(p: Pitch): number {
  const semis = { C: 0, D: 2, E: 4, F: 5, G: 7, A: 9, B: 11 }[p.step];
  const diff = p.midi - ((p.octave + 1) * 12 + semis + p.alter);
  const octave = diff !== 0 && diff % 12 === 0 ? p.octave + diff / 12 : p.octave;
  return octave * 7 + STEPS.indexOf(p.step);
}

/** Diatonic position of a clef's bottom staff line (G clef on line 2: E4; F clef on line 4: G2). */
function bottomLine(clef: Clef): number | null {
  const at = clef.sign === "G" ? 32 : clef.sign === "F" ? 24 : clef.sign === "C" ? 28 : null;
  if (at === null) return null;
  return at - 2 * (clef.line - 1) + 7 * (clef.octaveChange ?? 0);
}

/**
 * Ledger lines a pitch needs on a clef's staff under an octave line of `shift` semitones (8va = 12):
 * positive above the staff, negative below, 0 on the staff.
 * @example ledgerLines(makePitch("G", 0, 6), { staff: 1, sign: "G", line: 2 }, 0) // 4
 */
export function ledgerLines(pitch: Pitch, clef: Clef, shift: number): number {
  const bottom = bottomLine(clef);
  if (bottom === null) return 0;
  const d = diatonic(pitch) - (7 * shift) / 12;
  if (d > bottom + 8) return Math.floor((d - bottom - 8) / 2);
  if (d < bottom) return -Math.floor((bottom - d) / 2) || 0;
  return 0;
}

/** The clef in force on a staff at a point of the score. */
function clefAt(score: Score, e: NoteEvent): Clef | undefined {
  const m = score.measures[e.measure];
  if (!m) return undefined;
  let clef = m.clefs.find((c) => c.staff === e.staff);
  const offset = e.onset.sub(m.start);
  for (const c of m.changes) if (c.clef && c.clef.staff === e.staff && c.offset.lte(offset)) clef = c.clef;
  return clef;
}

/**
 * The octave line one moment of a staff needs: none when its notes are within bounds, else the
 * smallest line that brings every note within bounds; none when no line can (a chord wider than the
 * staff and three ledger lines each way, which no octave line helps).
 */
function shiftFor(notes: readonly NoteEvent[], clef: Clef): number {
  const worst = (shift: number) => Math.max(...notes.map((e) => Math.abs(ledgerLines(e.pitch!, clef, shift))));
  return [0, 12, -12, 24, -24].find((shift) => worst(shift) <= MAX_LEDGER_LINES) ?? 0;
}

/**
 * The drill with octave lines where its notes would need more than three ledger lines. Each moment of
 * a staff (all its notes starting together) takes the line its notes need; the line carries on over
 * notes and rests between two moments that need the same line, when they stay readable under it and
 * lie no more than a bar apart, so a run of high notes gets one line.
 * @example withOctaveLines(drill).score.events.filter((e) => e.octaveShift).length // 8
 */
export function withOctaveLines(drill: Drill): Drill {
  const score = drill.score;
  const byStaff = new Map<number, NoteEvent[]>();
  for (const e of score.events) byStaff.set(e.staff, [...(byStaff.get(e.staff) ?? []), e]);
  const shiftOf = new Map<NoteEvent, number>();
  for (const events of byStaff.values()) {
    const moments = new Map<string, NoteEvent[]>();
    for (const e of events) {
      const k = e.onset.toFraction();
      moments.set(k, [...(moments.get(k) ?? []), e]);
    }
    const ordered = [...moments.values()].sort((a, b) => a[0]!.onset.compare(b[0]!.onset));
    const need = ordered.map((evs) => {
      const pitched = evs.filter((e) => e.pitch);
      const clef = pitched.length ? clefAt(score, pitched[0]!) : undefined;
      return clef ? shiftFor(pitched, clef) : 0;
    });
    // Carry a line over the moments between two that need it, if they read well under it.
    let last = -1;
    for (let i = 0; i < ordered.length; i++) {
      if (need[i] === 0) continue;
      if (last >= 0 && need[last] === need[i] && i - last > 1 && near(ordered[last]![0]!, ordered[i]![0]!)) {
        const between = ordered.slice(last + 1, i);
        const fits = between.every((evs) => evs.every((e) => !e.pitch || fitsUnder(score, e, need[i]!)));
        if (fits) for (let j = last + 1; j < i; j++) need[j] = need[i]!;
      }
      last = i;
    }
    ordered.forEach((evs, i) => { for (const e of evs) shiftOf.set(e, need[i]!); });
  }
  if (![...shiftOf.values()].some((s) => s !== 0)) return drill;
  const events = score.events.map((e) => {
    const shift = shiftOf.get(e) ?? 0;
    if (shift === (e.octaveShift ?? 0)) return e;
    const { octaveShift: _, ...rest } = e;
    return shift === 0 ? rest : { ...rest, octaveShift: shift };
  });
  return { ...drill, score: { ...score, events } };
}

/** Two moments at most one bar apart (by measure index). */
const near = (a: NoteEvent, b: NoteEvent) => b.measure - a.measure <= 1;

function fitsUnder(score: Score, e: NoteEvent, shift: number): boolean {
  const clef = clefAt(score, e);
  return !clef || Math.abs(ledgerLines(e.pitch!, clef, shift)) <= MAX_LEDGER_LINES;
}
