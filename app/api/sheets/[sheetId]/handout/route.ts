import { db } from "@/db";
import { apiMember, jsonError, notFoundResponse } from "@/lib/auth/api-session";
import { PAPER_SIZES, type Paper } from "@/lib/handout";
import { canReadSheet } from "@/lib/sheets/access";
import { busyResponse, QueueFullError } from "@/lib/jobs/gate";
import { handoutPdf } from "@/lib/jobs/render-cache";
import { JobLimitError, limitResponse } from "@/lib/jobs/pool";
import { handoutFileName, loadHandoutInput } from "./handout-data";

export const dynamic = "force-dynamic";
export const runtime = "nodejs";

/**
 * GET → the sheet's handout as a PDF. `?paper=a4|letter` (default A4), `?assignment=<id>` lets a
 * teacher print a student's copy with their tempo goals. Teachers of the studio and students with
 * the sheet assigned only; anyone else gets 404.
 */
export async function GET(request: Request, { params }: { params: Promise<{ sheetId: string }> }) {
  const ctx = await apiMember();
  if (ctx instanceof Response) return ctx;
  const { sheetId } = await params;
  if (!(await canReadSheet(ctx, sheetId))) return notFoundResponse();
  const url = new URL(request.url);
  const asked = url.searchParams.get("paper") ?? "a4";
  if (!(PAPER_SIZES as readonly string[]).includes(asked)) return jsonError(400, "Paper must be a4 or letter.");
  const paper = asked as Paper;
  const input = await loadHandoutInput(db, ctx, sheetId, paper, url.searchParams.get("assignment"));
  if (!input) return notFoundResponse();
  // Kept by content: the same sheet, paper, names and goals are rendered once (lib/jobs/render-cache.ts).
  let pdf: Uint8Array;
  try {
    pdf = await handoutPdf(input);
  } catch (err) {
    if (err instanceof QueueFullError) return busyResponse(err);
    if (err instanceof JobLimitError) return limitResponse(err);
    throw err;
  }
  const download = url.searchParams.get("download") === "1";
  return new Response(Buffer.from(pdf), {
    headers: {
      "Content-Type": "application/pdf",
      "Content-Disposition": `${download ? "attachment" : "inline"}; filename="${handoutFileName(input.sheetTitle, paper)}"`,
      "Cache-Control": "private, no-store",
    },
  });
}
