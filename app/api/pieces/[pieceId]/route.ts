import { NextResponse } from "next/server";
import { revalidatePath } from "next/cache";
import { db } from "@/db";
import { getScore } from "@/db/queries/scores";
import { removePiece } from "../piece-upload";
import { teacherContext } from "../teacher-context";

export const dynamic = "force-dynamic";

/** The cleaned MusicXML of one piece of the studio (the only copy a browser ever gets). */
export async function GET(_request: Request, { params }: { params: Promise<{ pieceId: string }> }) {
  const auth = await teacherContext();
  if (auth instanceof NextResponse) return auth;
  const { pieceId } = await params;
  const row = await getScore(db, auth.ctx.studioId, pieceId);
  if (!row) return NextResponse.json({ error: "No such piece in your studio." }, { status: 404 });
  return new NextResponse(row.musicxml, {
    headers: {
      "content-type": "application/vnd.recordare.musicxml+xml; charset=utf-8",
      "x-content-type-options": "nosniff",
      "cache-control": "private, no-store",
    },
  });
}

/** Deletes a piece with its knots and its stored file. */
export async function DELETE(_request: Request, { params }: { params: Promise<{ pieceId: string }> }) {
  const auth = await teacherContext();
  if (auth instanceof NextResponse) return auth;
  const { pieceId } = await params;
  const res = await removePiece(auth.upload, pieceId);
  if (res.status === 404) return NextResponse.json({ error: "No such piece in your studio." }, { status: 404 });
  revalidatePath("/pieces");
  revalidatePath("/knots");
  revalidatePath("/home");
  return NextResponse.json({ ok: true });
}
