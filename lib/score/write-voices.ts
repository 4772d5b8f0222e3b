/**
 * Orders one bar of one part into voice streams for the MusicXML writer: each voice's pieces in
 * onset order, grace notes before the note they lead into, notes that start together as chords.
 */
import Fraction from "fraction.js";
import type { Piece } from "./write-pieces";

/** Notes written together: one note, a chord, or a grace note (chord). */
export interface Slot {
  /** Pieces in written order; every piece after the first carries `<chord/>`. */
  readonly pieces: readonly Piece[];
  readonly onset: Fraction;
  /** How far the slot moves the position: the first piece's duration (0 for grace notes). */
  readonly advance: Fraction;
  readonly grace: boolean;
  readonly rest: boolean;
  /** Beam values by level (index 0 = `<beam number="1">`). */
  beams: string[];
  /** Tuplet bracket marks written on the slot's first piece. */
  tuplet: ("start" | "stop")[];
}

/** One voice of one bar, written between `<backup>`s. */
export interface VoiceStream {
  readonly voice: string;
  /** The staff the voice mostly sits on (gap rests go there). */
  readonly staff: number;
  /** The first voice of its staff: its gaps are filled with rests, other voices use `<forward>`. */
  readonly primary: boolean;
  readonly slots: Slot[];
}

const voiceRank = (v: string): number => (/^\d+$/.test(v) ? Number(v) : 1000);

/**
 * Voice streams for one bar, ordered by staff, then voice. Every staff of the part gets a stream,
 * an empty one (filled with a bar rest by the writer) when no voice sits on it. A voice belongs to
 * the staff it sits on most in the whole part (`homeStaffs`), so a voice that crosses to the other
 * staff for a bar keeps its home staff and leaves no stray rest behind.
 * @example
 *   const streams = voiceStreams(pieces, 2); // [{ voice: "1", staff: 1, … }, { voice: "5", staff: 2, … }]
 */
export function voiceStreams(pieces: readonly Piece[], staves: number, homeStaffs?: ReadonlyMap<string, number>): VoiceStream[] {
  const byVoice = new Map<string, Piece[]>();
  for (const p of pieces) {
    const list = byVoice.get(p.event.voice) ?? [];
    list.push(p);
    byVoice.set(p.event.voice, list);
  }
  const voices = [...byVoice.entries()].map(([voice, list]) => ({
    voice,
    staff: homeStaffs?.get(voice) ?? homeStaff(list),
    slots: slotsOf(list),
  }));
  voices.sort((a, b) => a.staff - b.staff || voiceRank(a.voice) - voiceRank(b.voice) || a.voice.localeCompare(b.voice));
  const used = new Set(voices.map((v) => v.voice));
  const streams: VoiceStream[] = [];
  for (let staff = 1; staff <= Math.max(staves, ...voices.map((v) => v.staff)); staff++) {
    const here = voices.filter((v) => v.staff === staff);
    if (here.length === 0) {
      let n = (staff - 1) * 4 + 1;
      while (used.has(String(n))) n++;
      used.add(String(n));
      streams.push({ voice: String(n), staff, primary: true, slots: [] });
      continue;
    }
    here.forEach((v, i) => streams.push({ ...v, primary: i === 0 }));
  }
  return streams;
}

/**
 * The staff each voice sits on most, over the whole part.
 * @example
 *   partHomeStaffs(events).get("5"); // 2
 */
export function partHomeStaffs(events: readonly { readonly voice: string; readonly staff: number }[]): Map<string, number> {
  const counts = new Map<string, Map<number, number>>();
  for (const e of events) {
    const c = counts.get(e.voice) ?? new Map<number, number>();
    c.set(e.staff, (c.get(e.staff) ?? 0) + 1);
    counts.set(e.voice, c);
  }
  const out = new Map<string, number>();
  for (const [voice, c] of counts) {
    let best = -1;
    for (const [staff, n] of c) if (best < 0 || n > c.get(best)! || (n === c.get(best) && staff < best)) best = staff;
    out.set(voice, best);
  }
  return out;
}

function homeStaff(list: readonly Piece[]): number {
  const count = new Map<number, number>();
  for (const p of list) count.set(p.event.staff, (count.get(p.event.staff) ?? 0) + 1);
  let best = list[0].event.staff;
  for (const [staff, n] of count) if (n > count.get(best)! || (n === count.get(best) && staff < best)) best = staff;
  return best;
}

const isGrace = (p: Piece): boolean => p.duration.equals(0);

function slotsOf(list: readonly Piece[]): Slot[] {
  const sorted = [...list].sort(
    (a, b) => a.onset.compare(b.onset) || Number(!isGrace(a)) - Number(!isGrace(b)) || a.order - b.order,
  );
  const slots: Slot[] = [];
  let i = 0;
  while (i < sorted.length) {
    const head = sorted[i];
    const group = [head];
    i++;
    if (isGrace(head)) {
      while (i < sorted.length && isGrace(sorted[i]) && sorted[i].event.chord && sorted[i].onset.equals(head.onset)) {
        group.push(sorted[i++]);
      }
    } else if (head.event.pitch) {
      while (i < sorted.length && !isGrace(sorted[i]) && sorted[i].event.pitch && sorted[i].onset.equals(head.onset)) {
        group.push(sorted[i++]);
      }
      group.sort((a, b) => b.duration.compare(a.duration) || a.event.pitch!.midi - b.event.pitch!.midi || a.order - b.order);
    }
    slots.push({
      pieces: group,
      onset: head.onset,
      advance: group[0].duration,
      grace: isGrace(head),
      rest: head.event.pitch === null,
      beams: [],
      tuplet: [],
    });
  }
  return slots;
}
