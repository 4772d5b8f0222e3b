import { notFound } from "next/navigation";
import { db } from "@/db";
import { getScore } from "@/db/queries/scores";
import { requireTeacher } from "@/lib/auth/session";

/**
 * Checks that the piece belongs to the teacher's studio before the page's loading skeleton streams,
 * so an id from another studio answers with a real 404 status (a notFound() after streaming has
 * started can only show the not-found view under a 200).
 */
export default async function PieceLayout({ children, params }: { children: React.ReactNode; params: Promise<{ pieceId: string }> }) {
  const ctx = await requireTeacher();
  if (!(await getScore(db, ctx.studioId, (await params).pieceId))) notFound();
  return children;
}
