/**
 * The demo studio's drill sheet: three drills generated from the demo knot (bars 1–2 of the
 * pebble study, right hand), assigned to the first demo student with a few practice entries.
 */
import { and, eq } from "drizzle-orm";
import { generateForKnot } from "../knots/generate";
import { pickedDrills } from "../sheets/save";
import type { Db } from "../../db/index";
import { assignment, passage, practiceEntry, score, sheet, sheetDrill } from "../../db/schema";

export const DEMO_SHEET_TITLE = "Even triplets, bars 1–2";

const daysAgo = (n: number, now = new Date()) => new Date(now.getTime() - n * 86_400_000).toISOString().slice(0, 10);

/** Adds the demo sheet, assignment and practice entries once; later runs change nothing. */
export async function seedDemoSheet(database: Db, input: { studioId: string; teacherId: string; studentMembershipId: string | null }): Promise<void> {
  const [exists] = await database.select({ id: sheet.id }).from(sheet).where(and(eq(sheet.studioId, input.studioId), eq(sheet.title, DEMO_SHEET_TITLE))).limit(1);
  if (exists) return;
  const [knot] = await database
    .select({ id: passage.id, part: passage.part, hand: passage.hand, fromBar: passage.fromBar, toBar: passage.toBar, musicxml: score.musicxml })
    .from(passage)
    .innerJoin(score, eq(score.id, passage.scoreId))
    .where(and(eq(passage.studioId, input.studioId), eq(score.originalName, "pebble-study.musicxml")))
    .limit(1);
  if (!knot) return;
  const out = generateForKnot(knot, { families: ["blocking", "stops", "rhythm-variants"], options: {}, seed: 1 });
  const oneEach = out.drills.filter((d, i) => out.drills.findIndex((x) => x.drill.family === d.drill.family) === i);
  const picks = oneEach.slice(0, 3).map((d) => ({ key: d.key, studentNote: "", tempo: { start: 54, target: 76 } }));
  if (picks.length === 0) return;
  const rows = pickedDrills(out, picks);
  const sheetId = crypto.randomUUID();
  await database.insert(sheet).values({ id: sheetId, studioId: input.studioId, passageId: knot.id, title: DEMO_SHEET_TITLE, notes: "Slowly and evenly; the third note of each triplet as loud as the first.", createdBy: input.teacherId });
  const drillIds: string[] = [];
  for (const [position, d] of rows.entries()) {
    const id = crypto.randomUUID();
    drillIds.push(id);
    await database.insert(sheetDrill).values({ id, sheetId, position, ...d });
  }
  if (!input.studentMembershipId) return;
  const assignmentId = crypto.randomUUID();
  await database.insert(assignment).values({
    id: assignmentId, studioId: input.studioId, sheetId, studentMembershipId: input.studentMembershipId,
    dueDate: daysAgo(-7), tempoGoals: Object.fromEntries(drillIds.map((id) => [id, 76])), note: "Five minutes a day is plenty.", createdBy: input.teacherId,
  });
  const log = [
    { day: 5, minutes: 10, tempo: 54, ease: 2, comment: "The third note keeps disappearing." },
    { day: 3, minutes: 15, tempo: 60, ease: 3, comment: "Better with the stops." },
    { day: 1, minutes: 12, tempo: 66, ease: 4, comment: null },
  ];
  for (const e of log) {
    await database.insert(practiceEntry).values({
      studioId: input.studioId, assignmentId, studentMembershipId: input.studentMembershipId, practisedOn: daysAgo(e.day),
      minutes: e.minutes, tempos: { [drillIds[0]]: e.tempo, ...(drillIds[1] ? { [drillIds[1]]: e.tempo - 4 } : {}) }, ease: e.ease, comment: e.comment,
    });
  }
}
