import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { describe, expect, test } from "vitest";
import { openDatabase } from "../../db";

describe("openDatabase", () => {
  test("a file URL creates its folder and opens a local database", async () => {
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), "knotwork-open-"));
    const url = `file:${path.join(dir, "nested", "k.db")}`;
    const { client } = openDatabase(url);
    expect(client.protocol).toBe("file");
    expect(fs.existsSync(path.join(dir, "nested"))).toBe(true);
    const res = await client.execute("SELECT 1 AS one");
    expect(Number((res.rows[0] as unknown as { one: number }).one)).toBe(1);
    client.close();
    fs.rmSync(dir, { recursive: true, force: true });
  });

  test("a libsql:// URL with a token gives a remote client, no local file and no connection yet", () => {
    // @libsql/client: libsql:// URLs speak Hrana over WebSockets ("ws") or HTTP; none opens a local file.
    const { client } = openDatabase("libsql://studio-db.example.invalid", "token-for-test");
    expect(["ws", "wss", "http", "https"]).toContain(client.protocol);
    client.close();
  });
});
