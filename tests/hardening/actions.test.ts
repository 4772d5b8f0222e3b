/**
 * Server actions, driven over HTTP exactly as a browser calls them: POST to a page with the
 * `Next-Action` header and the arguments encoded by React's own `encodeReply`. The action list comes
 * from the build (server-reference-manifest.json: every exported function of every 'use server'
 * file), so a new action is covered without touching this file. Each one gets a payload that fits
 * every action's schema (zod drops unknown keys) and names demo-studio ids, in three argument shapes.
 * Refused callers get 401/403/404, a redirect to sign-in, or { ok: false } — and the demo studio's
 * rows stay exactly as they were.
 */
import fs from "node:fs";
import path from "node:path";
import { createRequire } from "node:module";
import { describe, expect, test } from "vitest";
import { OCTAVE_WIDTHS } from "../../lib/drills/hand";
import { baseURL, cookies, ids, isRefusal, studioDigest, type Persona } from "./context";
import { leakMarkers, leaksIn } from "./personas";
import { distDir } from "./server";
import { urlFor, type AppRoute } from "./routes";

const { encodeReply } = createRequire(__filename)("next/dist/compiled/react-server-dom-turbopack/client.node") as {
  encodeReply: (value: unknown) => Promise<string | FormData>;
};

interface ActionEntry {
  id: string;
  filename: string;
  exportedName: string;
  page: string;
}

/** Every server action of the build with one page that serves it. */
function buildActions(): ActionEntry[] {
  const manifest = JSON.parse(fs.readFileSync(path.join(distDir(), "server/server-reference-manifest.json"), "utf8")) as {
    node: Record<string, { workers: Record<string, unknown>; filename: string; exportedName: string }>;
  };
  return Object.entries(manifest.node).map(([id, a]) => ({ id, filename: a.filename, exportedName: a.exportedName, page: Object.keys(a.workers)[0] }));
}

/** "app/(teacher)/pieces/[pieceId]/page" → the page's URL with demo ids. */
function pageUrl(worker: string): string {
  const segments = worker.replace(/^app\//, "").replace(/\/page$/, "").split("/").filter((s) => s && s !== "page");
  const params = segments.filter((s) => s.startsWith("[")).map((s) => s.replace(/^\[+(\.\.\.)?|\]+$/g, ""));
  const route: AppRoute = { file: worker, kind: "page", pattern: "/" + segments.filter((s) => !/^\(.+\)$/.test(s)).join("/"), group: null, params, methods: ["POST"] };
  return urlFor(route, ids);
}

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

async function callAction(action: ActionEntry, url: string, persona: Persona, args: unknown[]) {
  const body = await encodeReply(args);
  const headers: Record<string, string> = { "next-action": action.id, origin: baseURL, accept: "text/x-component" };
  if (typeof body === "string") headers["content-type"] = "text/plain;charset=UTF-8";
  if (cookies[persona]) headers.cookie = cookies[persona];
  const res = await fetch(new URL(url, baseURL), { method: "POST", headers, body, redirect: "manual" });
  return { status: res.status, location: res.headers.get("location"), contentType: res.headers.get("content-type") ?? "", body: await res.text(), headers: res.headers };
}

/** Actions anyone may call by design (sign-up, joining with an invitation token). */
const PUBLIC_ACTION_FILES = [/^app\/\(auth\)\//, /^app\/invite\//];
const actions = buildActions().filter((a) => !PUBLIC_ACTION_FILES.some((re) => re.test(a.filename)));

function refusedFor(a: ActionEntry): Persona[] {
  const base: Persona[] = ["anonymous", "otherTeacher", "otherStudent", "demoOtherStudent"];
  if (a.filename.startsWith("app/(teacher)/")) base.push("demoStudent");
  if (a.filename.startsWith("app/(student)/")) base.push("demoTeacher");
  return base;
}

describe("server actions from the build", () => {
  test("the build lists the project's actions", () => {
    const names = buildActions().map((a) => a.exportedName);
    expect(names).toContain("signUpTeacher");
    expect(actions.length).toBeGreaterThan(0);
  });

  describe.each(actions.map((a) => [`${a.exportedName} (${a.filename})`, a] as const))("%s", (_n, action) => {
    test.each(refusedFor(action))("refuses %s: no demo-studio write, nothing leaked", async (persona) => {
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
          expect(refused, `${persona} ${shape} at ${url}: ${res.status} ${res.body.slice(-300)}`).toBe(true);
          expect(await studioDigest(), `${persona} ${shape} at ${url} changed the demo studio`).toBe(before);
          // The persona's own name may appear in a page they are allowed to see; demo data may not.
          const own = persona === "demoStudent" ? ["Tamsin Reyes", "tamsin@knotwork.test"] : persona === "demoOtherStudent" ? ["Jonah Lindqvist", "jonah@knotwork.test"] : [];
          expect(leaksIn(res.body, markers.filter((m) => !own.includes(m))), `${persona} ${shape} at ${url}`).toEqual([]);
        }
      }
    });
  });
});
