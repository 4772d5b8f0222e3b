// Marking a knot: the server action validates with zod, stores printed bar numbers, and answers 404
// for a piece of another studio.
import path from "node:path";
import { afterAll, beforeAll, describe, expect, test, vi } from "vitest";
import { countRows, useTempDatabase } from "../db/temp-db";
import { makeStudio, pieceFile, type Studio } from "./studio-fixtures";

const session = vi.hoisted(() => ({ current: null as null | { studioId: string; userId: string } }));
vi.mock("@/lib/auth/session", () => ({
  requireTeacher: async () => {
    if (!session.current) throw new Error("NEXT_REDIRECT");
    return { user: { id: session.current.userId, name: "T", email: "t@knotwork.test" }, studioId: session.current.studioId, studioName: "S", membershipId: "m", role: "teacher" };
  },
}));
vi.mock("next/cache", () => ({ revalidatePath: () => undefined }));

type Env = Awaited<ReturnType<typeof useTempDatabase>>;
let env: Env;
let a: Studio;
let b: Studio;
let waltz: string;
let createKnot: typeof import("../../app/(teacher)/pieces/[pieceId]/actions").createKnot;
let passages: typeof import("../../db/queries/passages");

beforeAll(async () => {
  env = await useTempDatabase("knot-action");
  const { acceptUpload } = await import("../../app/api/pieces/piece-upload");
  const { localStore } = await import("../../lib/storage");
  createKnot = (await import("../../app/(teacher)/pieces/[pieceId]/actions")).createKnot;
  passages = await import("../../db/queries/passages");
  a = await makeStudio(env.db, "Fernhollow Studio", "fern@knotwork.test");
  b = await makeStudio(env.db, "Gorsefield Studio", "gorse@knotwork.test");
  const form = new FormData();
  form.append("file", pieceFile("lantern-waltz.musicxml"));
  form.append("confirm", "yes");
  const out = await acceptUpload(form, { studioId: a.studioId, userId: a.userId, db: env.db, store: localStore(path.join(env.dir, "up")) });
  waltz = (out.body as { id: string }).id;
});
afterAll(() => env?.cleanup());

describe("createKnot", () => {
  test("stores printed bar numbers: after the pickup bar 0, indexes 9–10 are bars 9–10", async () => {
    session.current = a;
    const res = await createKnot(waltz, { from: 9, to: 10, hand: "right", tags: ["leap", "stretch"], note: "  lands late  " });
    expect(res.ok).toBe(true);
    const id = res.ok ? res.data.id : "";
    const knot = await passages.getPassage(env.db, a.studioId, id);
    // fixtures/pieces/README.md: Lantern Waltz opens with a pickup numbered 0 (implicit="yes"), then bars 1–16.
    expect(knot).toMatchObject({ fromBar: 9, toBar: 10, hand: "right", tags: ["leap", "stretch"], note: "lands late" });
    const pickup = await createKnot(waltz, { from: 0, to: 1, hand: "left", tags: ["rhythm"] });
    expect(pickup.ok && (await passages.getPassage(env.db, a.studioId, pickup.data.id))).toMatchObject({ fromBar: 0, toBar: 1 });
  });

  test.each([
    ["no tag", { from: 1, to: 2, hand: "right", tags: [] }, "tags"],
    ["an unknown tag", { from: 1, to: 2, hand: "right", tags: ["speed"] }, "tags"],
    ["bars in the wrong order", { from: 4, to: 2, hand: "right", tags: ["evenness"] }, "to"],
    ["an unknown hand", { from: 1, to: 2, hand: "third", tags: ["evenness"] }, "hand"],
    ["a bar past the end", { from: 16, to: 40, hand: "right", tags: ["evenness"] }, "to"],
    // lib/limits/work.ts: a knot is 1–16 bars; the pickup and bars 1–16 are 17 bars.
    ["17 bars, one more than a knot may hold", { from: 0, to: 16, hand: "right", tags: ["evenness"] }, "to"],
  ])("%s is refused with a field error and nothing stored", async (_label, input, field) => {
    session.current = a;
    const before = await countRows(env.client, "passage");
    const res = await createKnot(waltz, input as never);
    expect(res.ok).toBe(false);
    expect(!res.ok && res.fieldErrors?.[field]?.length).toBeGreaterThan(0);
    expect(await countRows(env.client, "passage")).toBe(before);
  });

  test("another studio's piece answers 404 and nothing is stored", async () => {
    session.current = b;
    const before = await countRows(env.client, "passage");
    await expect(createKnot(waltz, { from: 1, to: 2, hand: "right", tags: ["evenness"] })).rejects.toMatchObject({ digest: expect.stringContaining("404") });
    expect(await countRows(env.client, "passage")).toBe(before);
  });
});
