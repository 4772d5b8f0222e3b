import path from "node:path";
import { migrate } from "drizzle-orm/libsql/migrator";
import type { Db } from "./index";

/** Applies every committed migration in db/migrations. Safe to run repeatedly. */
export async function runMigrations(database: Db): Promise<void> {
  await migrate(database, { migrationsFolder: path.resolve(__dirname, "migrations") });
}

async function main() {
  const { db, dbClient } = await import("./index");
  await runMigrations(db);
  dbClient().close();
  console.log("Migrations applied.");
}

if (process.argv[1] && path.resolve(process.argv[1]) === path.resolve(__filename)) {
  main().catch((err) => {
    console.error(err);
    process.exit(1);
  });
}
