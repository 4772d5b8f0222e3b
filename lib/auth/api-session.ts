/**
 * Session checks for route handlers, answering with HTTP statuses instead of redirects:
 * 401 when signed out, 404 for anything outside the caller's studio or role.
 */
import { getStudioContext, type StudioContext } from "./session";

export function jsonError(status: number, message: string, problems?: string[]): Response {
  return Response.json({ message, ...(problems ? { problems } : {}) }, { status });
}

export const notFoundResponse = () => jsonError(404, "Not found.");

/** The signed-in member, or the response to send instead. */
export async function apiMember(): Promise<StudioContext | Response> {
  const ctx = await getStudioContext();
  return ctx ?? jsonError(401, "Sign in first.");
}

/** A teacher of the caller's studio (the handler's `requireTeacher`), or the response to send instead. */
export async function apiTeacher(): Promise<StudioContext | Response> {
  const ctx = await apiMember();
  if (ctx instanceof Response) return ctx;
  return ctx.role === "teacher" ? ctx : notFoundResponse();
}
