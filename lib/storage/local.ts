import { randomUUID } from "node:crypto";
import fs from "node:fs/promises";
import path from "node:path";
import type { FileStore } from "./types";

const KEY_PATTERN = /^[0-9a-f-]{36}-[a-z0-9._-]{1,80}$/;

/** A safe file name: lower-case letters, digits, dots, dashes; no path parts. */
export function safeName(name: string): string {
  const base = name.split(/[\\/]/).pop() ?? "";
  const cleaned = base
    .toLowerCase()
    .replace(/[^a-z0-9._-]+/g, "-")
    .replace(/^[.-]+/, "")
    .slice(0, 80);
  return cleaned || "piece.musicxml";
}

/** Files in one folder on local disk; keys are `<uuid>-<safe name>` and never contain a path. */
export function localStore(dir: string): FileStore {
  const root = path.resolve(dir);
  const fileOf = (key: string) => {
    if (!KEY_PATTERN.test(key)) throw new Error("Not a storage key of this store.");
    return path.join(root, key);
  };
  return {
    kind: "local",
    async putFile(name, body) {
      await fs.mkdir(root, { recursive: true });
      const key = `${randomUUID()}-${safeName(name)}`;
      const tmp = path.join(root, `.${key}.part`);
      await fs.writeFile(tmp, body, { flag: "wx" });
      await fs.rename(tmp, fileOf(key));
      return key;
    },
    async getFile(key) {
      if (!KEY_PATTERN.test(key)) return null;
      try {
        return new Uint8Array(await fs.readFile(fileOf(key)));
      } catch (e) {
        if ((e as NodeJS.ErrnoException).code === "ENOENT") return null;
        throw e;
      }
    },
    async deleteFile(key) {
      if (!KEY_PATTERN.test(key)) return;
      await fs.rm(fileOf(key), { force: true });
    },
  };
}
