/**
 * What every hardening test file needs: the server's address, the seeded ids, the personas' cookies,
 * plain HTTP probes that never follow redirects, and row counts read straight from the server's
 * database file.
 */
import fs from "node:fs";
import path from "node:path";
import { createClient, type Client } from "@libsql/client";
import { inject } from "vitest";
import type { Cookies, PersonaName, SeedIds } from "./personas";

export const baseURL = inject("baseURL");
export const ids = JSON.parse(inject("seedIds")) as SeedIds;
export const cookies = JSON.parse(inject("cookies")) as Cookies;
export const uploadsDir = inject("uploadsDir");

export type Persona = PersonaName | "anonymous";

export interface Probe {
  status: number;
  location: string | null;
  contentType: string;
  body: string;
  headers: Headers;
}

/** One request as a persona; redirects are reported, not followed. */
export async function probe(
  method: string,
  url: string,
  persona: Persona,
  init: { body?: BodyInit; headers?: Record<string, string> } = {},
): Promise<Probe> {
  const headers: Record<string, string> = { origin: baseURL, ...init.headers };
  if (cookies[persona]) headers.cookie = cookies[persona];
  const res = await fetch(new URL(url, baseURL), { method, headers, body: init.body, redirect: "manual" });
  return {
    status: res.status,
    location: res.headers.get("location"),
    contentType: res.headers.get("content-type") ?? "",
    body: await res.text(),
    headers: res.headers,
  };
}

/** True for a refusal: 401/403/404, or a redirect to the sign-in page. */
export function isRefusal(p: Probe): boolean {
  if ([401, 403, 404].includes(p.status)) return true;
  if (p.status >= 300 && p.status < 400 && p.location) return new URL(p.location, baseURL).pathname === "/sign-in";
  return false;
}

let client: Client | null = null;
function db(): Client {
  client ??= createClient({ url: inject("databaseURL") });
  return client;
}

const TABLES = [
  "user", "session", "account", "studio", "membership", "hand_profile", "score", "passage",
  "sheet", "sheet_drill", "assignment", "practice_entry", "invitation", "outbox",
];

/** Row count of every app table (sessions excluded: signing in legitimately adds one). */
export async function rowCounts(): Promise<Record<string, number>> {
  const out: Record<string, number> = {};
  for (const t of TABLES) {
    if (t === "session") continue;
    const res = await db().execute(`select count(*) as n from "${t}"`);
    out[t] = Number(res.rows[0]?.n ?? 0);
  }
  return out;
}

/** Every file under the upload folder (relative paths), sorted. */
export function uploadFiles(): string[] {
  const walk = (dir: string): string[] =>
    fs.existsSync(dir)
      ? fs.readdirSync(dir, { withFileTypes: true }).flatMap((e) => (e.isDirectory() ? walk(path.join(dir, e.name)) : [path.join(dir, e.name)]))
      : [];
  return walk(uploadsDir).map((f) => path.relative(uploadsDir, f)).sort();
}

/** Runs a query on the server's database (read-only use). */
export async function query(sql: string, args: (string | number)[] = []) {
  return (await db().execute({ sql, args })).rows;
}

/**
 * A fingerprint of everything that belongs to the demo studio: ids and update times of its rows in
 * every studio-owned table, its sheets' drills, its members' users and hand profiles. Any insert,
 * update or delete touching the studio changes it; writes in other studios do not.
 */
export async function studioDigest(studioId: string = ids.studioId): Promise<string> {
  const queries: [string, string][] = [
    ["studio", `select id, updated_at from studio where id = ?1`],
    ["membership", `select id, role, updated_at from membership where studio_id = ?1 order by id`],
    ["user", `select u.id, u.email, u.updated_at from user u join membership m on m.user_id = u.id where m.studio_id = ?1 order by u.id`],
    ["account", `select a.id, a.password, a.updated_at from account a join membership m on m.user_id = a.user_id where m.studio_id = ?1 order by a.id`],
    ["hand_profile", `select h.id, h.span_mm, h.octave_mm, h.updated_at from hand_profile h join membership m on m.id = h.membership_id where m.studio_id = ?1 order by h.id`],
    ["sheet_drill", `select d.id, d.position, d.updated_at from sheet_drill d join sheet s on s.id = d.sheet_id where s.studio_id = ?1 order by d.id`],
    ...["score", "passage", "sheet", "assignment", "practice_entry", "invitation"].map(
      (t) => [t, `select id, updated_at from ${t} where studio_id = ?1 order by id`] as [string, string],
    ),
    ["outbox", `select id, sent_at from outbox where studio_id = ?1 order by id`],
    // Rows of another studio pointing at this studio's rows (a knot on its piece, a sheet of its knot,
    // an assignment of its sheet or to its student, an entry on its assignment) — always empty.
    ["cross-studio", `select 'passage' as t, p.id from passage p join score s on s.id = p.score_id where s.studio_id = ?1 and p.studio_id <> ?1
      union all select 'sheet', sh.id from sheet sh join passage p on p.id = sh.passage_id where p.studio_id = ?1 and sh.studio_id <> ?1
      union all select 'assignment', a.id from assignment a join sheet sh on sh.id = a.sheet_id where sh.studio_id = ?1 and a.studio_id <> ?1
      union all select 'assignment', a.id from assignment a join membership m on m.id = a.student_membership_id where m.studio_id = ?1 and a.studio_id <> ?1
      union all select 'practice_entry', e.id from practice_entry e join assignment a on a.id = e.assignment_id where a.studio_id = ?1 and e.studio_id <> ?1`],
  ];
  const parts: string[] = [];
  for (const [name, sql] of queries) parts.push(name + JSON.stringify(await query(sql, [studioId])));
  return parts.join("\n");
}
