/**
 * `npm run bench`: runs every module in scripts/bench/ that exports `run()` (score reading, drills,
 * fingering, PDF, HTTP …) and prints one table with the goal beside each figure, plus the machine it
 * ran on. `npm run bench -- --readme` also writes the table into README.md between
 * `<!-- bench:start -->` and `<!-- bench:end -->`. `--only name,name` runs just those modules.
 */
import fs from "node:fs";
import os from "node:os";
import path from "node:path";

interface Row { name: string; value: number | string; unit: string; goal: string }

const START = "<!-- bench:start -->";
const END = "<!-- bench:end -->";

function machine(): string {
  const cpus = os.cpus();
  const model = cpus[0]?.model.replace(/\s+/g, " ").trim() ?? "unknown CPU";
  const load = os.loadavg()[0]!.toFixed(1);
  return `${model}, ${cpus.length} cores, ${Math.round(os.totalmem() / 2 ** 30)} GiB, Node ${process.version}, ${os.platform()} ${os.arch()} (load average ${load} when the run started)`;
}

function table(rows: Row[]): string {
  const cell = (s: string) => s.replace(/\|/g, "\\|");
  const lines = ["| benchmark | figure | goal |", "|---|---:|---|"];
  for (const r of rows) lines.push(`| ${cell(r.name)} | ${cell(`${r.value} ${r.unit}`.trim())} | ${cell(r.goal)} |`);
  return lines.join("\n");
}

/** Replaces the text between the markers (adding the markers at the end when missing). */
export function writeIntoReadme(readme: string, block: string): string {
  const body = `${START}\n${block}\n${END}`;
  const a = readme.indexOf(START);
  const b = readme.indexOf(END);
  if (a >= 0 && b > a) return readme.slice(0, a) + body + readme.slice(b + END.length);
  return `${readme.trimEnd()}\n\n## Benchmarks\n\n${body}\n`;
}

async function main(): Promise<void> {
  const host = machine();
  const dir = path.resolve(__dirname, "bench");
  const onlyArg = process.argv.indexOf("--only");
  const only = onlyArg > 0 ? new Set(process.argv[onlyArg + 1]?.split(",")) : null;
  const rows: Row[] = [];
  for (const file of fs.readdirSync(dir).filter((f) => f.endsWith(".ts")).sort()) {
    const name = file.replace(/\.ts$/, "");
    if (only && !only.has(name)) continue;
    process.stderr.write(`running ${name} …\n`);
    try {
      const mod = (await import(path.join(dir, file))) as { run?: () => Promise<Row[]> };
      if (typeof mod.run === "function") rows.push(...(await mod.run()));
    } catch (err) {
      rows.push({ name: `${name}: did not run`, value: "–", unit: "", goal: `✗ ${(err as Error).message.split("\n")[0]}` });
    }
  }
  const when = new Date().toISOString().slice(0, 10);
  const block = `${table(rows)}\n\nMeasured ${when} on ${host}. ✓ = goal met, ✗ = missed.`;
  console.log(block);
  if (process.argv.includes("--readme")) {
    const readme = path.resolve(__dirname, "../README.md");
    fs.writeFileSync(readme, writeIntoReadme(fs.readFileSync(readme, "utf8"), block));
    console.error(`README.md updated between ${START} and ${END}.`);
  }
}

if (process.argv[1] && path.resolve(process.argv[1]) === path.resolve(__filename)) {
  main().then(
    () => process.exit(0),
    (err) => {
      console.error(err);
      process.exit(1);
    },
  );
}
