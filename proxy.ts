import { getSessionCookie } from "better-auth/cookies";
import { NextResponse, type NextRequest } from "next/server";
import { originProblem, ownOrigins } from "./lib/security/origin";

/** Member page folders: anonymous visitors go to sign-in straight away (cookie presence only). */
export const MEMBER_PAGES = ["home", "pieces", "knots", "sheets", "students", "assignments", "progress", "my"] as const;
const MEMBER_PAGE = new RegExp(`^/(${MEMBER_PAGES.join("|")})(/|$)`);

const allowedOrigins = ownOrigins(process.env.BETTER_AUTH_URL || "http://localhost:3000");

/**
 * Two early checks, before any page, route handler or server action runs:
 * - every request that can change data (not GET/HEAD/OPTIONS) must carry one of Knotwork's own
 *   origins in its Origin header (lib/security/origin.ts); missing or foreign → 403;
 * - anonymous visitors to member pages go to sign-in. The real session and role check happens in
 *   every page, action and route handler.
 */
export function proxy(request: NextRequest) {
  const problem = originProblem(request.method, request.headers.get("origin"), allowedOrigins);
  if (problem) return NextResponse.json({ message: problem }, { status: 403 });
  if (MEMBER_PAGE.test(request.nextUrl.pathname) && !getSessionCookie(request)) {
    return NextResponse.redirect(new URL("/sign-in", request.url));
  }
  return NextResponse.next();
}

export const config = {
  // Everything but build assets and static files: server actions can post to any page.
  matcher: ["/((?!_next/static|_next/image|fonts/|samples/|favicon\\.svg|icon\\.svg).*)"],
};
