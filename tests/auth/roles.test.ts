import fs from "node:fs";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, test, vi } from "vitest";
import { useTempDatabase } from "../db/temp-db";

// The request's headers, as next/headers would give them to a page or action.
const request = vi.hoisted(() => ({ headers: new Headers() }));
vi.mock("next/headers", () => ({
  headers: async () => request.headers,
  cookies: async () => ({ get: () => undefined, getAll: () => [], set: () => undefined, delete: () => undefined }),
}));

const FORBIDDEN = "NEXT_HTTP_ERROR_FALLBACK;403";
const root = path.resolve(__dirname, "../..");
const teacherDir = path.join(root, "app/(teacher)");

function findFiles(dir: string, name: RegExp): string[] {
  if (!fs.existsSync(dir)) return [];
  return fs.readdirSync(dir, { withFileTypes: true }).flatMap((e) => {
    const full = path.join(dir, e.name);
    return e.isDirectory() ? findFiles(full, name) : name.test(e.name) ? [full] : [];
  });
}

let t: Awaited<ReturnType<typeof useTempDatabase>>;
let session: typeof import("../../lib/auth/session");
let studentCookie = "";
let teacherCookie = "";

async function cookieFor(email: string, password: string) {
  const { auth } = await import("../../lib/auth");
  const res = await auth.api.signInEmail({ body: { email, password }, returnHeaders: true });
  const setCookie = res.headers.get("set-cookie") ?? "";
  const token = setCookie.match(/(better-auth\.session_token=[^;]+)/)?.[1];
  if (!token) throw new Error("no session cookie");
  return token;
}

async function expectForbidden(run: () => unknown) {
  let caught: unknown;
  try {
    await run();
  } catch (err) {
    caught = err;
  }
  expect((caught as { digest?: string } | undefined)?.digest).toBe(FORBIDDEN);
}

beforeAll(async () => {
  t = await useTempDatabase("roles");
  const { createTeacherAccount } = await import("../../lib/auth/teacher-sign-up");
  const { createInvitation, acceptInvitation } = await import("../../lib/students/invitations");
  const teacher = await createTeacherAccount(t.db, {
    name: "Ada Teacher", email: "ada@knotwork.test", password: "teach-slowly", studioName: "Alder Studio",
  });
  if (!teacher.ok) throw new Error(teacher.message);
  const { token } = await createInvitation({ studioId: teacher.data.studioId, email: "sol@knotwork.test", invitedBy: teacher.data.userId }, t.db);
  const student = await acceptInvitation(token, { name: "Sol Student", password: "practise-daily" }, t.db);
  if (!student.ok) throw new Error(student.message);
  teacherCookie = await cookieFor("ada@knotwork.test", "teach-slowly");
  studentCookie = await cookieFor("sol@knotwork.test", "practise-daily");
  session = await import("../../lib/auth/session");
});
afterAll(() => t.cleanup());

describe("roles", () => {
  test("requireTeacher: teacher passes with their studio; a student gets 403", async () => {
    request.headers = new Headers({ cookie: teacherCookie });
    const ctx = await session.requireTeacher();
    expect(ctx).toMatchObject({ role: "teacher", studioName: "Alder Studio" });
    request.headers = new Headers({ cookie: studentCookie });
    await expectForbidden(() => session.requireTeacher());
    const student = await session.requireStudent();
    expect(student.role).toBe("student");
    expect(student.studioId).toBe(ctx.studioId);
  });

  test("a teacher gets 403 from requireStudent; anonymous callers are sent to sign-in", async () => {
    request.headers = new Headers({ cookie: teacherCookie });
    await expectForbidden(() => session.requireStudent());
    request.headers = new Headers();
    let caught: unknown;
    try {
      await session.requireTeacher();
    } catch (err) {
      caught = err;
    }
    expect(String((caught as { digest?: string }).digest)).toMatch(/^NEXT_REDIRECT;[^;]*;\/sign-in;/);
  });

  test("every teacher page answers a student with 403", async () => {
    const pages = findFiles(teacherDir, /^(page|layout)\.tsx$/);
    expect(pages.length).toBeGreaterThanOrEqual(6); // layout + home, pieces, knots, sheets, students
    request.headers = new Headers({ cookie: studentCookie });
    for (const file of pages) {
      const mod = await import(file);
      await expectForbidden(() => mod.default({ params: Promise.resolve({}), searchParams: Promise.resolve({}), children: null }));
    }
  });

  test("every teacher server action answers a student with 403 before touching its input", async () => {
    request.headers = new Headers({ cookie: studentCookie });
    const actionFiles = findFiles(teacherDir, /^actions\.ts$/);
    for (const file of actionFiles) {
      const mod = (await import(file)) as Record<string, unknown>;
      for (const [name, fn] of Object.entries(mod)) {
        if (typeof fn !== "function") continue;
        await expectForbidden(async () => (fn as (...a: unknown[]) => unknown)(null, new FormData()));
        expect(name).toBeTruthy();
      }
    }
  });
});
