/**
 * `npm run db:seed`: applies the migrations, then creates the demo studio (lib/demo). Idempotent.
 */
import { db, dbClient } from "../db/index";
import { runMigrations } from "../db/migrate";
import { DEMO_STUDIO, seedDemo } from "../lib/demo/seed";

async function main() {
  await runMigrations(db);
  const result = await seedDemo(db);
  dbClient().close();
  console.log(`Demo studio "${DEMO_STUDIO}" ready with ${result.pieces} pieces.`);
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
