/**
 * `npm run bench`: runs every module in scripts/bench/ that exports `run()` and prints one table.
 */
import fs from "node:fs";
import path from "node:path";

interface Row { name: string; value: number; unit: string; goal: string }

async function main(): Promise<void> {
  const dir = path.resolve(__dirname, "bench");
  const rows: Row[] = [];
  for (const file of fs.readdirSync(dir).filter((f) => f.endsWith(".ts")).sort()) {
    const mod = (await import(path.join(dir, file))) as { run?: () => Promise<Row[]> };
    if (typeof mod.run === "function") rows.push(...(await mod.run()));
  }
  const w = Math.max(...rows.map((r) => r.name.length), 4);
  console.log(`| ${"name".padEnd(w)} | value | goal |\n|${"-".repeat(w + 2)}|---|---|`);
  for (const r of rows) console.log(`| ${r.name.padEnd(w)} | ${r.value} ${r.unit} | ${r.goal} |`);
}

void main();
