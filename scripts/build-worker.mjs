/**
 * Builds the heavy-work worker (lib/jobs/worker.ts) into one standalone CommonJS file,
 * build/worker/heavy-work.cjs, that a worker thread can load without Next. Packages in node_modules
 * (jsdom, pdfkit, the engraver, zod…) stay outside and are required from node_modules at run time.
 * Run by `npm run build` before `next build`, by scripts/demo.sh and by the test suites' set-up.
 *
 * Usage: node scripts/build-worker.mjs
 */
import path from "node:path";
import { fileURLToPath } from "node:url";
import { build } from "esbuild";

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "..");
const outfile = path.join(root, "build/worker/heavy-work.cjs");

await build({
  entryPoints: [path.join(root, "lib/jobs/worker.ts")],
  outfile,
  bundle: true,
  platform: "node",
  target: "node20",
  format: "cjs",
  packages: "external",
  sourcemap: "linked",
  logLevel: "warning",
  absWorkingDir: root,
});
console.log(`worker bundle: ${path.relative(root, outfile)}`);
