/**
 * Saving a drill sheet: the request (knot, generate request, picked drills in order with the
 * teacher's notes and tempo goals) and the rows it becomes. The drills are generated again on the
 * server from the same request, so only Knotwork's own MusicXML is ever stored.
 */
import { z } from "zod";
import type { NewSheetDrill } from "../../db/queries/sheets";
import { GenerateRequest } from "../knots/generate-request";
import type { KnotDrills } from "../knots/generate";
import { writeMusicXML } from "../score/write";

const Bpm = z.number().int().min(20, "Tempo goals start at 20 bpm.").max(300, "Tempo goals stop at 300 bpm.");

export const SaveSheetRequest = z.object({
  knotId: z.string().min(1).max(64),
  title: z.string().trim().min(1, "Give the sheet a name.").max(120, "Keep the name under 120 characters."),
  request: GenerateRequest,
  drills: z
    .array(
      z.object({
        key: z.string().min(1).max(200),
        studentNote: z.string().trim().max(600, "Keep each note under 600 characters."),
        tempo: z.object({ start: Bpm, target: Bpm }),
      }),
    )
    .min(1, "Pick at least one drill.")
    .max(30, "A sheet holds at most 30 drills."),
});
export type SaveSheetRequest = z.output<typeof SaveSheetRequest>;

/** The picked drills as rows, in the teacher's order; throws when a key matches no generated drill. */
export function pickedDrills(out: KnotDrills, picks: SaveSheetRequest["drills"]): NewSheetDrill[] {
  const byKey = new Map(out.drills.map((d) => [d.key, d.drill]));
  return picks.map((p) => {
    const drill = byKey.get(p.key);
    if (!drill) throw new RangeError(`The drill "${p.key}" is not among the generated drills; generate again.`);
    const fingering = Object.values(drill.fingeringSource);
    const span = (h: "right" | "left") => {
      const s = drill.maxSpan[h];
      return s ? { semitones: s.semitones, mm: Math.round(s.mm), overComfortable: s.overComfortable, overPractical: s.overPractical } : undefined;
    };
    return {
      family: drill.family,
      variant: drill.variant,
      title: drill.title,
      teacherNote: drill.teacherNote,
      studentNote: p.studentNote || drill.studentNote,
      musicxml: writeMusicXML(drill.score),
      meta: {
        maxSpan: { right: span("right"), left: span("left") },
        ...(out.profile ? { profile: { spanMm: out.profile.spanMm, octaveMm: out.profile.octaveMm } } : {}),
        warnings: drill.warnings.map((w) => w.message),
        warningCodes: drill.warnings.map((w) => w.code),
        tempo: { start: Math.min(p.tempo.start, p.tempo.target), target: Math.max(p.tempo.start, p.tempo.target) },
        hands: drill.hands,
        fingeringSource: {
          score: fingering.filter((f) => f === "score").length,
          estimated: fingering.filter((f) => f === "estimated").length,
        },
      },
    };
  });
}
