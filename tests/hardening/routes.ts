/**
 * The app's own route list, read from app/ at test time: every page.tsx and route.ts, its URL, its
 * dynamic segments and (for route handlers) its HTTP methods. A new route is covered without
 * touching the suite; a new kind of dynamic segment must be mapped in `idFor` below.
 */
import fs from "node:fs";
import path from "node:path";
import { repoRoot } from "./server";
import type { SeedIds } from "./personas";

export interface AppRoute {
  /** File path relative to the repo root. */
  file: string;
  kind: "page" | "route";
  /** URL pattern, e.g. /sheets/[sheetId]. */
  pattern: string;
  /** "teacher" | "student" for the (teacher) / (student) route groups, else null. */
  group: string | null;
  params: string[];
  methods: string[];
}

const METHODS = ["GET", "HEAD", "POST", "PUT", "PATCH", "DELETE"];

function walk(dir: string): string[] {
  return fs.readdirSync(dir, { withFileTypes: true }).flatMap((e) => {
    const full = path.join(dir, e.name);
    if (e.isDirectory()) return e.name.startsWith("_") ? [] : walk(full);
    return /^(page|route)\.(tsx?|jsx?)$/.test(e.name) ? [full] : [];
  });
}

/** Every page and route handler under app/. */
export function appRoutes(): AppRoute[] {
  const appDir = path.join(repoRoot, "app");
  return walk(appDir)
    .map((full) => {
      const rel = path.relative(appDir, path.dirname(full)).split(path.sep).filter(Boolean);
      const kind = path.basename(full).startsWith("page") ? "page" : "route";
      const groups = rel.filter((s) => /^\(.+\)$/.test(s)).map((s) => s.slice(1, -1));
      const segments = rel.filter((s) => !/^\(.+\)$/.test(s) && !s.startsWith("@"));
      const params = segments.filter((s) => s.startsWith("[")).map((s) => s.replace(/^\[+(\.\.\.)?|\]+$/g, ""));
      const src = fs.readFileSync(full, "utf8");
      const methods =
        kind === "page"
          ? ["GET"]
          : METHODS.filter((m) => new RegExp(`export\\s+(async\\s+)?(function\\s+${m}\\b|const\\s+${m}\\b)|export\\s*\\{[^}]*\\b${m}\\b`).test(src));
      const group = groups.includes("teacher") ? "teacher" : groups.includes("student") ? "student" : null;
      return { file: path.relative(repoRoot, full), kind, pattern: "/" + segments.join("/"), group, params, methods } as AppRoute;
    })
    .sort((a, b) => a.pattern.localeCompare(b.pattern));
}

/**
 * Routes open to anyone by design, each with the reason. Everything else must refuse strangers.
 * Routes whose only segment is an invitation [token] are public too, but are still probed with a
 * wrong token and with another studio's members.
 */
export const PUBLIC_ROUTES: Record<string, string> = {
  "/": "landing page",
  "/about": "credits and licences, no data",
  "/sign-in": "sign-in form",
  "/sign-up": "teacher sign-up form",
  "/forgot-password": "asks for a password-reset e-mail",
  "/reset-password": "sets a new password with the e-mailed token",
  "/api/health": "liveness probe, no data",
  "/api/auth/[...all]": "better-auth's endpoints (sign-in, sign-out, session); probed by the auth tests",
  "/go": "redirects by role after sign-in, no data",
  "/lab/score": "score lab: fixture data only, and off unless KNOTWORK_LAB=1",
};

/** The demo-studio value for a dynamic segment, by its name. Throws for a name it does not know. */
export function idFor(param: string, ids: SeedIds): string {
  const p = param.toLowerCase();
  if (p === "format") return "musicxml";
  if (p.includes("token")) return ids.invitationToken;
  if (p.includes("invit")) return ids.invitationId;
  if (p.includes("piece") || p.includes("score")) return ids.scoreId;
  if (p.includes("knot") || p.includes("passage")) return ids.passageId;
  if (p.includes("drill")) return ids.sheetDrillId;
  if (p.includes("sheet")) return ids.sheetId;
  if (p.includes("assign")) return ids.assignmentId;
  if (p.includes("entry") || p.includes("practice")) return ids.practiceEntryId;
  if (p.includes("student") || p.includes("member")) return ids.studentMembershipId;
  if (p.includes("studio")) return ids.studioId;
  throw new Error(`The route segment [${param}] has no demo id yet: map it in tests/hardening/routes.ts (idFor).`);
}

/** The URL of a route with every dynamic segment filled from the demo studio. */
export function urlFor(route: AppRoute, ids: SeedIds): string {
  let url = route.pattern;
  for (const p of route.params) {
    url = url.replace(new RegExp(`\\[+(\\.\\.\\.)?${p}\\]+`), encodeURIComponent(idFor(p, ids)));
  }
  return url;
}

/** Extra query strings some handlers need to reach their data (so the owner check is meaningful). */
export function queryFor(route: AppRoute, ids: SeedIds): string {
  if (route.pattern === "/api/drills/preview") {
    const request = JSON.stringify({ families: ["blocking", "stops"], options: {} });
    const q = new URLSearchParams({ knot: ids.passageId, request, key: ids.drillKeys[0] ?? "", format: "musicxml" });
    return `?${q}`;
  }
  return "";
}
