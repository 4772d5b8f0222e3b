import fs from "node:fs";
import path from "node:path";
import type { Db } from "../../db";
import { membership, studio, user } from "../../db/schema";

export interface Studio {
  studioId: string;
  userId: string;
}

/** An invented studio with one teacher, written straight to the tables. */
export async function makeStudio(database: Db, name: string, email: string): Promise<Studio> {
  const studioId = crypto.randomUUID();
  const userId = crypto.randomUUID();
  await database.insert(user).values({ id: userId, name: `Teacher of ${name}`, email });
  await database.insert(studio).values({ id: studioId, name });
  await database.insert(membership).values({ studioId, userId, role: "teacher" });
  return { studioId, userId };
}

/** A demo piece from fixtures/pieces as an uploaded file. */
export function pieceFile(name: string, type = "application/vnd.recordare.musicxml+xml"): File {
  const bytes = fs.readFileSync(path.resolve(__dirname, "../../fixtures/pieces", name));
  return new File([bytes], name, { type });
}
