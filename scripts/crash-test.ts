/**
 * `npm run crash [-- --kills 50]`: crash safety of the production server.
 *
 * Starts the built server on a free loopback port with its own temp database, drives concurrent
 * writes through the app's own HTTP surface — save a drill sheet (POST /api/sheets), assign a sheet
 * to two students at once (the assign server action), log practice (the student's server action) —
 * and kills the whole server with SIGKILL at a random moment, again and again. After each restart:
 * PRAGMA integrity_check is "ok", every write the server acknowledged is there, and no sheet or
 * assignment batch is half saved (each is written in one transaction).
 */
import { spawn, type ChildProcess } from "node:child_process";
import fs from "node:fs";
import { createRequire } from "node:module";
import os from "node:os";
import path from "node:path";
import { createClient } from "@libsql/client";
import { ensureBuild, freePort, repoRoot, run, waitForHealth, distDir } from "../tests/hardening/server";
import { PERSONA_LOGINS, signIn, type SeedIds } from "../tests/hardening/personas";

const { encodeReply } = createRequire(__filename)("next/dist/compiled/react-server-dom-turbopack/client.node") as {
  encodeReply: (value: unknown) => Promise<string | FormData>;
};

const DRILLS_PER_SHEET = 3;
const arg = (name: string, fallback: number) => {
  const i = process.argv.indexOf(`--${name}`);
  return i > 0 ? Number(process.argv[i + 1]) : fallback;
};

export interface Acks {
  sheets: string[];
  assignmentBatches: { note: string; ids: string[] }[];
  practice: string[];
  attempts: number;
}

function actionId(name: string): string | null {
  const manifest = JSON.parse(fs.readFileSync(path.join(distDir(), "server/server-reference-manifest.json"), "utf8")) as {
    node: Record<string, { exportedName: string }>;
  };
  return Object.entries(manifest.node).find(([, a]) => a.exportedName === name)?.[0] ?? null;
}

/** Call a server action over HTTP as the browser does; `args` are its arguments in order. */
async function callAction(base: string, id: string, cookie: string, ...args: unknown[]): Promise<string> {
  const body = await encodeReply(args);
  const res = await fetch(`${base}/`, {
    method: "POST",
    headers: { "next-action": id, origin: base, cookie, accept: "text/x-component", "content-type": "text/plain;charset=UTF-8" },
    body: body as string,
  });
  return res.text();
}

/** The `data` of an `{ ok: true, data }` action result inside a React Server Components payload. */
function okData(payload: string): Record<string, unknown> | null {
  for (const line of payload.split("\n")) {
    const json = line.slice(line.indexOf(":") + 1);
    if (!json.startsWith("{")) continue;
    try {
      const v = JSON.parse(json) as { ok?: boolean; data?: Record<string, unknown> };
      if (v.ok === true && v.data) return v.data;
    } catch {
      // not a JSON row
    }
  }
  return null;
}

function startServer(port: number, env: NodeJS.ProcessEnv): ChildProcess {
  // Own process group, so SIGKILL reaches next's worker processes too.
  return spawn(path.join(repoRoot, "node_modules/.bin/next"), ["start", "-p", String(port), "-H", "127.0.0.1"], {
    cwd: repoRoot, env, stdio: "ignore", detached: true,
  });
}

function killHard(child: ChildProcess) {
  try {
    process.kill(-child.pid!, "SIGKILL");
  } catch {
    // already gone
  }
}

/** Writers loop until `stop()` says so; only answers the server completed count as acknowledged. */
async function writeLoad(base: string, ids: SeedIds, cookies: { teacher: string; student: string }, acks: Acks, stop: () => boolean, round: number) {
  // The assign form submits through useActionState: (previous result, fields).
  const assignId = actionId("assignSheetFormAction");
  const practiceId = actionId("logPracticeAction");
  const today = new Date().toISOString().slice(0, 10);
  const due = new Date(Date.now() + 7 * 86_400_000).toISOString().slice(0, 10);
  let n = 0;
  const sheetWriter = async () => {
    while (!stop()) {
      acks.attempts++;
      const res = await fetch(`${base}/api/sheets`, {
        method: "POST",
        headers: { "content-type": "application/json", origin: base, cookie: cookies.teacher },
        body: JSON.stringify({
          knotId: ids.passageId, title: `crash sheet ${round}-${n++}`, request: { families: ["blocking", "stops"], options: {} },
          drills: ids.drillKeys.slice(0, DRILLS_PER_SHEET).map((key) => ({ key, studentNote: "", tempo: { start: 60, target: 80 } })),
        }),
      });
      if (res.status === 201) acks.sheets.push(((await res.json()) as { id: string }).id);
      else throw new Error(`save sheet answered ${res.status}: ${await res.text()}`);
    }
  };
  const assignWriter = async () => {
    while (assignId && !stop()) {
      acks.attempts++;
      const note = `crash batch ${round}-${n++}`;
      const data = okData(await callAction(base, assignId, cookies.teacher, null, {
        sheetId: ids.sheetId, studentMembershipIds: [ids.studentMembershipId, ids.secondStudentMembershipId], dueDate: due, tempoGoals: {}, note,
      }));
      if (!data) throw new Error("assign answered without { ok: true }");
      acks.assignmentBatches.push({ note, ids: data.ids as string[] });
    }
  };
  const practiceWriter = async () => {
    while (practiceId && !stop()) {
      acks.attempts++;
      const data = okData(await callAction(base, practiceId, cookies.student, {
        assignmentId: ids.assignmentId, practisedOn: today, minutes: 5, ease: 3, tempos: {}, comment: `crash ${round}-${n++}`,
      }));
      if (!data) throw new Error("log practice answered without { ok: true }");
      acks.practice.push(data.id as string);
    }
  };
  // A dropped connection is how a kill looks from here; anything else is a real failure.
  const quiet = (p: Promise<void>) => p.catch((e: Error) => (stop() ? undefined : Promise.reject(e)));
  await Promise.all([quiet(sheetWriter()), quiet(sheetWriter()), quiet(assignWriter()), quiet(practiceWriter())]);
}

