/**
 * The worker thread's entry for heavy jobs: pure cores only (lib/score, lib/drills, lib/knots'
 * generation, lib/handout), no Next, no db. Built to a standalone bundle by scripts/build-worker.mjs
 * (jsdom, pdfkit and the engraver stay in node_modules); lib/jobs/heavy.ts runs it in the pool.
 * Each worker keeps its own engraving and parsed-score caches.
 */
import type { HandoutInput } from "../handout/input";
import type { HandProfile } from "../drills/index";
import type { GenerateRequest } from "../knots/generate-request";
import { generateForPassage, knotDrillsJson, passageOf, type KnotSource } from "../knots/generate";
import { cachedScore, parsedScore } from "../knots/score-cache";
import { readScore } from "../score/read";
import { checkScoreBounds } from "../score/limits";

export type HeavyTask =
  | { kind: "handout"; input: HandoutInput }
  | {
      kind: "knot-drills";
      /** The piece's MusicXML; null when the caller believes this worker holds the piece parsed already. */
      musicxml: string | null;
      stamp: { id: string; updatedAt: Date };
      knot: Pick<KnotSource, "part" | "hand" | "fromBar" | "toBar">;
      req: GenerateRequest;
      profile?: HandProfile;
    }
  | { kind: "read-upload"; bytes: Uint8Array };

/** What reading an uploaded piece answers (as UTF-8 JSON): its cleaned copy and what the pieces list shows. */
export interface UploadRead {
  cleaned: string;
  /** No bars or no parts: nothing to store. */
  empty: boolean;
  title: string;
  composer: string;
  bars: number;
  parts: { id: string; name: string; staves: number }[];
  warnings: number;
}

/** A task's answer: its bytes, or the refusal it threw (error classes do not cross threads, so it is sent as data). */
export type HeavyResult = { ok: true; bytes: Uint8Array } | { ok: false; error: { name: string; message: string; code?: string; measure?: number; element?: string } };

const utf8 = new TextEncoder();

/** The refusal of a knot-drills task sent without MusicXML to a worker that does not hold the piece. */
export const SCORE_NOT_HELD = "ScoreNotHeld";

/** Runs one task in the worker thread and answers with its bytes or its refusal. */
export default async function runHeavyTask(task: HeavyTask): Promise<HeavyResult> {
  try {
    return { ok: true, bytes: await runTask(task) };
  } catch (err) {
    if (!(err instanceof Error)) throw err;
    const { code, measure, element } = err as Error & { code?: string; measure?: number; element?: string };
    return { ok: false, error: { name: err.name, message: err.message, code, measure, element } };
  }
}

async function runTask(task: HeavyTask): Promise<Uint8Array> {
  switch (task.kind) {
    case "handout": {
      // Loaded on first use: jsdom (under the engraver) replaces undici's global dispatcher, which breaks
      // fetch for other code running in-process (an in-process upload talking to UploadThing).
      const { renderHandoutPdf } = await import("../handout/render-handout-pdf");
      return renderHandoutPdf(task.input);
    }
    case "knot-drills": {
      const score = task.musicxml === null ? cachedScore(task.stamp) : parsedScore(task.musicxml, task.stamp);
      if (!score) throw Object.assign(new Error("This worker does not hold the piece; send its MusicXML."), { name: SCORE_NOT_HELD });
      const out = generateForPassage(passageOf(score, task.knot), task.req, task.profile);
      return utf8.encode(JSON.stringify(knotDrillsJson(out)));
    }
    case "read-upload": {
      const { score, warnings, cleaned } = readScore(task.bytes, { clean: true });
      const empty = score.measures.length === 0 || score.parts.length === 0;
      // Durations, onsets, divisions and tuplets within sane bounds (throws a ScoreError naming the bar).
      if (!empty) checkScoreBounds(score);
      const read: UploadRead = {
        cleaned: cleaned ?? "",
        empty,
        title: score.meta.title,
        composer: score.meta.composer,
        bars: score.measures.filter((m) => !m.implicit).length,
        parts: score.parts.map((p) => ({ id: p.id, name: p.name, staves: p.staves })),
        warnings: warnings.length,
      };
      return utf8.encode(JSON.stringify(read));
    }
    default:
      throw new Error(`Unknown heavy task ${(task as { kind: string }).kind}.`);
  }
}
