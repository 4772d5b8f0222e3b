/**
 * The hostile corpus against the running server's memory and liveness (issue: one stored file or one
 * oversize body must not take the server down for everyone). While each attack runs, /api/health is
 * asked back to back and the RSS of the server's process tree is sampled every 50 ms.
 * Stated cap: the server stays under RSS_CAP_MB (it idles at about 250–300 MB after the suite's
 * set-up; before the fixes, five chunked 50 MB uploads took it to 685 MB and opening a stored piece
 * with a 10^15-quarter note to 5.4 GB and a crash). /api/health must answer every time (within 5 s);
 * its p99 is printed next to the 250 ms goal, which is not asserted yet: uploads are read, drills
 * generated and handouts rendered in the worker pool (lib/jobs/heavy.ts), but opening a stored piece
 * still parses it on the request thread, and on this shared 2-core machine the first run measured
 * 4.2 s (chunked uploads) and 1.7 s (stored pieces).
 * OWASP Denial of Service Cheat Sheet (limit request sizes, bound work per request); OWASP File Upload
 * Cheat Sheet ("Set a file size limit").
 */
import fs from "node:fs";
import path from "node:path";
import { inject } from "vitest";
import { describe, expect, test } from "vitest";
import { baseURL, cookies, query } from "./context";
import { percentile, treeRssMb, watchServer } from "./memory";
import { OTHER_TEACHER } from "./personas";
import { repoRoot } from "./server";

const pid = inject("serverPid");
const RSS_CAP_MB = 700;
const HEALTH_P99_MS = 250;
const MB = 1024 * 1024;

/** A chunked multipart upload of `total` bytes (no Content-Length: the body is a stream). */
function chunkedUpload(total: number) {
  const boundary = "kwchunked";
  const head = new TextEncoder().encode(`--${boundary}\r\ncontent-disposition: form-data; name="file"; filename="big.musicxml"\r\ncontent-type: application/xml\r\n\r\n`);
  let sent = 0;
  const chunk = new Uint8Array(256 * 1024).fill(0x20);
  const body = new ReadableStream<Uint8Array>({
    start(c) {
      c.enqueue(head);
    },
    pull(c) {
      if (sent >= total) return c.close();
      sent += chunk.byteLength;
      c.enqueue(chunk);
    },
  });
  return fetch(`${baseURL}/api/pieces`, {
    method: "POST",
    headers: { cookie: cookies.demoTeacher, origin: baseURL, "content-type": `multipart/form-data; boundary=${boundary}` },
    body,
    duplex: "half",
  } as RequestInit)
    .then(async (res) => ({ status: res.status, body: await res.text() }))
    .catch((e: Error) => ({ status: 0, body: String(e.cause ?? e.message) }));
}

function expectHealthy(figures: { peakMb: number; healthMs: number[] }, what: string) {
  const p99 = percentile(figures.healthMs, 99);
  console.log(`${what}: peak RSS ${figures.peakMb.toFixed(0)} MB (cap ${RSS_CAP_MB}), /api/health p99 ${p99.toFixed(0)} ms (goal ${HEALTH_P99_MS}) over ${figures.healthMs.length} probes`);
  expect(figures.healthMs.length, `${what}: health was asked`).toBeGreaterThan(0);
  expect(figures.healthMs.filter((ms) => !Number.isFinite(ms)), `${what}: health failures or answers slower than 5 s`).toEqual([]);
  expect(figures.peakMb, `${what}: peak RSS (MB)`).toBeLessThan(RSS_CAP_MB);
}

describe("the server under hostile requests", () => {
  test("the process tree is found and measured", () => {
    expect(pid).toBeGreaterThan(0);
    expect(treeRssMb(pid)).toBeGreaterThan(50);
  });

  test("five chunked 50 MB uploads at once: each refused with 413 at the 5 MB cap; memory and health hold", async () => {
    const watch = watchServer(baseURL, pid);
    const answers = await Promise.all(Array.from({ length: 5 }, () => chunkedUpload(50 * MB)));
    const figures = await watch.stop();
    for (const a of answers) {
      // The server answers 413 as soon as the cap is passed; a client still sending may see the
      // connection closed instead (status 0) — either way nothing past the cap was read.
      if (a.status !== 0) {
        expect(a.status, a.body).toBe(413);
        expect(JSON.parse(a.body).error).toMatch(/larger than 5 MB/);
      }
    }
    expect(answers.some((a) => a.status === 413)).toBe(true);
    expectHealthy(figures, "chunked uploads");
  });

  test("pieces stored with absurd numbers (before the upload bounds): piece page and generate answer, memory holds", async () => {
    const [teacher] = await query("select id from user where email = ?", [OTHER_TEACHER.email]);
    const [studio] = await query("select m.studio_id as id from membership m join user u on u.id = m.user_id where u.email = ?", [OTHER_TEACHER.email]);
    const watch = watchServer(baseURL, pid);
    for (const file of ["huge-duration.xml", "huge-divisions.xml", "huge-tuplet.xml", "prime-divisions.xml"]) {
      const xml = fs.readFileSync(path.join(repoRoot, "fixtures/hostile", file), "utf8");
      const scoreId = crypto.randomUUID();
      const knotId = crypto.randomUUID();
      await query(
        "insert into score (id, studio_id, title, composer, bars, parts, musicxml, storage_key, original_name, uploaded_by) values (?, ?, ?, null, 4, ?, ?, ?, ?, ?)",
        [scoreId, String(studio!.id), `stored ${file}`, JSON.stringify([{ id: "P1", name: "Piano", staves: 1 }]), xml, `demo/${scoreId}`, file, String(teacher!.id)],
      );
      await query("insert into passage (id, studio_id, score_id, part, hand, from_bar, to_bar, tags, created_by) values (?, ?, ?, 'P1', 'right', 1, 4, '[\"evenness\"]', ?)", [
        knotId, String(studio!.id), scoreId, String(teacher!.id),
      ]);
      const page = await fetch(`${baseURL}/pieces/${scoreId}`, { headers: { cookie: cookies.otherTeacher }, signal: AbortSignal.timeout(30_000) });
      await page.text();
      expect(page.status, `${file}: piece page`).toBeLessThan(500);
      const gen = await fetch(`${baseURL}/api/knots/${knotId}/drills`, {
        method: "POST",
        headers: { cookie: cookies.otherTeacher, origin: baseURL, "content-type": "application/json" },
        body: JSON.stringify({ families: ["blocking", "stops"], options: {} }),
        signal: AbortSignal.timeout(30_000),
      });
      const body = await gen.text();
      expect(gen.status, `${file}: generate ${body}`).toBe(422);
      expect(JSON.parse(body).message).toMatch(/bar \d/);
    }
    const figures = await watch.stop();
    expectHealthy(figures, "stored hostile pieces");
  });
});
