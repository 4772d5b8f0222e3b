import { and, eq } from "drizzle-orm";
import type { Db } from "../../db";
import { passage, studio } from "../../db/schema";

/** The demo studio's seeded knot (pebble study, bars 1–2, right hand, "evenness"). */
export async function seededKnot(db: Db) {
  const [row] = await db.select().from(passage).where(eq(passage.fromBar, 1)).limit(1);
  if (!row) throw new Error("the demo seed has no knot");
  return row;
}

/** A second, invented studio to check that ids from elsewhere are not found. */
export async function otherStudio(db: Db): Promise<string> {
  const id = crypto.randomUUID();
  await db.insert(studio).values({ id, name: "Larchmere Keys" });
  const [row] = await db.select().from(studio).where(and(eq(studio.id, id))).limit(1);
  return row!.id;
}
