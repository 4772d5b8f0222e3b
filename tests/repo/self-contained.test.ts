// The repository carries everything its tests need: no source, test, script or config file reads a
// folder beside the checkout (such as a `shared` reference folder) or an absolute machine path.
// A fresh `git clone` followed by `npm test` must pass on its own (README, "Quick start").
import fs from "node:fs";
import path from "node:path";
import { describe, expect, test } from "vitest";
import { referenceDir } from "../support/xmllint";

const repoRoot = path.resolve(__dirname, "../..");
const scanned = ["app", "components", "db", "lib", "scripts", "tests", ".ci"];
const rootFiles = fs.readdirSync(repoRoot).filter((f) => /\.(ts|mjs|cjs|js|json)$/.test(f) && f !== "package-lock.json");

function sourceFiles(dir: string): string[] {
  const out: string[] = [];
  for (const entry of fs.readdirSync(dir, { withFileTypes: true })) {
    const full = path.join(dir, entry.name);
    if (entry.isDirectory()) out.push(...sourceFiles(full));
    else if (/\.(ts|tsx|mjs|cjs|js|sh|json)$/.test(entry.name) || entry.name === "run") out.push(full);
  }
  return out;
}

const files = [
  ...scanned.filter((d) => fs.existsSync(path.join(repoRoot, d))).flatMap((d) => sourceFiles(path.join(repoRoot, d))),
  ...rootFiles.map((f) => path.join(repoRoot, f)),
];

// Patterns that reach outside the checkout (this file included: it spells them only in parts).
const outside: { name: string; pattern: RegExp }[] = [
  // Built from parts so this file does not itself contain the path it looks for.
  { name: "a sibling shared folder", pattern: new RegExp(["\\.\\.", "shared\\b"].join("\\/")) },
  { name: "a sibling folder through ../../../ from a top-level folder", pattern: /["'`](?:\.\.\/){3,}/ },
  { name: "an absolute machine path", pattern: /["'`]\/(?:work|Users|mnt|srv)\// },
  { name: "the removed reference-folder variable", pattern: new RegExp(["KNOTWORK", "REFERENCE", "DIR"].join("_")) },
];

describe("the repository is self-contained", () => {
  test("the scan covers the test, script and library sources", () => {
    expect(files.length).toBeGreaterThan(100);
    expect(files.some((f) => f.endsWith(path.join("tests", "support", "xmllint.ts")))).toBe(true);
  });

  test.each(outside)("no file reads $name", ({ pattern }) => {
    const hits = files
      .filter((f) => pattern.test(fs.readFileSync(f, "utf8")))
      .map((f) => path.relative(repoRoot, f));
    expect(hits).toEqual([]);
  });

  test("the reference folder lives inside the repository, with its sources and licences", () => {
    const dir = referenceDir();
    expect(path.relative(repoRoot, dir).startsWith("..")).toBe(false);
    for (const f of [
      "FACTS.md",
      "musicxml/SOURCES.md",
      "musicxml/lilypond-testsuite/LICENSE",
      "musicxml/w3c-musicxml-4.0/schema/musicxml.local.xsd",
      "scores/SOURCES.md",
      "scores/LICENSE-OpenScore-Lieder-CC0.txt",
    ]) {
      expect(fs.existsSync(path.join(dir, f)), f).toBe(true);
    }
    expect(fs.readdirSync(path.join(dir, "scores")).filter((f) => f.endsWith(".mxl"))).toHaveLength(12);
  });
});
