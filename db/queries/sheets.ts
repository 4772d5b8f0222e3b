import { and, asc, count, desc, eq, sql } from "drizzle-orm";
import { inStudio } from "../scope";
import type { Db } from "../index";
import { passage, score, sheet, sheetDrill, type SheetDrillMeta } from "../schema";
import { preparedFor } from "./prepared";

/** The studio's drill sheets with how many drills each holds. */
export async function listSheets(database: Db, studioId: string) {
  return database
    .select({ id: sheet.id, title: sheet.title, createdAt: sheet.createdAt, drills: count(sheetDrill.id) })
    .from(sheet)
    .leftJoin(sheetDrill, eq(sheetDrill.sheetId, sheet.id))
    .where(inStudio(sheet, studioId))
    .groupBy(sheet.id)
    .orderBy(desc(sheet.createdAt));
}

export interface NewSheetDrill {
  family: string;
  variant: string;
  title: string;
  teacherNote: string;
  studentNote: string;
  musicxml: string;
  meta: SheetDrillMeta;
}

export interface NewSheet {
  studioId: string;
  createdBy: string;
  passageId: string | null;
  title: string;
  notes?: string | null;
  drills: readonly NewSheetDrill[];
}

/**
 * Stores a sheet and all its drills in one transaction, positions 0…n-1 in the given order: either
 * everything is written or nothing is. Returns the new sheet's id.
 */
export async function saveSheet(database: Db, input: NewSheet): Promise<string> {
  return database.transaction(async (tx) => {
    const id = crypto.randomUUID();
    await tx.insert(sheet).values({
      id,
      studioId: input.studioId,
      passageId: input.passageId,
      title: input.title,
      notes: input.notes ?? null,
      createdBy: input.createdBy,
    });
    for (const [position, d] of input.drills.entries()) {
      await tx.insert(sheetDrill).values({ sheetId: id, position, ...d });
    }
    return id;
  });
}

/** A sheet of the studio with its drills in order, or null (unknown id or another studio). */
export async function getSheet(database: Db, studioId: string, sheetId: string) {
  const [row] = await database.select().from(sheet).where(inStudio(sheet, studioId, eq(sheet.id, sheetId))).limit(1);
  if (!row) return null;
  const drills = await database.select().from(sheetDrill).where(eq(sheetDrill.sheetId, row.id)).orderBy(asc(sheetDrill.position));
  return { ...row, drills };
}

const studioOfSheet = preparedFor((database: Db) =>
  database.select({ studioId: sheet.studioId }).from(sheet).where(eq(sheet.id, sql.placeholder("sheetId"))).limit(1).prepare(),
);

/** The studio a sheet belongs to (for access checks), or null. */
export async function sheetStudio(database: Db, sheetId: string): Promise<string | null> {
  const [row] = await studioOfSheet(database).all({ sheetId });
  return row?.studioId ?? null;
}

/** One saved drill with its sheet's id and studio, or null. */
export async function getSheetDrill(database: Db, drillId: string) {
  const [row] = await database
    .select({ drill: sheetDrill, studioId: sheet.studioId })
    .from(sheetDrill)
    .innerJoin(sheet, eq(sheet.id, sheetDrill.sheetId))
    .where(eq(sheetDrill.id, drillId))
    .limit(1);
  return row ? { ...row.drill, studioId: row.studioId } : null;
}

function overviewQuery(database: Db, musicxml: boolean) {
  return database
    .select({
      id: sheet.id,
      title: sheet.title,
      notes: sheet.notes,
      createdAt: sheet.createdAt,
      updatedAt: sheet.updatedAt,
      knotId: passage.id,
      part: passage.part,
      hand: passage.hand,
      fromBar: passage.fromBar,
      toBar: passage.toBar,
      pieceId: score.id,
      pieceTitle: score.title,
      composer: score.composer,
      drill: {
        id: sheetDrill.id,
        position: sheetDrill.position,
        family: sheetDrill.family,
        variant: sheetDrill.variant,
        title: sheetDrill.title,
        teacherNote: sheetDrill.teacherNote,
        studentNote: sheetDrill.studentNote,
        meta: sheetDrill.meta,
        // The stored MusicXML is the bulk of a drill row: read only when asked for.
        musicxml: musicxml ? sheetDrill.musicxml : sql<string | null>`null`,
      },
    })
    .from(sheet)
    .leftJoin(passage, and(eq(passage.id, sheet.passageId), eq(passage.studioId, sql.placeholder("studioId"))))
    .leftJoin(score, and(eq(score.id, passage.scoreId), eq(score.studioId, sql.placeholder("studioId"))))
    .leftJoin(sheetDrill, eq(sheetDrill.sheetId, sheet.id))
    .where(and(eq(sheet.studioId, sql.placeholder("studioId")), eq(sheet.id, sql.placeholder("sheetId"))))
    .orderBy(asc(sheetDrill.position))
    .prepare();
}
const overviewWithMusicXml = preparedFor((database: Db) => overviewQuery(database, true));
const overviewWithoutMusicXml = preparedFor((database: Db) => overviewQuery(database, false));

/**
 * A sheet of the studio for its JSON view, in one query: the sheet, its knot and piece (null when
 * the knot is gone), and its drills in order; the drills' MusicXML only when asked for. Null when the
 * sheet is not this studio's.
 */
export async function getSheetOverview(database: Db, studioId: string, sheetId: string, opts: { musicxml: boolean }) {
  if (!studioId) throw new Error("A studio id is required to scope a query.");
  const query = opts.musicxml ? overviewWithMusicXml(database) : overviewWithoutMusicXml(database);
  const rows = await query.all({ studioId, sheetId });
  const [first] = rows;
  if (!first) return null;
  const { drill: _drill, ...head } = first;
  const drills = rows.flatMap((r) => (r.drill ? [r.drill] : []));
  return { ...head, drills };
}
