/**
 * Fingering repair for a finished drill: the estimate fingers each drill note from the passage and
 * its neighbours, and this pass makes sure what is printed can be played (DRILL-RUBRIC.md "Fingered
 * so it can be played", common practice):
 * - the keys a hand holds down at a moment (struck together, or still held from before) have one
 *   finger each, rising with pitch in the right hand and falling in the left (no crossed fingers in a
 *   chord, no left-hand thumb below a held key, a held note and a moving note never share a finger);
 * - a held note keeps its finger; unison notes share the one finger their key can take;
 * - the same finger never plays two different keys a step or a third apart (1–4 semitones), note
 *   after note with no rest between, within one line; a key struck again keeps its finger.
 * Only estimated fingers change; fingerings printed in the score or prescribed by the drill stay.
 */
import type { Hand, NoteEvent } from "../score/types";
import { orderedFingers } from "./hand-position";

type Mutable = { -readonly [K in keyof NoteEvent]: NoteEvent[K] };

const fingerOf = (e: NoteEvent): number | null => e.fingering?.[0]?.finger ?? null;
const isFixed = (e: NoteEvent) => !!e.fingering?.length && e.fingeringSource !== "estimated";

/** Steps of 1–4 semitones: too close for one finger to move between keys legato (common practice). */
export const CLOSE_MOVE = { min: 1, max: 4 } as const;

interface Struck {
  readonly midi: number;
  readonly members: number[];
  end: number;
  finger: number | null;
  fixed: boolean;
}

/**
 * The events with estimated fingers changed where they break the rules above. `handOf(e)` is the
 * hand that plays an event; a drill that writes one hand's two voices on two staves passes that hand
 * for both, so held notes and moving notes are judged together.
 *
 * @example
 * repairFingering(drill.score.events, (e) => (e.staff === 1 ? "right" : "left"));
 */
export function repairFingering(events: readonly NoteEvent[], handOf: (e: NoteEvent) => Hand): NoteEvent[] {
  return repairWithReport(events, handOf).events;
}

/**
 * As `repairFingering`, and how many moments are still unplayable as fingered (printed fingers that
 * leave no ordered choice, or more keys held than fingers).
 *
 * @example
 * repairWithReport(events, () => "right").unsettled // 0 when every moment can be played
 */
export function repairWithReport(events: readonly NoteEvent[], handOf: (e: NoteEvent) => Hand): { events: NoteEvent[]; unsettled: number } {
  // Events are copied only where a finger changes.
  const out = events.slice() as Mutable[];
  let unsettled = 0;
  for (const hand of ["right", "left"] as const) {
    const idx = out.map((_, i) => i).filter((i) => handOf(out[i]!) === hand && !out[i]!.grace);
    if (idx.length) unsettled += repairHand(out, idx, hand);
  }
  return { events: out, unsettled };
}

function repairHand(out: Mutable[], idx: number[], hand: Hand): number {
  const onsets = new Float64Array(out.length);
  for (const i of idx) onsets[i] = out[i]!.onset.valueOf();
  const at = (i: number) => onsets[i]!;
  idx.sort((a, b) => at(a) - at(b));
  const open = new Map<string, Struck>();
  const groups = new Map<number, Struck[]>();
  const lineLast = new Map<number, { kind: "rest" | "note"; struck?: Struck; chord: boolean }>();
  const lineOf = new Map<Struck, { prev?: Struck }>();
  const order: number[] = [];
  for (let p = 0; p < idx.length; p++) {
    const i = idx[p]!;
    const e = out[i]!;
    const t = at(i);
    const end = t + e.duration.valueOf();
    if (!e.pitch) {
      if (!e.chord) lineLast.set(e.staff, { kind: "rest", chord: false });
      continue;
    }
    const key = `${e.staff}|${e.voice}|${e.pitch.midi}`;
    if (e.tie === "stop" || e.tie === "continue") {
      const s = open.get(key);
      if (s) {
        s.end = Math.max(s.end, end);
        continue;
      }
    }
    let list = groups.get(t);
    if (!list) { groups.set(t, (list = [])); order.push(t); }
    let s = list.find((x) => x.midi === e.pitch!.midi);
    if (s) {
      s.members.push(i);
      s.end = Math.max(s.end, end);
    } else {
      s = { midi: e.pitch.midi, members: [i], end, finger: fingerOf(e), fixed: isFixed(e) };
      list.push(s);
      const last = lineLast.get(e.staff);
      const single = !e.chord && !(p + 1 < idx.length && out[idx[p + 1]!]!.chord);
      lineOf.set(s, { prev: last?.kind === "note" && !last.chord && single ? last.struck : undefined });
      if (!e.chord) lineLast.set(e.staff, { kind: "note", struck: s, chord: !single });
    }
    if (isFixed(e) && !s.fixed) [s.fixed, s.finger] = [true, fingerOf(e)];
    if (s.finger == null && fingerOf(e) != null) s.finger = fingerOf(e);
    open.set(key, s);
  }
  const struckAll = order.map((t) => ({ t, list: groups.get(t)! }));
  const heldAt = struckAll.map(() => [] as Struck[]);
  let sounding: Struck[] = [];
  struckAll.forEach(({ t, list }, g) => {
    sounding = sounding.filter((s) => s.end > t + 1e-9);
    heldAt[g] = sounding.filter((s) => !list.some((x) => x.midi === s.midi));
    sounding.push(...list);
  });
  // Changing a held note's finger can unsettle the moment it was struck, so go over the drill again.
  for (let pass = 0; pass < 3; pass++) {
    let changed = false;
    struckAll.forEach(({ list }, g) => {
      const held = heldAt[g]!.filter((s) => s.finger != null);
      // A printed finger that repeats the estimated finger before it: change the one before.
      for (const s of list) {
        const prev = lineOf.get(s)?.prev;
        if (s.fixed && prev && !prev.fixed && repeats(s, s.finger, lineOf)) {
          const before = lineOf.get(prev)?.prev;
          const free = [1, 2, 3, 4, 5].filter((f) => f !== s.finger && !(before && before.finger === f && repeats(prev, f, lineOf)));
          const f = free.sort((a, b) => Math.abs(a - prev.finger!) - Math.abs(b - prev.finger!))[0];
          if (f !== undefined) [prev.finger, changed] = [f, true];
        }
      }
      // A key struck again in its line keeps the finger it had, where the held keys allow it.
      for (const s of list) {
        const prev = lineOf.get(s)?.prev;
        if (s.fixed || !prev || prev.midi !== s.midi || prev.finger == null || prev.finger === s.finger) continue;
        const was = s.finger;
        s.finger = prev.finger;
        if (!orderedOk([...held, ...list].sort((a, b) => a.midi - b.midi).map((x) => x.finger), hand)) s.finger = was;
        else changed = true;
      }
      if (settled(held, list, hand, lineOf)) return;
      changed = solve([...held, ...list], held, list, hand, lineOf) || changed;
    });
    if (!changed) break;
  }
  const unsettled = struckAll.filter(({ list }, g) => !settled(heldAt[g]!.filter((s) => s.finger != null), list, hand, lineOf)).length;
  for (const { list } of struckAll) {
    for (const s of list) {
      if (s.fixed || s.finger == null) continue;
      for (const i of s.members) {
        const e = out[i]!;
        if (fingerOf(e) !== s.finger) out[i] = { ...e, fingering: [{ finger: s.finger }], fingeringSource: "estimated" };
      }
    }
  }
  return unsettled;
}

