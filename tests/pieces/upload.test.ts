// Upload of a piece through the multipart handler's core: reading by content, the cleaned copy only,
// nothing stored on failure, and the multipart tricks a form can be sent with.
import fs from "node:fs";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { countRows, useTempDatabase } from "../db/temp-db";
import { makeStudio, pieceFile, type Studio } from "./studio-fixtures";

type Env = Awaited<ReturnType<typeof useTempDatabase>>;
let env: Env;
let uploads: string;
let mod: typeof import("../../app/api/pieces/piece-upload");
let storage: typeof import("../../lib/storage");
let teacher: Studio;

const fixtures = path.resolve(__dirname, "../../fixtures");
const storedFiles = () => (fs.existsSync(uploads) ? fs.readdirSync(uploads) : []);

function form(file: File | null, confirm: string | null = "yes") {
  const f = new FormData();
  if (file) f.append("file", file);
  if (confirm !== null) f.append("confirm", confirm);
  return f;
}

beforeAll(async () => {
  env = await useTempDatabase("pieces-upload");
  uploads = path.join(env.dir, "uploads");
  mod = await import("../../app/api/pieces/piece-upload");
  storage = await import("../../lib/storage");
  teacher = await makeStudio(env.db, "Quillmere Studio", "quill@knotwork.test");
});
afterAll(() => env?.cleanup());

const ctx = () => ({ studioId: teacher.studioId, userId: teacher.userId, db: env.db, store: storage.localStore(uploads) });

describe("upload of a good piece", () => {
  test("stores the cleaned copy once, as the row's MusicXML and as the stored file", async () => {
    const out = await mod.acceptUpload(form(pieceFile("lantern-waltz.musicxml")), ctx());
    expect(out.status).toBe(201);
    const body = out.body as { id: string; title: string; bars: number };
    // fixtures/pieces/README.md: Lantern Waltz has a pickup (implicit="yes") plus 16 bars.
    expect(body.title).toBe("Lantern Waltz");
    expect(body.bars).toBe(16);
    const [row] = (await env.client.execute({ sql: "select musicxml, storage_key, parts from score where id = ?", args: [body.id] })).rows as unknown as { musicxml: string; storage_key: string; parts: string }[];
    expect(row!.musicxml.startsWith('<?xml version="1.0" encoding="UTF-8"?>')).toBe(true);
    expect(row!.musicxml).not.toMatch(/<!DOCTYPE/i); // the cleaned copy drops the DOCTYPE (lib/score sanitize)
    expect(fs.readFileSync(path.join(uploads, row!.storage_key), "utf8")).toBe(row!.musicxml);
    // fixtures/pieces/README.md: one piano part on two staves.
    expect(JSON.parse(row!.parts)).toEqual([expect.objectContaining({ staves: 2 })]);
  });

  test("an .mxl is read by content: a compressed file and a plain XML file named .mxl both pass", async () => {
    const { readScore, writeMxl } = await import("../../lib/score");
    const xml = fs.readFileSync(path.join(fixtures, "pieces/pebble-study.musicxml"));
    const zipped = writeMxl(readScore(new Uint8Array(xml)).score);
    const a = await mod.acceptUpload(form(new File([zipped as BlobPart], "pebble.mxl", { type: "application/vnd.recordare.musicxml" })), ctx());
    expect(a.status).toBe(201);
    const b = await mod.acceptUpload(form(new File([xml], "pebble-plain.mxl", { type: "" })), ctx());
    expect(b.status).toBe(201);
    // fixtures/pieces/README.md: Pebble Study has 8 bars.
    expect((a.body as { bars: number }).bars).toBe(8);
    expect((b.body as { bars: number }).bars).toBe(8);
  });
});

