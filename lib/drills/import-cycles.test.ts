/**
 * lib/drills has no import circle: every module's relative imports (type-only ones included), read
 * with TypeScript's own `preProcessFile`, form a graph without a cycle. A circle makes module
 * initialisation order depend on which file is imported first.
 */
import fs from "node:fs";
import path from "node:path";
import ts from "typescript";
import { describe, expect, test } from "vitest";

const ROOT = __dirname;

function modules(dir: string): string[] {
  return fs.readdirSync(dir, { withFileTypes: true }).flatMap((d) => {
    const p = path.join(dir, d.name);
    if (d.isDirectory()) return modules(p);
    return d.name.endsWith(".ts") && !d.name.endsWith(".test.ts") ? [p] : [];
  });
}

/** Relative imports of one file that stay inside lib/drills, as absolute paths. */
function importsOf(file: string): string[] {
  const info = ts.preProcessFile(fs.readFileSync(file, "utf8"), true, true);
  return info.importedFiles
    .map((f) => f.fileName)
    .filter((name) => name.startsWith("."))
    .map((name) => path.resolve(path.dirname(file), name))
    .map((p) => (fs.existsSync(`${p}.ts`) ? `${p}.ts` : path.join(p, "index.ts")))
    .filter((p) => p.startsWith(ROOT + path.sep) && fs.existsSync(p));
}

/** One cycle as a list of files (first = last), or null. Depth-first search with three colours. */
function findCycle(graph: ReadonlyMap<string, readonly string[]>): string[] | null {
  const state = new Map<string, 1 | 2>();
  const stack: string[] = [];
  const visit = (u: string): string[] | null => {
    state.set(u, 1);
    stack.push(u);
    for (const v of graph.get(u) ?? []) {
      if (state.get(v) === 1) return [...stack.slice(stack.indexOf(v)), v];
      if (!state.has(v)) {
        const found = visit(v);
        if (found) return found;
      }
    }
    stack.pop();
    state.set(u, 2);
    return null;
  };
  for (const u of graph.keys()) {
    if (state.has(u)) continue;
    const found = visit(u);
    if (found) return found;
  }
  return null;
}

describe("lib/drills import graph", () => {
  const graph = new Map(modules(ROOT).map((f) => [f, importsOf(f)] as const));

  test("the graph is read: types.ts imports nothing from lib/drills, span.ts imports fingering.ts", () => {
    expect(graph.get(path.join(ROOT, "types.ts"))).toEqual([]);
    expect(graph.get(path.join(ROOT, "span.ts"))).toContain(path.join(ROOT, "fingering.ts"));
  });

  test("the cycle finder finds a planted circle", () => {
    expect(findCycle(new Map([["a", ["b"]], ["b", ["c"]], ["c", ["a"]]]))).toEqual(["a", "b", "c", "a"]);
    expect(findCycle(new Map([["a", ["b"]], ["b", []]]))).toBeNull();
  });

  test("no module of lib/drills imports itself back through others", () => {
    const cycle = findCycle(graph);
    expect(cycle?.map((f) => path.relative(ROOT, f)).join(" → ") ?? null).toBeNull();
  });
});
