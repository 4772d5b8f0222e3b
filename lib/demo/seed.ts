import { and, eq } from "drizzle-orm";
import { insertCredentialUser } from "../auth/teacher-sign-up";
import type { Db } from "../../db/index";
import { loadDemoPieces } from "./pieces";
import { seedDemoSheet } from "./sheet";
import { handProfile, membership, passage, score, studio, user } from "../../db/schema";

/** Demo-only sign-ins, printed by `npm run demo`. Never use these anywhere real. */
export const DEMO_PASSWORD = "practise-slowly";
export const DEMO_STUDIO = "Hollowbrook Piano Studio";
export const DEMO_TEACHER = { name: "Odile Fenwick", email: "teacher@knotwork.test" };
export const DEMO_STUDENTS = [
  { name: "Tamsin Reyes", email: "tamsin@knotwork.test", spanMm: 178, notes: "Small hand; a ninth is out of reach." },
  { name: "Jonah Lindqvist", email: "jonah@knotwork.test", spanMm: 203, notes: "Reaches a ninth with a little stretch." },
  { name: "Wren Halloway", email: "wren@knotwork.test", spanMm: 216, notes: "Large hand; tenths on the white keys." },
] as const;
/** Octave width of a standard modern piano keyboard, in millimetres (common practice: 7 white keys × 23.6 mm ≈ 165.1). */
export const STANDARD_OCTAVE_MM = 165.1;

async function userIdByEmail(database: Db, email: string) {
  const [row] = await database.select({ id: user.id }).from(user).where(eq(user.email, email)).limit(1);
  return row?.id ?? null;
}

/** Creates the demo studio, its teacher, three students with hand profiles and the demo pieces. Idempotent. */
export async function seedDemo(database: Db): Promise<{ studioId: string; pieces: number }> {
  return database.transaction(async (tx) => {
    const db = tx as unknown as Db;
    let teacherId = await userIdByEmail(db, DEMO_TEACHER.email);
    let studioId: string;
    if (!teacherId) {
      teacherId = await insertCredentialUser(tx, { ...DEMO_TEACHER, password: DEMO_PASSWORD });
      studioId = crypto.randomUUID();
      await tx.insert(studio).values({ id: studioId, name: DEMO_STUDIO });
      await tx.insert(membership).values({ studioId, userId: teacherId, role: "teacher" });
    } else {
      const [m] = await tx
        .select({ studioId: membership.studioId })
        .from(membership)
        .where(and(eq(membership.userId, teacherId), eq(membership.role, "teacher")))
        .limit(1);
      if (!m) throw new Error(`${DEMO_TEACHER.email} exists but teaches no studio; reset the database.`);
      studioId = m.studioId;
    }

    for (const s of DEMO_STUDENTS) {
      if (await userIdByEmail(db, s.email)) continue;
      const userId = await insertCredentialUser(tx, { name: s.name, email: s.email, password: DEMO_PASSWORD });
      const membershipId = crypto.randomUUID();
      await tx.insert(membership).values({ id: membershipId, studioId, userId, role: "student" });
      await tx.insert(handProfile).values({ membershipId, spanMm: s.spanMm, octaveMm: STANDARD_OCTAVE_MM, notes: s.notes });
    }

    const pieces = loadDemoPieces();
    for (const p of pieces) {
      const [existing] = await tx
        .select({ id: score.id })
        .from(score)
        .where(and(eq(score.studioId, studioId), eq(score.originalName, p.fileName)))
        .limit(1);
      if (existing) continue;
      const scoreId = crypto.randomUUID();
      await tx.insert(score).values({
        id: scoreId,
        studioId,
        title: p.title,
        composer: p.composer,
        bars: p.bars,
        parts: p.parts,
        musicxml: p.musicxml,
        storageKey: `demo/${p.fileName}`,
        originalName: p.fileName,
        uploadedBy: teacherId,
      });
      if (p.fileName === "pebble-study.musicxml") {
        await tx.insert(passage).values({
          studioId,
          scoreId,
          part: p.parts[0]?.id ?? "P1",
          hand: "right",
          fromBar: 1,
          toBar: 2,
          tags: ["evenness", "rhythm"],
          note: "Triplets rush after the thumb; the third note of each group is swallowed.",
          createdBy: teacherId,
        });
      }
    }
    const [first] = await tx
      .select({ id: membership.id })
      .from(membership)
      .innerJoin(user, eq(user.id, membership.userId))
      .where(and(eq(user.email, DEMO_STUDENTS[0].email), eq(membership.studioId, studioId)))
      .limit(1);
    await seedDemoSheet(db, { studioId, teacherId, studentMembershipId: first?.id ?? null });
    return { studioId, pieces: pieces.length };
  });
}