describe("refused uploads store nothing", () => {
  const hostile = fs.readdirSync(path.join(fixtures, "hostile")).sort();

  test.each(hostile)("hostile file %s → 4xx with a plain message, no row, no file", async (name) => {
    const rows = await countRows(env.client, "score");
    const files = storedFiles().length;
    const bytes = fs.readFileSync(path.join(fixtures, "hostile", name));
    const out = await mod.acceptUpload(form(new File([bytes], name, { type: name.endsWith(".mxl") ? "application/zip" : "text/xml" })), ctx());
    expect(out.status).toBeGreaterThanOrEqual(400);
    expect(out.status).toBeLessThan(500);
    const error = (out.body as { error: string }).error;
    expect(error).toContain(name);
    expect(error.length).toBeGreaterThan(name.length + 20);
    expect(await countRows(env.client, "score")).toBe(rows);
    expect(storedFiles().length).toBe(files);
  });

  const xml = () => fs.readFileSync(path.join(fixtures, "pieces/two-ribbons.musicxml"));
  test.each([
    ["no confirmation", () => form(pieceFile("two-ribbons.musicxml"), null), 400, /public domain or your own work/],
    ["confirmation not ticked", () => form(pieceFile("two-ribbons.musicxml"), "no"), 400, /public domain/],
    ["no file", () => form(null), 400, /Choose a MusicXML file/],
    ["two files", () => { const f = form(pieceFile("two-ribbons.musicxml")); f.append("file", pieceFile("pebble-study.musicxml")); return f; }, 400, /one piece at a time/],
    ["a wrong content type", () => form(new File([xml()], "two-ribbons.musicxml", { type: "image/png" })), 415, /image\/png/],
    ["a double extension", () => form(new File([xml()], "two-ribbons.php.xml", { type: "text/xml" })), 415, /second file type/],
    ["an executable named after the score", () => form(new File([xml()], "two-ribbons.musicxml.exe", { type: "" })), 415, /not a MusicXML file/],
    ["an empty file", () => form(new File([], "empty.musicxml", { type: "text/xml" })), 400, /is empty/],
    ["a file over the cap", () => form(new File([new Uint8Array(5 * 1024 * 1024 + 1)], "big.musicxml", { type: "text/xml" })), 413, /up to 5 MB/],
    ["a name with ../", () => form(new File([xml()], "../../two-ribbons.musicxml", { type: "text/xml" })), 400, /folder path/],
    ["a name with a backslash", () => form(new File([xml()], "..\\two-ribbons.musicxml", { type: "text/xml" })), 400, /folder path/],
  ] as const)("%s → %i", async (_label, make, status, message) => {
    const rows = await countRows(env.client, "score");
    const files = storedFiles().length;
    const out = await mod.acceptUpload(make(), ctx());
    expect(out.status).toBe(status);
    expect((out.body as { error: string }).error).toMatch(message);
    expect(await countRows(env.client, "score")).toBe(rows);
    expect(storedFiles().length).toBe(files);
  });

  test("when the row cannot be written, the stored file is removed again", async () => {
    const files = storedFiles().length;
    // A studio id that does not exist breaks the foreign key, so the insert fails after the file was put.
    const broken = { ...ctx(), studioId: "no-such-studio" };
    await expect(mod.acceptUpload(form(pieceFile("two-ribbons.musicxml")), broken)).rejects.toThrow();
    expect(storedFiles().length).toBe(files);
  });
});

describe("upload to UploadThing (local fake)", () => {
  test("the cleaned copy goes to the fake; deleting the piece deletes it there", async () => {
    const { startUploadThingFake } = await import("../support/uploadthing-fake");
    const fake = await startUploadThingFake();
    try {
      const store = storage.uploadThingStore({ token: fake.token, apiUrl: fake.url, ingestUrl: fake.url, ufsHost: fake.url.replace("http://", ""), ufsAppIdLocation: "path" });
      const out = await mod.acceptUpload(form(pieceFile("pebble-study.musicxml")), { ...ctx(), store });
      expect(out.status).toBe(201);
      expect(fake.files.size).toBe(1);
      const [stored] = [...fake.files.values()];
      expect(stored!.body.toString("utf8")).not.toMatch(/<!DOCTYPE/i);
      const del = await mod.removePiece({ ...ctx(), store }, (out.body as { id: string }).id);
      expect(del.status).toBe(200);
      expect(fake.files.size).toBe(0);
    } finally {
      await fake.close();
    }
  });
});
