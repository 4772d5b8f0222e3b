import type { NextRequest } from "next/server";
import { db } from "@/db";
import { findMembershipForUser } from "@/db/queries/memberships";
import { auth } from "@/lib/auth";
import { homePathFor } from "@/lib/auth/session";

/** A same-origin redirect with a relative Location, so the host the browser used is kept. */
function goTo(pathname: string) {
  return new Response(null, { status: 307, headers: { location: pathname, "cache-control": "no-store" } });
}

/** After sign-in: send each member to the home page of their role. */
export async function GET(request: NextRequest) {
  const session = await auth.api.getSession({ headers: request.headers });
  if (!session) return goTo("/sign-in");
  const member = await findMembershipForUser(db, session.user.id, session.session.id);
  if (!member) return goTo("/");
  return goTo(homePathFor(member.role));
}
