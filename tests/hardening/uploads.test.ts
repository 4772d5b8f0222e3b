/**
 * Hostile uploads through the real HTTP upload path (POST /api/pieces, multipart, as the demo
 * teacher): every file of fixtures/hostile/ and the usual multipart tricks. Each answer is a 4xx with
 * a plain message naming the problem; no row is added to the studio and no file lands in the upload
 * folder. One good upload at the end proves the path really stores pieces.
 */
import fs from "node:fs";
import path from "node:path";
import { describe, expect, test } from "vitest";
import { probe, rowCounts, studioDigest, uploadFiles, type Probe } from "./context";
import { repoRoot } from "./server";

const hostileDir = path.join(repoRoot, "fixtures/hostile");
const goodPiece = fs.readFileSync(path.join(repoRoot, "fixtures/pieces/lantern-waltz.musicxml"));
const CAP = 5 * 1024 * 1024; // the cap named on the upload form (app/api/pieces/piece-upload.ts)

function form(parts: { name: string; bytes: Uint8Array<ArrayBuffer> | string; type?: string }[], confirm: string | null = "yes"): FormData {
  const fd = new FormData();
  for (const p of parts) fd.append("file", new File([typeof p.bytes === "string" ? p.bytes : new Uint8Array(p.bytes)], p.name, { type: p.type ?? "application/vnd.recordare.musicxml+xml" }));
  if (confirm !== null) fd.set("confirm", confirm);
  return fd;
}

async function upload(body: BodyInit, headers: Record<string, string> = {}): Promise<Probe> {
  return probe("POST", "/api/pieces", "demoTeacher", { body, headers });
}

/** A 4xx whose JSON names the problem in a sentence, with no stack trace or internal detail. */
function expectClearRefusal(res: Probe, what: string) {
  expect(res.status, `${what}: ${res.body}`).toBeGreaterThanOrEqual(400);
  expect(res.status, `${what}: ${res.body}`).toBeLessThan(500);
  const message = (JSON.parse(res.body) as { error?: string; message?: string }).error ?? JSON.parse(res.body).message;
  expect(typeof message, what).toBe("string");
  expect(message.length, what).toBeGreaterThan(10);
  expect(message, what).not.toMatch(/\bat \S+:\d+|node_modules|ENOENT|TypeError|SQLITE/);
}

async function expectNothingStored<T>(run: () => Promise<T>): Promise<T> {
  const [rows, digest, files] = [await rowCounts(), await studioDigest(), uploadFiles()];
  const out = await run();
  expect(await rowCounts()).toEqual(rows);
  expect(await studioDigest()).toBe(digest);
  expect(uploadFiles()).toEqual(files);
  return out;
}

describe("hostile files through POST /api/pieces", () => {
  const files = fs.readdirSync(hostileDir).filter((f) => /\.(xml|mxl|musicxml)$/.test(f)).sort();

  test("the hostile corpus is there", () => {
    expect(files.length).toBeGreaterThanOrEqual(15);
  });

  test.each(files)("%s → 4xx with a message, nothing stored", async (file) => {
    const bytes = new Uint8Array(fs.readFileSync(path.join(hostileDir, file)));
    const res = await expectNothingStored(() => upload(form([{ name: file, bytes }])));
    expectClearRefusal(res, file);
  });
});

describe("multipart tricks", () => {
  const tricks: [string, () => [BodyInit, Record<string, string>?]][] = [
    ["a file sent as text/html", () => [form([{ name: "lantern.musicxml", bytes: goodPiece, type: "text/html" }])]],
    ["a JSON body instead of a form", () => [JSON.stringify({ file: goodPiece.toString("utf8") }), { "content-type": "application/json" }]],
    ["a double extension hiding a script", () => [form([{ name: "lantern.html.musicxml", bytes: goodPiece }])]],
    ["an executable with a MusicXML first extension", () => [form([{ name: "lantern.musicxml.exe", bytes: goodPiece }])]],
    ["an empty file", () => [form([{ name: "empty.musicxml", bytes: new Uint8Array(0) }])]],
    ["a file over the size cap", () => [form([{ name: "huge.musicxml", bytes: new Uint8Array(CAP + 1024).fill(0x20) }])]],
    ["a file name with ../", () => [form([{ name: "../../escape.musicxml", bytes: goodPiece }])]],
    ["a Windows path in the file name", () => [form([{ name: "..\\..\\escape.musicxml", bytes: goodPiece }])]],
    ["no confirmation of the piece's rights", () => [form([{ name: "lantern.musicxml", bytes: goodPiece }], null)]],
    ["two files at once", () => [form([{ name: "a.musicxml", bytes: goodPiece }, { name: "b.musicxml", bytes: goodPiece }])]],
    ["no file at all", () => [form([])]],
    [
      "a multipart body cut off mid-way",
      () => [
        "--kwboundary\r\ncontent-disposition: form-data; name=\"file\"; filename=\"cut.musicxml\"\r\ncontent-type: application/xml\r\n\r\n<score-partwise",
        { "content-type": "multipart/form-data; boundary=kwboundary" },
      ],
    ],
  ];

  test.each(tricks)("%s → 4xx with a message, nothing stored", async (what, make) => {
    const [body, headers] = make();
    const res = await expectNothingStored(() => upload(body, headers));
    expectClearRefusal(res, what);
  });

  test("anonymous and student uploads are refused before the file is read", async () => {
    for (const persona of ["anonymous", "demoStudent", "otherStudent"] as const) {
      const res = await expectNothingStored(() => probe("POST", "/api/pieces", persona, { body: form([{ name: "lantern.musicxml", bytes: goodPiece }]) }));
      expect([401, 403, 404], persona).toContain(res.status);
    }
  });
});

describe("a good upload (control)", () => {
  test("stores exactly one piece row and one file, with the uploaded file's title", async () => {
    const [rows, files] = [await rowCounts(), uploadFiles()];
    const res = await upload(form([{ name: "lantern-waltz.musicxml", bytes: goodPiece }]));
    expect(res.status, res.body).toBe(201);
    const after = await rowCounts();
    expect(after.score).toBe(rows.score + 1);
    expect(uploadFiles().length).toBe(files.length + 1);
    const id = (JSON.parse(res.body) as { id: string }).id;
    // Clean up through the app's own delete, which removes the row and the file together.
    expect((await probe("DELETE", `/api/pieces/${id}`, "demoTeacher")).status).toBe(200);
    expect((await rowCounts()).score).toBe(rows.score);
    expect(uploadFiles()).toEqual(files);
  });
});
