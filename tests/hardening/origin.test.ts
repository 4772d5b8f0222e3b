/**
 * Origin checks on every request that can change data, on the production server: each state-changing
 * route handler (read from app/ at test time) and each server action (read from the build), called as
 * the demo teacher with a valid session cookie but a missing, "null" or foreign Origin, is refused with
 * 403 before it runs, and the demo studio's rows stay as they were. The same call with the server's own
 * origin is not refused by the check (control).
 * OWASP Cross-Site Request Forgery Prevention Cheat Sheet, "Verifying Origin With Standard Headers";
 * better-auth docs, "Security → CSRF protection" (a missing Origin refused, as better-auth does).
 */
import { describe, expect, test } from "vitest";
import { buildActions, callAction, pageUrl } from "./actions-http";
import { baseURL, cookies, ids, rowCounts, studioDigest } from "./context";
import { appRoutes, queryFor, urlFor } from "./routes";

const BAD_ORIGINS: [string, string | null][] = [
  ["no Origin", null],
  ['Origin "null"', "null"],
  ["a foreign Origin", "https://evil.example"],
  ["a look-alike Origin", `${baseURL}.evil.example`],
];

const mutating = appRoutes()
  .filter((r) => r.kind === "route" && !r.pattern.startsWith("/api/auth"))
  .flatMap((r) => r.methods.filter((m) => !["GET", "HEAD"].includes(m)).map((m) => [m, r] as const));

async function send(method: string, url: string, origin: string | null, body?: BodyInit, type?: string) {
  const headers: Record<string, string> = { cookie: cookies.demoTeacher };
  if (origin !== null) headers.origin = origin;
  if (type) headers["content-type"] = type;
  return fetch(new URL(url, baseURL), { method, headers, body, redirect: "manual" });
}

function bodyFor(pattern: string): [BodyInit | undefined, string | undefined] {
  if (pattern === "/api/pieces") {
    const form = new FormData();
    form.append("file", new File(["<score-partwise/>"], "x.musicxml", { type: "application/xml" }));
    form.set("confirm", "yes");
    return [form, undefined];
  }
  if (pattern === "/api/sheets") {
    return [JSON.stringify({ knotId: ids.passageId, title: "cross-site", request: { families: ["blocking"], options: {} }, drills: ids.drillKeys.slice(0, 1).map((key) => ({ key, studentNote: "", tempo: { start: 60, target: 80 } })) }), "application/json"];
  }
  return [JSON.stringify({ families: ["blocking"], options: {} }), "application/json"];
}

describe("state-changing route handlers", () => {
  test("the list has the known ones", () => {
    const names = mutating.map(([m, r]) => `${m} ${r.pattern}`);
    for (const known of ["POST /api/pieces", "POST /api/sheets", "DELETE /api/pieces/[pieceId]", "POST /api/knots/[knotId]/drills"]) expect(names).toContain(known);
  });

  test.each(mutating.flatMap(([method, route]) => BAD_ORIGINS.map(([label, origin]) => [`${method} ${route.pattern}`, label, method, route, origin] as const)))(
    "%s with %s → 403, nothing changed",
    async (_name, _label, method, route, origin) => {
      const [rows, digest] = [await rowCounts(), await studioDigest()];
      const [body, type] = bodyFor(route.pattern);
      const res = await send(method, urlFor(route, ids) + queryFor(route, ids), origin, body, type);
      expect(res.status).toBe(403);
      expect(((await res.json()) as { message: string }).message).toMatch(/Origin|another site/);
      expect(await rowCounts()).toEqual(rows);
      expect(await studioDigest()).toBe(digest);
    },
  );

  test("the same request with the server's own Origin passes the check (control)", async () => {
    const route = mutating.find(([m, r]) => m === "POST" && r.pattern === "/api/knots/[knotId]/drills")![1];
    const [body, type] = bodyFor(route.pattern);
    const res = await send("POST", urlFor(route, ids), baseURL, body, type);
    expect(res.status).toBe(200);
  });
});

describe("server actions", () => {
  const actions = buildActions();
  test("the build lists actions", () => expect(actions.length).toBeGreaterThan(3));

  test.each(actions.flatMap((a) => BAD_ORIGINS.map(([label, origin]) => [`${a.filename} ${a.exportedName}`, label, a, origin] as const)))(
    "%s with %s → 403, nothing changed",
    async (_name, _label, action, origin) => {
      const [rows, digest] = [await rowCounts(), await studioDigest()];
      const res = await callAction(action, pageUrl(action.page), "demoTeacher", [{ scoreId: ids.scoreId, from: 0, to: 1, hand: "right", tags: ["evenness"] }], origin);
      expect(res.status).toBe(403);
      expect(await rowCounts()).toEqual(rows);
      expect(await studioDigest()).toBe(digest);
    },
  );
});
