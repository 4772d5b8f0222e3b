import fs from "node:fs";
import path from "node:path";
import { readEnv } from "../lib/env";

/** `npm run db:reset`: deletes the local SQLite file (and its WAL files), then migrates and seeds the demo studio again. */
async function main() {
  const { DATABASE_URL } = readEnv();
  if (!DATABASE_URL.startsWith("file:")) {
    throw new Error("db:reset only removes local file databases; reset a hosted libSQL database by hand.");
  }
  const file = path.resolve(DATABASE_URL.slice("file:".length).split("?")[0]);
  for (const f of [file, `${file}-wal`, `${file}-shm`]) fs.rmSync(f, { force: true });
  console.log(`Removed ${path.relative(process.cwd(), file)}.`);
  const { db, dbClient } = await import("../db/index");
  const { runMigrations } = await import("../db/migrate");
  const { seedDemo } = await import("../lib/demo/seed");
  await runMigrations(db);
  await seedDemo(db);
  dbClient().close();
  console.log("Migrated and seeded.");
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