/** Every broken invariant found in the database (empty when all hold). */
export async function check(dbUrl: string, acks: Acks): Promise<string[]> {
  const client = createClient({ url: dbUrl });
  const problems: string[] = [];
  try {
    const integrity = (await client.execute("PRAGMA integrity_check")).rows.map((r) => String(Object.values(r)[0]));
    if (integrity.join() !== "ok") problems.push(`integrity_check: ${integrity.join("; ")}`);
    const sheets = await client.execute("select s.id, s.title, count(d.id) as drills from sheet s left join sheet_drill d on d.sheet_id = s.id where s.title like 'crash sheet %' group by s.id");
    const drillsOf = new Map(sheets.rows.map((r) => [String(r.id), Number(r.drills)]));
    for (const id of acks.sheets) if (!drillsOf.has(id)) problems.push(`acknowledged sheet ${id} is missing`);
    for (const [id, n] of drillsOf) if (n !== DRILLS_PER_SHEET) problems.push(`sheet ${id} is half saved: ${n} of ${DRILLS_PER_SHEET} drills`);
    const batches = await client.execute("select note, count(*) as n from assignment where note like 'crash batch %' group by note");
    for (const r of batches.rows) if (Number(r.n) !== 2) problems.push(`assignment batch "${r.note}" is half saved: ${r.n} of 2`);
    const assigned = new Set((await client.execute("select id from assignment where note like 'crash batch %'")).rows.map((r) => String(r.id)));
    for (const b of acks.assignmentBatches) for (const id of b.ids) if (!assigned.has(id)) problems.push(`acknowledged assignment ${id} is missing`);
    const logged = new Set((await client.execute("select id from practice_entry where comment like 'crash %'")).rows.map((r) => String(r.id)));
    for (const id of acks.practice) if (!logged.has(id)) problems.push(`acknowledged practice entry ${id} is missing`);
  } finally {
    client.close();
  }
  return problems;
}

/**
 * Runs the crash loop; resolves with the acknowledged counts, rejects on the first broken invariant.
 * `build: false` uses the existing build as it is (the test suite has built it already).
 */
export async function crashTest(kills: number, log: (line: string) => void = console.log, opts: { build?: boolean } = {}): Promise<Acks> {
  if (opts.build !== false) ensureBuild();
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), "knotwork-crash-"));
  const port = await freePort();
  const base = `http://127.0.0.1:${port}`;
  const dbUrl = `file:${path.join(dir, "crash.db")}`;
  const env: NodeJS.ProcessEnv = {
    ...process.env, NODE_ENV: "production", NEXT_TELEMETRY_DISABLED: "1", DATABASE_URL: dbUrl, UPLOADS_DIR: path.join(dir, "uploads"),
    BETTER_AUTH_SECRET: "crash-test-secret-only-for-this-run-0123456789", BETTER_AUTH_URL: base,
  };
  run(path.join(repoRoot, "node_modules/.bin/tsx"), ["tests/hardening/seed-studios.ts", path.join(dir, "ids.json")], env);
  const ids = JSON.parse(fs.readFileSync(path.join(dir, "ids.json"), "utf8")) as SeedIds;
  const acks: Acks = { sheets: [], assignmentBatches: [], practice: [], attempts: 0 };
  let server = startServer(port, env);
  try {
    await waitForHealth(base, server);
    const cookies = {
      teacher: await signIn(base, PERSONA_LOGINS.demoTeacher.email, PERSONA_LOGINS.demoTeacher.password),
      student: await signIn(base, PERSONA_LOGINS.demoStudent.email, PERSONA_LOGINS.demoStudent.password),
    };
    for (let round = 1; round <= kills; round++) {
      let stopped = false;
      const load = writeLoad(base, ids, cookies, acks, () => stopped, round);
      // Kill at a random moment once every writer has had a write acknowledged in this round, so
      // each kill lands among writes in flight whatever the machine's speed.
      const total = () => [acks.sheets.length, acks.assignmentBatches.length, acks.practice.length];
      const before = total();
      const active = [true, Boolean(actionId("assignSheetFormAction")), Boolean(actionId("logPracticeAction"))];
      const deadline = Date.now() + 60_000;
      while (total().some((n, i) => active[i] && n === before[i]) && Date.now() < deadline) await new Promise((r) => setTimeout(r, 20));
      await new Promise((r) => setTimeout(r, Math.random() * 600));
      stopped = true;
      killHard(server);
      await load;
      server = startServer(port, env);
      await waitForHealth(base, server);
      const problems = await check(dbUrl, acks);
      if (problems.length) throw new Error(`after kill ${round}:\n  ${problems.join("\n  ")}`);
      log(`kill ${round}/${kills}: ok — acknowledged ${acks.sheets.length} sheets, ${acks.assignmentBatches.length} assignment batches, ${acks.practice.length} practice entries`);
    }
    return acks;
  } finally {
    killHard(server);
    fs.rmSync(dir, { recursive: true, force: true });
  }
}

if (process.argv[1] && path.resolve(process.argv[1]) === path.resolve(__filename)) {
  crashTest(arg("kills", 50)).then(
    () => process.exit(0),
    (err) => {
      console.error(String(err instanceof Error ? err.message : err));
      process.exit(1);
    },
  );
}
