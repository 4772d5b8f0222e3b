// The layout DEVELOPERS.md draws ("Map"), checked on the real import graph of app, components, db
// and lib: one-way layers app → components → lib services → db → pure cores, no import circles,
// a data layer that imports no service, pure cores that import no app layer, at most four loose
// shared files directly under lib/, and every lib folder opening with a comment that says what it is.
import fs from "node:fs";
import path from "node:path";
import { describe, expect, test } from "vitest";
import { importCircles, importGraph, importsOf, opensWithComment, resolveSpecifier, sourceFilesUnder } from "./import-graph";

const repoRoot = path.resolve(__dirname, "../..");
const files = sourceFilesUnder(repoRoot, ["app", "components", "db", "lib"]).filter((f) => !/\.test\.tsx?$/.test(f));
const graph = importGraph(repoRoot, files);

/** The pure cores: plain TypeScript over the score model, no React, Next, database or service. */
const PURE = ["lib/score/", "lib/drills/", "lib/handout/", "lib/playback/", "lib/caution/"];
const isLoose = (f: string) => /^lib\/[^/]+\.tsx?$/.test(f);
type Layer = "app" | "components" | "service" | "db" | "pure" | "shared";
function layerOf(f: string): Layer {
  if (f.startsWith("app/")) return "app";
  if (f.startsWith("components/")) return "components";
  if (f.startsWith("db/")) return "db";
  if (PURE.some((p) => f.startsWith(p))) return "pure";
  if (isLoose(f)) return "shared";
  return "service";
}
/** A file may import its own layer or any layer below it. */
const RANK: Record<Layer, number> = { app: 4, components: 3, service: 2, db: 1, pure: 0, shared: 0 };
/** Packages a pure core must not reach for: the app's framework, database and auth. */
const APP_PACKAGES = /^(react|react-dom|next|drizzle-orm|@libsql\/client|better-auth|server-only|nodemailer|uploadthing|@uploadthing\/react)(\/|$)/;


describe("the import scanner", () => {
  test("finds a two-file circle and a self-import, and nothing in a chain", () => {
    expect(importCircles(new Map([["a", ["b"]], ["b", ["c"]], ["c", ["a"]], ["d", ["a"]]]))).toEqual([["a", "b", "c"]]);
    expect(importCircles(new Map([["a", ["a"]]]))).toEqual([["a"]]);
    expect(importCircles(new Map([["a", ["b"]], ["b", ["c"]], ["c", []]]))).toEqual([]);
  });

  test("resolves relative, @/ and folder-index specifiers to files, and reads type and dynamic imports", () => {
    expect(resolveSpecifier(repoRoot, "lib/auth/session.ts", "./index")).toBe("lib/auth/index.ts");
    expect(resolveSpecifier(repoRoot, "app/page.tsx", "@/lib/caution")).toBe("lib/caution/index.ts");
    expect(resolveSpecifier(repoRoot, "lib/knots/generate.ts", "zod")).toBeNull();
    // lib/auth/session.ts imports the auth instance; lib/knots/cache.ts imports a type from lib/drills.
    expect(importsOf(repoRoot, "lib/auth/session.ts").files).toContain("lib/auth/index.ts");
    expect(importsOf(repoRoot, "lib/knots/cache.ts").files).toContain("lib/drills/index.ts");
    expect(files.length).toBeGreaterThan(150);
  });
});

describe("layers", () => {
  test("no import circles in app, components, db and lib", () => {
    expect(importCircles(graph)).toEqual([]);
  });

  test("every import points to the same layer or one below it", () => {
    const upward = [...graph].flatMap(([f, targets]) =>
      targets.filter((t) => RANK[layerOf(t)] > RANK[layerOf(f)]).map((t) => `${f} (${layerOf(f)}) → ${t} (${layerOf(t)})`),
    );
    expect(upward).toEqual([]);
  });

  test("db/ imports no lib service: only the loose shared files and the pure cores", () => {
    const bad = [...graph].filter(([f]) => f.startsWith("db/"))
      .flatMap(([f, targets]) => targets.filter((t) => t.startsWith("lib/") && layerOf(t) === "service").map((t) => `${f} → ${t}`));
    expect(bad).toEqual([]);
  });

  test("pure cores import only pure cores and the loose leaf utilities, and no framework, database or auth package", () => {
    // The loose files are leaves that import no project file (checked below), so a pure core may use one.
    const bad = [...graph].filter(([f]) => layerOf(f) === "pure").flatMap(([f, targets]) => [
      ...targets.filter((t) => layerOf(t) !== "pure" && layerOf(t) !== "shared").map((t) => `${f} → ${t}`),
      ...importsOf(repoRoot, f).packages.filter((p) => APP_PACKAGES.test(p)).map((p) => `${f} → ${p}`),
    ]);
    expect(bad).toEqual([]);
  });
});

describe("lib/ folders", () => {
  const lib = path.join(repoRoot, "lib");
  const entries = fs.readdirSync(lib, { withFileTypes: true });

  test("at most four loose files directly under lib/, each a leaf that imports no project file", () => {
    const loose = files.filter(isLoose);
    expect(loose.length).toBeGreaterThan(0);
    expect(loose.length).toBeLessThanOrEqual(4);
    expect(loose.filter((f) => graph.get(f)!.length > 0)).toEqual([]);
  });

  test("every folder has an index.ts that opens with a comment saying what it is", () => {
    const folders = entries.filter((e) => e.isDirectory()).map((e) => e.name);
    expect(folders.length).toBeGreaterThanOrEqual(8);
    const missing = folders.filter((d) => {
      const index = path.join(lib, d, "index.ts");
      return !fs.existsSync(index) || !opensWithComment(fs.readFileSync(index, "utf8"));
    });
    expect(missing).toEqual([]);
  });
});
