/**
 * The project's own import graph, read with the TypeScript compiler's pre-processor (static imports,
 * `export … from`, `import type`, dynamic `import("…")` and `require`). Relative and `@/` specifiers
 * are resolved to files the way the bundler does (`.ts`, `.tsx`, a folder's `index.ts`); package
 * imports are kept by name. Used by layers.test.ts.
 */
import fs from "node:fs";
import path from "node:path";
import ts from "typescript";

export interface ModuleImports {
  /** Repository-relative paths (forward slashes) of the project files this file imports. */
  files: string[];
  /** Bare package specifiers (`react`, `next/headers`, `node:fs`). */
  packages: string[];
}

/** Every .ts / .tsx file under the given top-level folders, repository-relative. */
export function sourceFilesUnder(repoRoot: string, dirs: readonly string[]): string[] {
  const walk = (rel: string): string[] =>
    fs.readdirSync(path.join(repoRoot, rel), { withFileTypes: true }).flatMap((e) => {
      const child = `${rel}/${e.name}`;
      if (e.isDirectory()) return e.name === "node_modules" ? [] : walk(child);
      return /\.tsx?$/.test(e.name) ? [child] : [];
    });
  return dirs.filter((d) => fs.existsSync(path.join(repoRoot, d))).flatMap(walk);
}

const CANDIDATES = ["", ".ts", ".tsx", ".d.ts", "/index.ts", "/index.tsx"];

/** The project file a specifier points at, or null for a package or a non-TypeScript asset. */
export function resolveSpecifier(repoRoot: string, fromFile: string, spec: string): string | null {
  let base: string;
  if (spec.startsWith("@/")) base = path.join(repoRoot, spec.slice(2));
  else if (spec.startsWith(".")) base = path.resolve(repoRoot, path.dirname(fromFile), spec);
  else return null;
  for (const ext of CANDIDATES) {
    const full = base + ext;
    if (/\.tsx?$/.test(full) && fs.existsSync(full) && fs.statSync(full).isFile()) {
      return path.relative(repoRoot, full).split(path.sep).join("/");
    }
  }
  return null;
}

/** What one file imports. */
export function importsOf(repoRoot: string, file: string): ModuleImports {
  const text = fs.readFileSync(path.join(repoRoot, file), "utf8");
  const info = ts.preProcessFile(text, true, true);
  const files: string[] = [];
  const packages: string[] = [];
  for (const { fileName: spec } of info.importedFiles) {
    if (spec.startsWith(".") || spec.startsWith("@/")) {
      const target = resolveSpecifier(repoRoot, file, spec);
      if (target) files.push(target);
    } else packages.push(spec);
  }
  return { files: [...new Set(files)], packages: [...new Set(packages)] };
}

/** The import graph of the given files: file → project files it imports (within the same set). */
export function importGraph(repoRoot: string, files: readonly string[]): Map<string, string[]> {
  const inSet = new Set(files);
  return new Map(files.map((f) => [f, importsOf(repoRoot, f).files.filter((t) => inSet.has(t))]));
}

/**
 * The import circles of a graph: its strongly connected components with more than one file, or a
 * file that imports itself (Tarjan's algorithm), each sorted by path.
 *
 * @example
 * importCircles(new Map([["a", ["b"]], ["b", ["a"]], ["c", ["a"]]])); // [["a", "b"]]
 */
export function importCircles(graph: ReadonlyMap<string, readonly string[]>): string[][] {
  let next = 0;
  const index = new Map<string, number>();
  const low = new Map<string, number>();
  const stack: string[] = [];
  const onStack = new Set<string>();
  const circles: string[][] = [];
  const visit = (v: string) => {
    index.set(v, next);
    low.set(v, next++);
    stack.push(v);
    onStack.add(v);
    for (const w of graph.get(v) ?? []) {
      if (!index.has(w)) {
        visit(w);
        low.set(v, Math.min(low.get(v)!, low.get(w)!));
      } else if (onStack.has(w)) low.set(v, Math.min(low.get(v)!, index.get(w)!));
    }
    if (low.get(v) === index.get(v)) {
      const component: string[] = [];
      let w: string;
      do {
        w = stack.pop()!;
        onStack.delete(w);
        component.push(w);
      } while (w !== v);
      if (component.length > 1 || (graph.get(v) ?? []).includes(v)) circles.push(component.sort());
    }
  };
  for (const v of graph.keys()) if (!index.has(v)) visit(v);
  return circles;
}

/** True when the file's text starts with a comment (nothing but white space before it). */
export function opensWithComment(text: string): boolean {
  const ranges = ts.getLeadingCommentRanges(text, 0) ?? [];
  return ranges.length > 0 && text.slice(0, ranges[0].pos).trim() === "";
}
