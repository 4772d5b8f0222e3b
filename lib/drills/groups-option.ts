/**
 * The option on groups: a short, light ending of each group instead of a long final note. Any
 * family's drill can be passed through `applyLightEndings`; the registry turns it on with
 * `lightEndingsOption` (`{ lightEndings: true }`).
 */
import { z } from "zod";
import type { NoteEvent } from "../score/types";
import { writtenPieces } from "./build";
import type { Drill } from "./types";
import { tupletFor } from "./families/shared-2-layout";

/** Registry-level option: end each group lightly. */
export const lightEndingsOption = z.object({ lightEndings: z.boolean().default(false) });

/**
 * Registry-level option on group endings (DRILL-RUBRIC.md "endings"; common practice): as written,
 * short and light, or both — the short ending, then the long ending as written as its contrast.
 */
export const ENDINGS = ["written", "short", "short-and-long"] as const;
export type Endings = (typeof ENDINGS)[number];

const key = (e: NoteEvent) => `${e.staff}/${e.voice}`;

/**
 * The drill with every long note that ends a run (a note longer than the note just before it)
 * cut to the length of that previous note, marked staccato, and followed by a rest, so each
 * bar still adds up. Tied notes are left as they are.
 * @example applyLightEndings(drill).score.events.filter((e) => e.marks?.includes("staccato"))
 */
export function applyLightEndings(drill: Drill): Drill {
  const events = drill.score.events;
  const heads = events.filter((e) => !e.chord && !e.grace);
  const prevOf = new Map<NoteEvent, NoteEvent>();
  const lastByVoice = new Map<string, NoteEvent>();
  for (const h of [...heads].sort((a, b) => a.onset.compare(b.onset))) {
    const prev = lastByVoice.get(key(h));
    if (prev) prevOf.set(h, prev);
    lastByVoice.set(key(h), h);
  }
  const out: NoteEvent[] = [];
  const sources = { ...drill.fingeringSource };
  let current: { head: NoteEvent; light: boolean } | null = null;
  for (const e of events) {
    if (!e.chord) {
      const prev = prevOf.get(e);
      const light =
        !!e.pitch && !e.grace && e.tie === "none" && !!prev?.pitch && prev.tie === "none" &&
        prev.onset.add(prev.duration).equals(e.onset) && e.duration.compare(prev.duration) > 0 && e.measure === prev.measure;
      current = { head: e, light };
      if (!light) { out.push(e); continue; }
      const shortened = { ...e, duration: prev!.duration, written: prev!.written, marks: [...(e.marks ?? []), "staccato" as const] };
      out.push(shortened);
      const rest = e.duration.sub(prev!.duration);
      let t = e.onset.add(prev!.duration);
      writtenPieces(rest, tupletFor(rest, prev!.written.tuplet)).forEach((p, i) => {
        out.push({ id: `${e.id}-r${i + 1}`, part: e.part, staff: e.staff, voice: e.voice, measure: e.measure, onset: t, duration: p.duration, written: p.written, pitch: null, chord: false, tie: "none" });
        t = t.add(p.duration);
      });
      continue;
    }
    if (current?.light) {
      const head = out.find((x) => x.id === current!.head.id)!;
      out.splice(out.indexOf(head) + 1, 0, { ...e, duration: head.duration, written: head.written, marks: [...(e.marks ?? []), "staccato"] });
    } else out.push(e);
  }
  for (const id of Object.keys(sources)) if (!out.some((e) => e.id === id)) delete sources[id];
  return { ...drill, score: { ...drill.score, events: out }, fingeringSource: sources };
}

/**
 * Apply the registry option to a family's drills.
 * @example withLightEndings(drills, lightEndingsOption.parse({ lightEndings: true }))
 */
export function withLightEndings(drills: readonly Drill[], option: z.output<typeof lightEndingsOption>): Drill[] {
  return option.lightEndings ? drills.map(applyLightEndings) : [...drills];
}

/**
 * Apply the endings option: "short" ends every group lightly; "short-and-long" gives, for each drill
 * whose groups end on a long note, the short-ending version first and then the drill as written
 * (the long ending as its contrast); "written" leaves the drills as they are.
 * @example withEndings(drills, "short-and-long").map((d) => d.variant) // ["block-short-ending", "block", …]
 */
export function withEndings(drills: readonly Drill[], endings: Endings): Drill[] {
  if (endings === "written") return [...drills];
  if (endings === "short") return drills.map(applyLightEndings);
  return drills.flatMap((d) => {
    const light = applyLightEndings(d);
    if (light.score.events.length === d.score.events.length) return [d];
    return [
      { ...light, variant: `${d.variant}-short-ending`, title: `${d.title}, short endings`, studentNote: `${d.studentNote} End each group short and light.` },
      { ...d, title: `${d.title}, long endings`, studentNote: `${d.studentNote} Now hold each group's last note for its full length.` },
    ];
  });
}

