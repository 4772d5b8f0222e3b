/**
 * The worker thread's entry for heavy jobs: pure cores only (lib/score, lib/drills, lib/knots'
 * generation, lib/handout), no Next, no db. Built to a standalone bundle by scripts/build-worker.mjs
 * (jsdom, pdfkit and the engraver stay in node_modules); lib/jobs/heavy.ts runs it in the pool.
 * Each worker keeps its own engraving and parsed-score caches.
 */
import { renderHandoutPdf } from "../handout/render-handout-pdf";
import type { HandoutInput } from "../handout/input";
import type { HandProfile } from "../drills/index";
import type { GenerateRequest } from "../knots/generate-request";
import { generateForPassage, knotDrillsJson, passageOf, type KnotSource } from "../knots/generate";
import { parsedScore } from "../knots/score-cache";

export type HeavyTask =
  | { kind: "handout"; input: HandoutInput }
  | {
      kind: "knot-drills";
      musicxml: string;
      stamp: { id: string; updatedAt: Date };
      knot: Pick<KnotSource, "part" | "hand" | "fromBar" | "toBar">;
      req: GenerateRequest;
      profile?: HandProfile;
    };

/** A task's answer: its bytes, or the refusal it threw (error classes do not cross threads, so it is sent as data). */
export type HeavyResult = { ok: true; bytes: Uint8Array } | { ok: false; error: { name: string; message: string; code?: string; measure?: number; element?: string } };

const utf8 = new TextEncoder();

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
    case "handout":
      return renderHandoutPdf(task.input);
    case "knot-drills": {
      const score = parsedScore(task.musicxml, task.stamp);
      const out = generateForPassage(passageOf(score, task.knot), task.req, task.profile);
      return utf8.encode(JSON.stringify(knotDrillsJson(out)));
    }
    default:
      throw new Error(`Unknown heavy task ${(task as { kind: string }).kind}.`);
  }
}
