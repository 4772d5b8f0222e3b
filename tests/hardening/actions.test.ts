/**
 * Server actions, driven over HTTP exactly as a browser calls them: POST to a page with the
 * `Next-Action` header and the arguments encoded by React's own `encodeReply`. The action list comes
 * from the build (server-reference-manifest.json: every exported function of every 'use server'
 * file), so a new action is covered without touching this file. Each one gets a payload that fits
 * every action's schema (zod drops unknown keys) and names demo-studio ids, in three argument shapes.
 * Refused callers get 401/403/404, a redirect to sign-in, or { ok: false } — and the demo studio's
 * rows stay exactly as they were.
 */
import { describe, expect, test } from "vitest";
import { OCTAVE_WIDTHS } from "../../lib/drills/hand";
import { buildActions, callAction, pageUrl, type ActionEntry } from "./actions-http";
import { ids, isRefusal, studioDigest, type Persona } from "./context";
import { leakMarkers, leaksIn } from "./personas";

const day = (offset: number) => new Date(Date.now() + offset * 86_400_000).toISOString().slice(0, 10);

/** One object that passes every action's input schema and points at demo-studio rows. */
function payload(): Record<string, unknown> {
  return {
    assignmentId: ids.assignmentId, practisedOn: day(0), minutes: 12, ease: 3, tempos: {}, comment: "intruder was here",
    sheetId: ids.sheetId, studentMembershipIds: [ids.studentMembershipId], dueDate: day(7), tempoGoals: {}, note: "intruder was here",
    email: "intruder@elsewhere.test", membershipId: ids.studentMembershipId, unit: "mm", span: 150, octave: OCTAVE_WIDTHS[0].id,
    pieceId: ids.scoreId, scoreId: ids.scoreId, knotId: ids.passageId, passageId: ids.passageId, id: ids.scoreId,
    part: "P1", hand: "right", fromBar: 1, toBar: 2, tags: ["evenness"], title: "intruder", drillId: ids.sheetDrillId,
    request: { families: ["blocking"], options: {} }, drills: ids.drillKeys.map((key) => ({ key, studentNote: "", tempo: { start: 60, target: 80 } })),
  };
}

function formOf(obj: Record<string, unknown>): FormData {
  const form = new FormData();
  for (const [k, v] of Object.entries(obj)) {
    if (Array.isArray(v) && v.every((x) => typeof x === "string")) for (const x of v) form.append(k, x);
    else form.set(k, typeof v === "string" ? v : JSON.stringify(v));
  }
  return form;
}

const SHAPES: [string, () => unknown[]][] = [
  ["(input)", () => [payload()]],
  ["(previous state, form)", () => [null, formOf(payload())]],
  ["(demo id, previous state, form)", () => [ids.scoreId, null, formOf(payload())]],
];

/** Actions anyone may call by design (sign-up, joining with an invitation token). */
const PUBLIC_ACTION_FILES = [/^app\/\(auth\)\//, /^app\/invite\//];
const actions = buildActions().filter((a) => !PUBLIC_ACTION_FILES.some((re) => re.test(a.filename)));

/**
 * Who may not run this action at all (anonymous callers and the wrong role), and who may run it
 * only inside their own studio (members of another studio, a student without the assignment):
 * for those, the demo studio's rows must stay untouched and nothing of it may show.
 */
function personasFor(a: ActionEntry): { persona: Persona; mustRefuse: boolean }[] {
  const out: { persona: Persona; mustRefuse: boolean }[] = [{ persona: "anonymous", mustRefuse: true }];
  if (a.filename.startsWith("app/(teacher)/")) out.push({ persona: "demoStudent", mustRefuse: true }, { persona: "demoOtherStudent", mustRefuse: true });
  else out.push({ persona: "demoOtherStudent", mustRefuse: false });
  if (a.filename.startsWith("app/(student)/")) out.push({ persona: "demoTeacher", mustRefuse: true });
  out.push({ persona: "otherTeacher", mustRefuse: false }, { persona: "otherStudent", mustRefuse: false });
  return out;
}

describe("server actions from the build", () => {
  test("the build lists the project's actions", () => {
    const names = buildActions().map((a) => a.exportedName);
    expect(names).toContain("signUpTeacher");
    expect(actions.length).toBeGreaterThan(0);
  });

  describe.each(actions.map((a) => [`${a.exportedName} (${a.filename})`, a] as const))("%s", (_n, action) => {
    test.each(personasFor(action).map((p) => [p.persona, p.mustRefuse] as const))("%s: no demo-studio write, nothing leaked (refused: %s)", async (persona, mustRefuse) => {
      const markers = leakMarkers(ids).filter((m) => !(persona.startsWith("demo") && m === "Hollowbrook Piano Studio"));
      for (const url of [pageUrl(action.page), "/"]) {
        for (const [shape, args] of SHAPES) {
          const before = await studioDigest();
          const res = await callAction(action, url, persona, args());
          const refused =
            isRefusal(res) ||
            (res.status >= 400 && res.status < 500) ||
            /"ok":false/.test(res.body) ||
            // No action result at all (Next answered without running it to completion for this caller).
            !res.contentType.includes("text/x-component") ||
            /"digest":"NEXT_HTTP_ERROR_FALLBACK;40[134]"/.test(res.body) ||
            /^\/sign-in\b/.test(res.headers.get("x-action-redirect") ?? "");
          if (mustRefuse) expect(refused, `${persona} ${shape} at ${url}: ${res.status} ${res.body.slice(-300)}`).toBe(true);
          expect(await studioDigest(), `${persona} ${shape} at ${url} changed the demo studio`).toBe(before);
          // The persona's own name may appear in a page they are allowed to see; demo data may not.
          const own = persona === "demoStudent" ? ["Tamsin Reyes", "tamsin@knotwork.test"] : persona === "demoOtherStudent" ? ["Jonah Lindqvist", "jonah@knotwork.test"] : [];
          expect(leaksIn(res.body, markers.filter((m) => !own.includes(m))), `${persona} ${shape} at ${url}`).toEqual([]);
        }
      }
    });
  });
});
