// The handout route with real sign-ins: who may fetch it, and what the PDF holds.
import { afterAll, beforeAll, describe, expect, test, vi } from "vitest";
import { useTempDatabase } from "../db/temp-db";
import { buildStudio, cookieFor, PASSWORDS, type StudioFixture } from "../student/studio-fixture";
import { hasPdftoppm, inkShare, readPdfPages, renderPages, squash } from "./pdf-tools";

const request = vi.hoisted(() => ({ headers: new Headers() }));
vi.mock("next/headers", () => ({
  headers: async () => request.headers,
  cookies: async () => ({ get: () => undefined, getAll: () => [], set: () => undefined, delete: () => undefined }),
}));

let t: Awaited<ReturnType<typeof useTempDatabase>>;
let f: StudioFixture;
let route: typeof import("../../app/api/sheets/[sheetId]/handout/route");
const cookies: Record<"teacher" | "assigned" | "other", string> = { teacher: "", assigned: "", other: "" };

async function get(who: keyof typeof cookies | null, query = "", sheetId?: string) {
  request.headers = new Headers(who ? { cookie: cookies[who] } : {});
  const id = sheetId ?? f.sheetId;
  return route.GET(new Request(`http://localhost:3000/api/sheets/${id}/handout${query}`), { params: Promise.resolve({ sheetId: id }) });
}

beforeAll(async () => {
  t = await useTempDatabase("handout-route");
  f = await buildStudio(t.db, "route");
  route = await import("../../app/api/sheets/[sheetId]/handout/route");
  cookies.teacher = await cookieFor("ada-route@knotwork.test", PASSWORDS.teacher);
  cookies.assigned = await cookieFor(f.students[0].email, PASSWORDS.student);
  cookies.other = await cookieFor(f.students[1].email, PASSWORDS.student);
});
afterAll(() => t?.cleanup());

describe("GET /api/sheets/[sheetId]/handout — access", () => {
  test("signed out → 401", async () => {
    expect((await get(null)).status).toBe(401);
  });
  test("a student of the studio without the sheet assigned → 404", async () => {
    expect((await get("other")).status).toBe(404);
  });
  test("an unknown sheet id → 404, even for the teacher", async () => {
    expect((await get("teacher", "", "no-such-sheet")).status).toBe(404);
  });
  test("a paper size other than a4 or letter → 400", async () => {
    expect((await get("teacher", "?paper=a3")).status).toBe(400);
  });
});

describe("GET /api/sheets/[sheetId]/handout — the PDF", () => {
  let teacherPdf: Uint8Array;
  let studentPdf: Uint8Array;
  let letterPdf: Uint8Array;
  beforeAll(async () => {
    const a = await get("teacher");
    expect(a.status).toBe(200);
    expect(a.headers.get("content-type")).toBe("application/pdf");
    expect(a.headers.get("content-disposition")).toMatch(/filename="even-triplets-in-the-study-a4\.pdf"/);
    teacherPdf = new Uint8Array(await a.arrayBuffer());
    const s = await get("assigned");
    expect(s.status).toBe(200);
    studentPdf = new Uint8Array(await s.arrayBuffer());
    const l = await get("teacher", "?paper=letter&download=1");
    expect(l.headers.get("content-disposition")).toMatch(/^attachment; filename=".*-letter\.pdf"/);
    letterPdf = new Uint8Array(await l.arrayBuffer());
  });

  test("text holds the sheet title, every drill title and the caution (read with pdfjs-dist)", async () => {
    const { CAUTION } = await import("@/lib/caution");
    const pages = await readPdfPages(teacherPdf);
    const all = squash(pages.map((p) => p.text).join(" "));
    expect(all).toContain("Even triplets in the study");
    for (const title of f.drillTitles) expect(all).toContain(title);
    expect(all).toContain(squash(CAUTION.text));
  });

  test("the assigned student's copy carries their name and their tempo goal", async () => {
    const all = (await readPdfPages(studentPdf)).map((p) => p.text).join(" ");
    expect(all).toContain("Sol Student");
    // goal 80 from the assignment, start 50 from the drill
    expect(all).toContain("♩ = 50 → 80");
    const teacherText = (await readPdfPages(teacherPdf)).map((p) => p.text).join(" ");
    expect(teacherText).toContain("♩ = 50 → 72");
  });

  test("page sizes: A4 595 × 842 pt (ISO 216: 210 × 297 mm) and Letter 612 × 792 pt (ANSI/ASME Y14.1: 8.5 × 11 in)", async () => {
    for (const p of await readPdfPages(teacherPdf)) {
      expect(Math.round(p.width)).toBe(595);
      expect(Math.round(p.height)).toBe(842);
    }
    for (const p of await readPdfPages(letterPdf)) {
      expect(p.width).toBe(612);
      expect(p.height).toBe(792);
    }
  });

  test.runIf(hasPdftoppm())("pdftoppm (poppler) renders every page and none is blank", () => {
    const images = renderPages(teacherPdf, 40, "artifacts/handout-route");
    expect(images.length).toBeGreaterThan(0);
    for (const img of images) expect(inkShare(img)).toBeGreaterThan(0.005);
  });
});
