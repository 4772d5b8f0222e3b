import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { localStore, storeFromEnv, uploadThingStore, type FileStore } from "../../lib/storage";
import { startUploadThingFake, type UploadThingFake } from "../support/uploadthing-fake";

const bytes = new TextEncoder().encode('<?xml version="1.0"?><score-partwise version="4.0"/>');

function contract(name: string, make: () => FileStore) {
  describe(name, () => {
    test("put, get and delete round-trip the same bytes", async () => {
      const store = make();
      const key = await store.putFile("Étude in C.musicxml", bytes, "application/vnd.recordare.musicxml+xml");
      expect(await store.getFile(key)).toEqual(bytes);
      await store.deleteFile(key);
      expect(await store.getFile(key)).toBeNull();
    });
    test("deleting a missing file is not an error", async () => {
      await expect(make().deleteFile("00000000-0000-0000-0000-000000000000-gone.musicxml")).resolves.toBeUndefined();
    });
  });
}

let dir: string;
let fake: UploadThingFake;
beforeAll(async () => {
  dir = fs.mkdtempSync(path.join(os.tmpdir(), "knotwork-storage-"));
  fake = await startUploadThingFake();
});
afterAll(async () => {
  fs.rmSync(dir, { recursive: true, force: true });
  await fake?.close();
});

contract("local disk store", () => localStore(dir));
contract("UploadThing store (local fake of its HTTP API)", () =>
  uploadThingStore({ token: fake.token, apiUrl: fake.url, ingestUrl: fake.url, ufsHost: fake.url.replace("http://", ""), ufsAppIdLocation: "path" }),
);

describe("local disk store keys", () => {
  test("a name with ../ or slashes never leaves the folder", async () => {
    const store = localStore(dir);
    const key = await store.putFile("../../etc/passwd", bytes, "text/xml");
    expect(key).not.toContain("/");
    expect(key).not.toContain("..");
    expect(fs.existsSync(path.join(dir, key))).toBe(true);
  });
  test("keys that are not the store's own are refused on read and ignored on delete", async () => {
    const store = localStore(dir);
    expect(await store.getFile("../storage.test.ts")).toBeNull();
    await expect(store.deleteFile("../../package.json")).resolves.toBeUndefined();
  });
});

describe("UploadThing store against the fake", () => {
  test("the upload goes to the ingest URL with a signature and lands in the fake under the returned key", async () => {
    const store = storeFromEnv({
      UPLOADTHING_TOKEN: fake.token,
      UPLOADTHING_API_URL: fake.url,
      UPLOADTHING_INGEST_URL: fake.url,
      UPLOADTHING_UFS_HOST: fake.url.replace("http://", ""),
    });
    expect(store.kind).toBe("uploadthing");
    const key = await store.putFile("drill.musicxml", bytes, "application/xml");
    expect(fake.files.get(key)?.body.equals(Buffer.from(bytes))).toBe(true);
    expect(fake.requests.some((r) => r.method === "PUT" && r.path === `/${key}`)).toBe(true);
    await store.deleteFile(key);
    expect(fake.files.has(key)).toBe(false);
    expect(fake.requests.some((r) => r.method === "POST" && r.path === "/v6/deleteFiles")).toBe(true);
  });
  test("a failed ingest surfaces as an error, nothing kept", async () => {
    const store = uploadThingStore({ token: fake.token, apiUrl: fake.url, ingestUrl: fake.url });
    const before = fake.files.size;
    fake.failNextUpload(500);
    await expect(store.putFile("x.musicxml", bytes, "application/xml")).rejects.toThrow(/could not be stored/);
    expect(fake.files.size).toBe(before);
  });
  test("without a token the store is local disk under UPLOADS_DIR", () => {
    expect(storeFromEnv({ UPLOADS_DIR: dir }).kind).toBe("local");
  });
});
