/**
 * The generate handler's answers, reused: drills are deterministic for (knot, request, seed, hand
 * profile), so the JSON body is kept in a bounded LRU keyed by the knot and its piece with their
 * change stamps plus a stable hash of the validated request and the hand measurements. Editing the
 * knot or the piece changes the key, so nothing has to be invalidated by hand.
 */
import { createHash } from "node:crypto";
import type { HandProfile } from "../drills/index";
import type { GenerateRequest } from "./generate-request";
import type { KnotSource } from "./generate";
import { Lru } from "../lru";
import { heavyWork } from "../jobs/gate";
import { runHeavy } from "../jobs/heavy";
import { SCORE_NOT_HELD } from "../jobs/worker";

/** What the handler knows about a knot before reading its piece (db/queries/knot-drills getKnotStamp). */
export interface KnotStamp extends Pick<KnotSource, "part" | "hand" | "fromBar" | "toBar"> {
  id: string;
  scoreId: string;
  knotUpdatedAt: Date;
  scoreUpdatedAt: Date;
}

const MAX_BODIES = 256;
const MAX_BYTES = 32 * 1024 * 1024;
/** UTF-8 bytes, encoded once: the same answer is written many times. */
const bodies = new Lru<string, Uint8Array<ArrayBuffer>>({ maxEntries: MAX_BODIES, maxWeight: MAX_BYTES, weigh: (b) => b.byteLength });
const pending = new Map<string, Promise<Uint8Array<ArrayBuffer> | null>>();
/** Pieces (id@change) lately sent to the workers, which keep them parsed (lib/knots/score-cache.ts there). */
const piecesSent = new Lru<string, true>({ maxEntries: 8 });

/** JSON with object keys sorted at every level, so equal requests give equal text. */
export function stableJson(value: unknown): string {
  if (Array.isArray(value)) return `[${value.map(stableJson).join(",")}]`;
  if (value && typeof value === "object") {
    const entries = Object.entries(value as Record<string, unknown>).filter(([, v]) => v !== undefined);
    entries.sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
    return `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${stableJson(v)}`).join(",")}}`;
  }
  return JSON.stringify(value) ?? "null";
}

/** The cache key of one generate call. */
export function drillsCacheKey(knot: KnotStamp, req: GenerateRequest, profile?: HandProfile): string {
  const what = stableJson({
    knot: [knot.id, knot.knotUpdatedAt.getTime(), knot.part, knot.hand, knot.fromBar, knot.toBar],
    piece: [knot.scoreId, knot.scoreUpdatedAt.getTime()],
    families: req.families,
    options: req.options,
    seed: req.seed ?? 1,
    profile: profile ?? null,
  });
  return createHash("sha256").update(what).digest("base64url");
}

/**
 * The generate handler's JSON body (UTF-8) for the knot, from the cache or freshly generated in a worker. The
 * piece's MusicXML is loaded only when no worker holds it parsed; null when it is gone. Throws ScoreError
 * when the knot's bars cannot be read (nothing is cached then).
 */
export async function knotDrillsBody(
  knot: KnotStamp,
  req: GenerateRequest,
  profile: HandProfile | undefined,
  loadMusicXml: () => Promise<string | null>,
): Promise<Uint8Array<ArrayBuffer> | null> {
  const key = drillsCacheKey(knot, req, profile);
  const hit = bodies.get(key);
  if (hit !== undefined) return hit;
  const running = pending.get(key);
  if (running) return running;
  // Through the bounded queue of heavy work (lib/jobs/gate.ts): QueueFullError when it is full. The piece is
  // read and the drills generated in a worker thread (lib/jobs/heavy.ts), which keeps parsed pieces by stamp.
  const work = heavyWork.run(async () => {
    const stamp = { id: knot.scoreId, updatedAt: knot.scoreUpdatedAt };
    const part = { part: knot.part, hand: knot.hand, fromBar: knot.fromBar, toBar: knot.toBar };
    const task = (musicxml: string | null) => runHeavy({ kind: "knot-drills", musicxml, stamp, knot: part, req, profile });
    const sent = `${stamp.id}@${stamp.updatedAt.getTime()}`;
    let out: Uint8Array | undefined;
    // A piece sent lately is probably still parsed in a worker: ask without loading it, load it if not.
    if (piecesSent.get(sent)) {
      out = await task(null).catch((err: unknown) => {
        if ((err as Error).name === SCORE_NOT_HELD) return undefined;
        throw err;
      });
    }
    if (!out) {
      const musicxml = await loadMusicXml();
      if (musicxml === null) return null;
      out = await task(musicxml);
      piecesSent.set(sent, true);
    }
    const body = new Uint8Array(out.byteLength);
    body.set(out);
    bodies.set(key, body);
    return body;
  });
  pending.set(key, work);
  try {
    return await work;
  } finally {
    pending.delete(key);
  }
}

/** Empties the cache (tests). */
export function clearKnotDrillsCache(): void {
  bodies.clear();
}
