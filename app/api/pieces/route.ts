import { NextResponse } from "next/server";
import { revalidatePath } from "next/cache";
import { db } from "@/db";
import { listScoresWithKnots } from "@/db/queries/scores";
import { BodyTooLargeError, readFormCapped } from "@/lib/limits/body";
import { acceptUpload, MAX_UPLOAD_BYTES } from "./piece-upload";
import { teacherContext } from "./teacher-context";

export const dynamic = "force-dynamic";

/** The studio's pieces for the pieces table. */
export async function GET() {
  const auth = await teacherContext();
  if (auth instanceof NextResponse) return auth;
  const rows = await listScoresWithKnots(db, auth.ctx.studioId);
  return NextResponse.json({ pieces: rows.map((r) => ({ ...r, createdAt: r.createdAt.toISOString() })) });
}

/** Upload of one piece (multipart: `file`, `confirm=yes`). */
export async function POST(request: Request) {
  const auth = await teacherContext();
  if (auth instanceof NextResponse) return auth;
  const type = request.headers.get("content-type") ?? "";
  if (!type.toLowerCase().startsWith("multipart/form-data")) {
    return NextResponse.json({ error: "Send the piece as a form upload (multipart/form-data).", field: "file" }, { status: 415 });
  }
  let form: FormData;
  try {
    // Read at most the cap (plus room for the form's own parts), chunked bodies included.
    form = await readFormCapped(request, MAX_UPLOAD_BYTES + 64 * 1024);
  } catch (err) {
    if (err instanceof BodyTooLargeError) {
      // Connection: close, so the server stops reading the rest of an oversize body once it has answered.
      return NextResponse.json({ error: "The file is larger than 5 MB.", field: "file" }, { status: 413, headers: { connection: "close" } });
    }
    return NextResponse.json({ error: "The upload was cut off or malformed; please try again.", field: "file" }, { status: 400 });
  }
  const outcome = await acceptUpload(form, auth.upload);
  if (outcome.status === 201) {
    revalidatePath("/pieces");
    revalidatePath("/home");
  }
  return NextResponse.json(outcome.body, { status: outcome.status, headers: outcome.headers });
}
