import { NextResponse } from "next/server";
import { db } from "@/db";
import { getStudioContext, type StudioContext } from "@/lib/auth/session";
import { storeFromEnv } from "@/lib/storage";
import type { UploadContext } from "./piece-upload";

/** The signed-in teacher's studio for a route handler, or the JSON error to send (401 / 403). */
export async function teacherContext(): Promise<{ ctx: StudioContext; upload: UploadContext } | NextResponse> {
  const ctx = await getStudioContext();
  if (!ctx) return NextResponse.json({ error: "Please sign in again." }, { status: 401 });
  if (ctx.role !== "teacher") return NextResponse.json({ error: "Only teachers manage pieces." }, { status: 403 });
  return { ctx, upload: { studioId: ctx.studioId, userId: ctx.user.id, db, store: storeFromEnv() } };
}
