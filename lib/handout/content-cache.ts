/**
 * Results of CPU-heavy work (handout PDFs, engraved drills) kept by the content they were made from:
 * the key is a SHA-256 of the input's stable JSON, so the same sheet, paper, names and goals give the
 * same bytes and a second request costs a hash and a look-up. Bounded LRUs per process (caches may
 * stay per process; nothing has to be invalidated: a changed input is a new key). Concurrent requests
 * for the same key share one run.
 */
import { createHash } from "node:crypto";
import { Lru } from "../lru";

/** JSON with object keys sorted at every level, so equal inputs give equal text. */
export function stableJson(value: unknown): string {
  if (Array.isArray(value)) return `[${value.map(stableJson).join(",")}]`;
  if (value instanceof Date) return JSON.stringify(value.toISOString());
  if (value && typeof value === "object") {
    const entries = Object.entries(value as Record<string, unknown>).filter(([, v]) => v !== undefined);
    entries.sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
    return `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${stableJson(v)}`).join(",")}}`;
  }
  return JSON.stringify(value) ?? "null";
}

/** The content key of an input. */
export function contentKey(kind: string, input: unknown): string {
  return `${kind}:${createHash("sha256").update(stableJson(input)).digest("base64url")}`;
}

/** A content-keyed cache of `make(input)`; values weigh what `weigh` says (bytes). */
export function contentCache<I, V>(kind: string, make: (input: I) => Promise<V>, opts: { maxEntries: number; maxBytes: number; weigh: (v: V) => number }) {
  const done = new Lru<string, V>({ maxEntries: opts.maxEntries, maxWeight: opts.maxBytes, weigh: opts.weigh });
  const running = new Map<string, Promise<V>>();
  let hits = 0;
  let misses = 0;
  return {
    async get(input: I): Promise<V> {
      const key = contentKey(kind, input);
      const hit = done.get(key);
      if (hit !== undefined) {
        hits++;
        return hit;
      }
      const pending = running.get(key);
      if (pending) {
        hits++;
        return pending;
      }
      misses++;
      const work = make(input).then(
        (value) => {
          done.set(key, value);
          running.delete(key);
          return value;
        },
        (err: unknown) => {
          running.delete(key);
          throw err;
        },
      );
      running.set(key, work);
      return work;
    },
    stats: () => ({ hits, misses, entries: done.size, bytes: done.weight }),
    clear: () => done.clear(),
  };
}
