import { readdirSync, statSync } from "node:fs";
import path from "node:path";
import { describe, expect, test } from "vitest";
import { NextRequest } from "next/server";
import { config, MEMBER_PAGES, proxy } from "@/proxy";

const appDir = path.resolve(__dirname, "../../app");

/** Top-level URL folders of a route group, e.g. app/(teacher)/pieces → "pieces". */
function folders(group: string): string[] {
  const dir = path.join(appDir, group);
  return readdirSync(dir).filter((name) => statSync(path.join(dir, name)).isDirectory());
}

/** The matcher as Next applies it to a path (the pattern is anchored to the whole path). */
const matches = (p: string) => config.matcher.some((m) => new RegExp(`^${m}$`).test(p));

describe("proxy", () => {
  test.each(["(teacher)", "(student)"])("every member page folder of %s is redirected early when signed out", (group) => {
    const found = folders(group);
    expect(found.length).toBeGreaterThan(0);
    for (const folder of found) {
      expect(MEMBER_PAGES as readonly string[]).toContain(folder);
      expect(matches(`/${folder}/x`)).toBe(true);
      const res = proxy(new NextRequest(`http://localhost:3000/${folder}/x`));
      expect(res.status).toBe(307);
      expect(new URL(res.headers.get("location")!).pathname).toBe("/sign-in");
    }
  });

  test("the matcher covers API routes and every page (server actions post to pages), not build assets", () => {
    for (const p of ["/api/pieces", "/api/sheets", "/api/auth/sign-in/email", "/sign-up", "/invite/abc", "/"]) expect(matches(p), p).toBe(true);
    for (const p of ["/_next/static/chunks/a.js", "/fonts/x.woff2"]) expect(matches(p), p).toBe(false);
  });

  // OWASP CSRF Prevention Cheat Sheet, "Verifying Origin With Standard Headers": a state-changing
  // request must carry the target's own origin; a missing one is refused too (as better-auth does).
  test.each([
    ["POST", "/api/pieces", undefined, 403],
    ["POST", "/api/pieces", "null", 403],
    ["POST", "/api/pieces", "https://evil.example", 403],
    ["DELETE", "/api/pieces/p1", "http://localhost:3000.evil.example", 403],
    ["POST", "/sign-up", undefined, 403],
    ["POST", "/api/sheets", "http://localhost:3000", 200],
    ["POST", "/api/sheets", "http://127.0.0.1:3000", 200],
    ["GET", "/api/pieces", undefined, 200],
  ] as const)("%s %s with Origin %s → %i", (method, url, origin, status) => {
    const headers: Record<string, string> = origin ? { origin } : {};
    const res = proxy(new NextRequest(`http://localhost:3000${url}`, { method, headers }));
    expect(res.status).toBe(status);
  });
});
