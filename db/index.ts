import fs from "node:fs";
import path from "node:path";
import { createClient, type Client } from "@libsql/client";
import { drizzle, type LibSQLDatabase } from "drizzle-orm/libsql";
import { readEnv } from "../lib/env";
import * as schema from "./schema";

export type Db = LibSQLDatabase<typeof schema>;

/** Opens one libSQL client: a local file (foreign keys on, WAL) or a hosted `libsql://` server. */
export function openDatabase(url: string, authToken?: string): { client: Client; db: Db } {
  const isFile = url.startsWith("file:");
  if (isFile) {
    const filePath = url.slice("file:".length).split("?")[0];
    if (filePath && filePath !== ":memory:") {
      fs.mkdirSync(path.dirname(path.resolve(filePath)), { recursive: true });
    }
  }
  const client = createClient(isFile ? { url, timeout: 5000 } : { url, authToken });
  if (isFile) {
    void client.execute("PRAGMA foreign_keys=ON").catch(() => undefined);
    void client.execute("PRAGMA journal_mode=WAL").catch(() => undefined);
  }
  return { client, db: drizzle({ client, schema }) };
}

const globalForDb = globalThis as unknown as { knotworkDb?: { client: Client; db: Db } };

function shared() {
  if (!globalForDb.knotworkDb) {
    const env = readEnv();
    globalForDb.knotworkDb = openDatabase(env.DATABASE_URL, env.DATABASE_AUTH_TOKEN);
  }
  return globalForDb.knotworkDb;
}

/** The one drizzle instance for the app, opened from DATABASE_URL on first use. */
export const db: Db = new Proxy({} as Db, {
  get(_target, prop) {
    const real = shared().db as unknown as Record<PropertyKey, unknown>;
    const value = real[prop];
    return typeof value === "function" ? (value as Function).bind(real) : value;
  },
});

/** The raw libSQL client behind `db` (for PRAGMAs and closing in scripts). */
export function dbClient(): Client {
  return shared().client;
}

export { schema };
