/**
 * Access control for every page and route handler found in app/ (see routes.ts): each is tried as
 * anonymous, as a student, as a student without the assignment, as a student of another studio and
 * as a teacher of another studio, with ids of the demo studio. A refusal is 401/403/404 or a redirect
 * to sign-in, and no refused body (nor any other studio's page) names anything of the demo studio.
 */
import { describe, expect, test } from "vitest";
import { cookies, ids, isRefusal, probe, rowCounts, type Persona } from "./context";
import { leakMarkers, leaksIn, PERSONA_LOGINS } from "./personas";
import { appRoutes, PUBLIC_ROUTES, queryFor, urlFor, type AppRoute } from "./routes";
import { DEMO_STUDENTS, DEMO_STUDIO, DEMO_TEACHER } from "../../lib/demo/seed";

const routes = appRoutes();
/** Invitation links: open to whoever holds the token, so probed separately below. */
const tokenRoutes = routes.filter((r) => r.params.length > 0 && r.params.every((p) => /token/i.test(p)));
const protectedRoutes = routes.filter((r) => !(r.pattern in PUBLIC_ROUTES) && !tokenRoutes.includes(r));
const markers = leakMarkers(ids);

/** Teacher-only route handlers outside the (teacher) group: everything that manages the studio's material. */
const TEACHER_API = /^\/api\/(pieces|knots|students|assignments|invitations|drills\/preview|sheets$)/;

function teacherOnly(route: AppRoute, method: string): boolean {
  if (route.group === "teacher") return true;
  if (route.group === "student") return false;
  return TEACHER_API.test(route.pattern) || (method !== "GET" && !/practice/.test(route.pattern));
}

/** Personas that must be refused outright on this route and method. */
function refused(route: AppRoute, method: string): Persona[] {
  const out: Persona[] = ["anonymous"];
  const hasIds = route.params.length > 0;
  if (hasIds) out.push("otherTeacher", "otherStudent", "demoOtherStudent");
  if (teacherOnly(route, method)) out.push("demoStudent", "demoOtherStudent");
  if (route.group === "student") out.push("demoTeacher");
  return [...new Set(out)];
}

/** What this persona may legitimately see: their own name and e-mail, and their own studio's name. */
function markersFor(persona: Persona): string[] {
  if (persona === "anonymous") return markers;
  const email = PERSONA_LOGINS[persona].email;
  const own = DEMO_STUDENTS.find((s) => s.email === email);
  const demoMember = persona.startsWith("demo");
  return markers.filter((m) => m !== email && m !== own?.name && !(demoMember && m === DEMO_STUDIO));
}

/** A JSON body naming demo ids under every field name a handler might read. */
const hostileBody = () =>
  JSON.stringify({
    id: ids.scoreId, pieceId: ids.scoreId, scoreId: ids.scoreId, knotId: ids.passageId, passageId: ids.passageId,
    sheetId: ids.sheetId, drillId: ids.sheetDrillId, assignmentId: ids.assignmentId, studentId: ids.studentMembershipId,
    membershipId: ids.studentMembershipId, studentMembershipIds: [ids.studentMembershipId], title: "intruder",
    request: { families: ["blocking"], options: {} }, families: ["blocking"], options: {},
    drills: ids.drillKeys.map((key) => ({ key, studentNote: "", tempo: { start: 60, target: 80 } })),
  });

describe("the route list", () => {
  test("is read from app/ and covers the known protected routes", () => {
    const patterns = routes.map((r) => r.pattern);
    // Routes present since the shell landed; the list grows by itself as routes are added.
    for (const p of ["/home", "/pieces", "/sheets", "/my", "/api/sheets"]) expect(patterns).toContain(p);
    expect(protectedRoutes.length).toBeGreaterThan(5);
    for (const r of protectedRoutes) expect(r.methods.length, r.file).toBeGreaterThan(0);
  });

  test("every dynamic segment maps to an id of the demo studio", () => {
    for (const r of protectedRoutes) expect(() => urlFor(r, ids), r.file).not.toThrow();
  });
});

describe.each(protectedRoutes.flatMap((r) => r.methods.filter((m) => m !== "HEAD").map((m) => [`${m} ${r.pattern}`, r, m] as const)))(
  "%s",
  (_name, route, method) => {
    const url = urlFor(route, ids) + queryFor(route, ids);
    const write = method !== "GET";
    const init = () => (write ? { body: hostileBody(), headers: { "content-type": "application/json" } } : {});

    test.each(refused(route, method))("refuses %s without leaking or writing", async (persona) => {
      const before = write ? await rowCounts() : null;
      const res = await probe(method, url, persona, init());
      expect(isRefusal(res), `${persona} got ${res.status} ${res.location ?? ""}`).toBe(true);
      expect(leaksIn(res.body, markersFor(persona)), `${persona} body`).toEqual([]);
      if (before) expect(await rowCounts()).toEqual(before);
    });

    test("members of another studio never see the demo studio's data", async () => {
      for (const persona of ["otherTeacher", "otherStudent"] as const) {
        const res = await probe(method, url, persona, init());
        expect(leaksIn(res.body, markersFor(persona)), `${persona} ${res.status}`).toEqual([]);
      }
    });

    if (method === "GET" && route.params.length > 0) {
      test("the owner is not refused (the ids point at real rows)", async () => {
        const owner: Persona = route.group === "student" ? "demoStudent" : "demoTeacher";
        expect(cookies[owner]).not.toBe("");
        const res = await probe("GET", url, owner);
        expect(res.status, `${owner} on ${url}`).toBeLessThan(400);
      });
    }
  },
);

describe.each(tokenRoutes.map((r) => [r.pattern, r] as const))("invitation link %s", (_name, route) => {
  const wrong = route.pattern.replace(/\[+(\.\.\.)?[^\]]+\]+/g, "not-a-real-token-0123456789abcdef");
  test("a wrong token shows nothing of the studio to anyone", async () => {
    for (const persona of ["anonymous", "otherTeacher", "otherStudent"] as const) {
      const res = await probe("GET", wrong, persona);
      expect(res.status, persona).toBeLessThan(500);
      expect(leaksIn(res.body, markersFor(persona)), persona).toEqual([]);
    }
  });

  test("the real token shows the studio's name at most, never its pieces, sheets or members", async () => {
    const res = await probe("GET", urlFor(route, ids), "anonymous");
    expect(res.status).toBe(200);
    const teacherName = DEMO_TEACHER.name; // the inviting teacher may be named on the invitation
    expect(leaksIn(res.body, markers.filter((m) => m !== DEMO_STUDIO && m !== teacherName))).toEqual([]);
  });
});
