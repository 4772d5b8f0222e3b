/**
 * First-load JavaScript per page, read from the build output of Next 16 (Turbopack):
 * - `server/app/<route>/page/build-manifest.json` → `rootMainFiles` (the runtime every page loads);
 * - `server/app/<route>/page_client-reference-manifest.js` → `entryJSFiles` (the chunks of the
 *   page, its layouts and their boundaries).
 * Lazily loaded chunks are found by following the chunk paths each chunk names, transitively.
 * Checked in chromium against the production server: every listed first-load chunk is requested on
 * the first visit (the browser then also prefetches linked routes, which this does not count).
 */
import fs from "node:fs";
import path from "node:path";
import vm from "node:vm";
import { gzipSync } from "node:zlib";
import { distDir } from "./server";

export interface PageBundle {
  /** Route key as Next writes it, e.g. "/(teacher)/pieces/page". */
  route: string;
  /** URL pattern, e.g. "/pieces". */
  url: string;
  firstLoad: string[];
  /** Every chunk the page can load: first load plus everything reachable from it. */
  reachable: string[];
}

function findManifests(dir: string): string[] {
  if (!fs.existsSync(dir)) return [];
  return fs.readdirSync(dir, { withFileTypes: true }).flatMap((e) => {
    const full = path.join(dir, e.name);
    if (e.isDirectory()) return findManifests(full);
    return e.name === "page_client-reference-manifest.js" ? [full] : [];
  });
}

const chunkText = new Map<string, string>();
function readChunk(rel: string): string {
  if (!chunkText.has(rel)) {
    const file = path.join(distDir(), rel);
    chunkText.set(rel, fs.existsSync(file) ? fs.readFileSync(file, "utf8") : "");
  }
  return chunkText.get(rel)!;
}

/** Chunk paths named inside a chunk (Turbopack refers to lazy chunks by their static path). */
function referencedChunks(rel: string): string[] {
  const names = readChunk(rel).match(/static\/chunks\/[\w.~-]+\.js/g) ?? [];
  return [...new Set(names)];
}

function closure(start: string[]): string[] {
  const seen = new Set<string>();
  const queue = [...start];
  while (queue.length) {
    const c = queue.pop()!;
    if (seen.has(c)) continue;
    seen.add(c);
    queue.push(...referencedChunks(c));
  }
  return [...seen].sort();
}

/** Every app page of the build with its first-load and reachable chunks. */
export function pageBundles(): PageBundle[] {
  const appDir = path.join(distDir(), "server/app");
  return findManifests(appDir).map((file) => {
    const ctx = vm.createContext({ self: {}, globalThis: {} });
    (ctx as { globalThis: unknown }).globalThis = ctx;
    vm.runInContext(fs.readFileSync(file, "utf8"), ctx);
    const manifests = (ctx as unknown as { __RSC_MANIFEST: Record<string, { entryJSFiles: Record<string, string[]> }> }).__RSC_MANIFEST;
    const [route, manifest] = Object.entries(manifests)[0]!;
    const buildManifest = path.join(path.dirname(file), "page", "build-manifest.json");
    const root = fs.existsSync(buildManifest) ? (JSON.parse(fs.readFileSync(buildManifest, "utf8")) as { rootMainFiles: string[] }).rootMainFiles : [];
    const firstLoad = [...new Set([...root, ...Object.values(manifest.entryJSFiles).flat()])].sort();
    const url = "/" + route.split("/").filter((s) => s && s !== "page" && !/^\(.+\)$/.test(s)).join("/");
    return { route, url, firstLoad, reachable: closure(firstLoad) };
  });
}

const gzipCache = new Map<string, number>();
/** Gzip size of a chunk (level 9, as a CDN would serve it). */
export function gzipBytes(rel: string): number {
  if (!gzipCache.has(rel)) gzipCache.set(rel, gzipSync(Buffer.from(readChunk(rel)), { level: 9 }).length);
  return gzipCache.get(rel)!;
}

/** Chunks whose code carries a library, found by strings only that library ships. */
export function chunksWith(signature: RegExp, among: readonly string[]): string[] {
  return among.filter((c) => signature.test(readChunk(c)));
}
