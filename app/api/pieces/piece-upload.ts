/**
 * The upload of a piece: checks the form fields, reads the file by its content with lib/score,
 * stores only the cleaned copy, and writes the file and the row as one unit.
 */
import type { Db } from "@/db";
import { deleteScore, insertScore } from "@/db/queries/scores";
import type { FileStore } from "@/lib/storage";
import { isScoreError } from "@/lib/score";
import { heavyWork, QueueFullError } from "@/lib/jobs/gate";
import { runHeavy } from "@/lib/jobs/heavy";
import { JobLimitError } from "@/lib/jobs/pool";
import type { UploadRead } from "@/lib/jobs/worker";

/** The size cap shown on the form and enforced here. */
export const MAX_UPLOAD_BYTES = 5 * 1024 * 1024;
export const MAX_UPLOAD_LABEL = "5 MB";
export const ACCEPTED_EXTENSIONS = [".musicxml", ".xml", ".mxl"] as const;
/** Types browsers send for MusicXML, XML and zip files ("" when the browser does not know). */
const ACCEPTED_TYPES = new Set([
  "",
  "application/octet-stream",
  "application/xml",
  "text/xml",
  "text/plain",
  "application/vnd.recordare.musicxml+xml",
  "application/vnd.recordare.musicxml",
  "application/zip",
  "application/x-zip-compressed",
]);
const RISKY_INNER = /\.(exe|bat|cmd|com|sh|js|mjs|php|phtml|html?|svg|jar|dll|msi|scr|ps1|py)\./i;

export interface UploadOutcome {
  status: number;
  body: { id: string; title: string; bars: number; warnings: number } | { error: string; field?: "file" | "confirm" };
  /** Extra answer headers (Retry-After on a busy 503). */
  headers?: Record<string, string>;
}

export interface UploadContext {
  studioId: string;
  userId: string;
  db: Db;
  store: FileStore;
}

const refuse = (status: number, error: string, field: "file" | "confirm" = "file"): UploadOutcome => ({
  status,
  body: { error, field },
});

/** Checks a file's name, type and size before reading it; null when it may be read. */
export function checkUploadFile(file: { name: string; type: string; size: number }): UploadOutcome | null {
  const name = file.name ?? "";
  if (!name.trim()) return refuse(400, "The file has no name. Choose a .musicxml, .xml or .mxl file.");
  if (/[\\/]|\.\./.test(name) || /[\u0000-\u001f]/.test(name)) {
    return refuse(400, `The file name "${name}" contains a folder path. Rename the file and try again.`);
  }
  const lower = name.toLowerCase();
  if (!ACCEPTED_EXTENSIONS.some((ext) => lower.endsWith(ext))) {
    return refuse(415, `"${name}" is not a MusicXML file. Knotwork reads .musicxml, .xml and .mxl files.`);
  }
  if (RISKY_INNER.test(lower)) return refuse(415, `"${name}" has a second file type hidden in its name. Rename it to end in .musicxml.`);
  const type = (file.type ?? "").split(";")[0]!.trim().toLowerCase();
  if (!ACCEPTED_TYPES.has(type)) return refuse(415, `"${name}" was sent as ${type}, not as MusicXML.`);
  if (file.size === 0) return refuse(400, `"${name}" is empty.`);
  if (file.size > MAX_UPLOAD_BYTES) {
    const mb = (file.size / 1024 / 1024).toFixed(1);
    return refuse(413, `"${name}" is ${mb} MB; pieces can be up to ${MAX_UPLOAD_LABEL}.`);
  }
  return null;
}

function titleFromName(name: string): string {
  return name.replace(/\.(musicxml|xml|mxl)$/i, "").replace(/[_-]+/g, " ").trim() || "Untitled piece";
}

/** Handles one multipart upload; nothing is stored unless every step succeeds. */
export async function acceptUpload(form: FormData, ctx: UploadContext): Promise<UploadOutcome> {
  const files = form.getAll("file");
  if (files.length === 0 || !(files[0] instanceof Blob)) return refuse(400, "Choose a MusicXML file to upload.");
  if (files.length > 1) return refuse(400, "Upload one piece at a time.");
  const confirm = form.get("confirm");
  if (confirm !== "yes" && confirm !== "on") {
    return refuse(400, "Please confirm that the piece is in the public domain or your own work.", "confirm");
  }
  const file = files[0] as File;
  const bad = checkUploadFile(file);
  if (bad) return bad;
  const bytes = new Uint8Array(await file.arrayBuffer());
  if (bytes.byteLength > MAX_UPLOAD_BYTES) return refuse(413, `The file is larger than ${MAX_UPLOAD_LABEL}.`);

  let cleaned: string;
  let summary: { title: string; composer: string | null; bars: number; parts: { id: string; name: string; staves: number }[]; warnings: number };
  try {
    // Read in the worker pool, through the bounded queue of heavy work (lib/jobs/heavy.ts, lib/jobs/gate.ts).
    const out = await heavyWork.run(() => runHeavy({ kind: "read-upload", bytes }));
    const read = JSON.parse(new TextDecoder().decode(out)) as UploadRead;
    if (read.empty) return refuse(422, `"${file.name}" has no bars of music.`);
    cleaned = read.cleaned;
    summary = {
      title: read.title.trim() || titleFromName(file.name),
      composer: read.composer.trim() || null,
      bars: read.bars,
      parts: read.parts,
      warnings: read.warnings,
    };
  } catch (e) {
    if (e instanceof QueueFullError) return { ...refuse(503, e.message), headers: { "Retry-After": String(e.retryAfterSeconds) } };
    if (e instanceof JobLimitError) return { ...refuse(503, `"${file.name}" could not be read: ${e.message}`), headers: { "Retry-After": "30" } };
    if (isScoreError(e)) return refuse(422, `"${file.name}" could not be read: ${e.message}.`);
    return refuse(422, `"${file.name}" could not be read as MusicXML.`);
  }

  const storedName = `${titleFromName(file.name)}.musicxml`;
  const key = await ctx.store.putFile(storedName, new TextEncoder().encode(cleaned), "application/vnd.recordare.musicxml+xml");
  try {
    const id = await insertScore(ctx.db, {
      studioId: ctx.studioId,
      uploadedBy: ctx.userId,
      title: summary.title,
      composer: summary.composer,
      bars: summary.bars,
      parts: summary.parts,
      musicxml: cleaned,
      storageKey: key,
      originalName: file.name.slice(0, 200),
    });
    return { status: 201, body: { id, title: summary.title, bars: summary.bars, warnings: summary.warnings } };
  } catch (e) {
    await ctx.store.deleteFile(key).catch(() => undefined);
    throw e;
  }
}

/** Deletes a piece's row (knots cascade) and then its stored file; 404 when not this studio's. */
export async function removePiece(ctx: UploadContext, scoreId: string): Promise<{ status: number }> {
  const row = await deleteScore(ctx.db, ctx.studioId, scoreId);
  if (!row) return { status: 404 };
  if (row.storageKey && !row.storageKey.startsWith("demo/")) await ctx.store.deleteFile(row.storageKey).catch(() => undefined);
  return { status: 200 };
}
