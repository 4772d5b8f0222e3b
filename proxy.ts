import { getSessionCookie } from "better-auth/cookies";
import { NextResponse, type NextRequest } from "next/server";

/**
 * Cookie presence only: anonymous visitors to member pages go to sign-in straight away.
 * The real session and role check happens in every page, action and route handler.
 */
export function proxy(request: NextRequest) {
  if (!getSessionCookie(request)) {
    const url = new URL("/sign-in", request.url);
    return NextResponse.redirect(url);
  }
  return NextResponse.next();
}

export const config = {
  matcher: [
    "/home/:path*",
    "/pieces/:path*",
    "/knots/:path*",
    "/sheets/:path*",
    "/students/:path*",
    "/assignments/:path*",
    "/progress/:path*",
    "/my/:path*",
  ],
};
