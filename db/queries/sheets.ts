import { count, desc, eq } from "drizzle-orm";
import { inStudio } from "../../lib/studio-scope";
import type { Db } from "../index";
import { sheet, sheetDrill } from "../schema";

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