/** True when the fingers (keys low to high; nulls ignored) are distinct and run with pitch. */
function orderedOk(fingers: readonly (number | null)[], hand: Hand): boolean {
  const f = fingers.filter((x): x is number => x != null);
  for (let i = 1; i < f.length; i++) if (hand === "right" ? f[i]! <= f[i - 1]! : f[i]! >= f[i - 1]!) return false;
  return true;
}

type Lines = ReadonlyMap<Struck, { prev?: Struck }>;

/** Every choice of k fingers, rising (right hand) or falling (left hand), by k; built once. */
const RISING: number[][][] = [[], [], [], [], [], []];
for (let mask = 1; mask < 32; mask++) {
  const fingers = [1, 2, 3, 4, 5].filter((f) => mask & (1 << (f - 1)));
  RISING[fingers.length]!.push(fingers);
}
const FALLING = RISING.map((ts) => ts.map((t) => [...t].reverse()));

/** True when the same finger would play this key right after a nearby other key in the line. */
function repeats(s: Struck, finger: number | null, lines: Lines): boolean {
  const prev = lines.get(s)?.prev;
  if (!prev || finger == null || prev.finger !== finger) return false;
  const d = Math.abs(s.midi - prev.midi);
  return d >= CLOSE_MOVE.min && d <= CLOSE_MOVE.max && !(s.fixed && prev.fixed);
}

/** True when the held and struck keys are ordered and no struck key repeats its line's finger. */
function settled(held: readonly Struck[], list: readonly Struck[], hand: Hand, lines: Lines): boolean {
  if (held.length === 0 && list.length === 1) return !repeats(list[0]!, list[0]!.finger, lines);
  const union = [...held, ...list].sort((a, b) => a.midi - b.midi);
  return orderedOk(union.map((s) => s.finger), hand) && !list.some((s) => repeats(s, s.finger, lines));
}

/**
 * The ordered finger choice for the keys down at one moment that changes the fewest estimated
 * fingers: struck keys first, held keys only when nothing else works; fixed fingers never change.
 * Falls back to the struck keys alone when the held keys cannot be fitted. True when a finger changed.
 */
function solve(keys: Struck[], held: readonly Struck[], list: readonly Struck[], hand: Hand, lines: Lines): boolean {
  const union = [...keys].sort((a, b) => a.midi - b.midi);
  const k = union.length;
  let best: number[] | null = null;
  let bestCost = Infinity;
  if (k <= 5) {
    for (const tuple of (hand === "right" ? RISING : FALLING)[k]!) {
      let cost = 0;
      for (let i = 0; i < k && cost < bestCost; i++) {
        const s = union[i]!;
        const f = tuple[i]!;
        if (s.finger === f) continue;
        if (s.fixed) { cost = Infinity; break; }
        cost += held.includes(s) ? 30 : 10 + Math.abs((s.finger ?? f) - f);
      }
      for (let i = 0; i < k && cost < bestCost; i++) if (list.includes(union[i]!) && repeats(union[i]!, tuple[i]!, lines)) cost += 100;
      if (cost < bestCost) [best, bestCost] = [tuple, cost];
    }
  }
  if (!best) return held.length > 0 ? solve([...list], [], list, hand, lines) : false;
  let changed = false;
  union.forEach((s, i) => {
    if (s.finger !== best![i]) [s.finger, changed] = [best![i]!, true];
  });
  return changed;
}
