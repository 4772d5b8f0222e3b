import { NextResponse, type NextRequest } from "next/server";
import { db } from "@/db";
import { findMembershipForUser } from "@/db/queries/memberships";
import { auth } from "@/lib/auth";
import { homePathFor } from "@/lib/session";

/** After sign-in: send each member to the home page of their role. */
export async function GET(request: NextRequest) {
  const session = await auth.api.getSession({ headers: request.headers });
  if (!session) return NextResponse.redirect(new URL("/sign-in", request.url));
  const member = await findMembershipForUser(db, session.user.id);
  if (!member) return NextResponse.redirect(new URL("/", request.url));
  return NextResponse.redirect(new URL(homePathFor(member.role), request.url));
}
