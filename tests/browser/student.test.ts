// The teacher-to-student loop in Chromium: invite → outbox → join → assign → drill sheet → practice
// → progress. Plus: another student gets 404, bad input shows messages, axe on the student pages.
import { afterAll, beforeAll, describe, expect, inject, test } from "vitest";
import type { Browser, BrowserContext, Page } from "playwright-core";
import { CAUTION } from "@/lib/caution";
import { describeViolations, seriousViolations } from "./axe";
import { launchChromium, shoot } from "./chromium";
import { DEMO_SHEET_TITLE } from "@/lib/demo/sheet";

const baseURL = inject("baseURL");
const NEW_STUDENT = { name: "Pia Newcomb", email: "pia.newcomb@knotwork.test", password: "scales-every-day" };
let browser: Browser;
let teacher: { context: BrowserContext; page: Page };
let student: { context: BrowserContext; page: Page };
let assignmentPath = "";

async function newPage(width: number) {
  const context = await browser.newContext({ viewport: { width, height: 900 }, baseURL });
  return { context, page: await context.newPage() };
}

async function signIn(page: Page, email: string, password: string, landing: string) {
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL(`**${landing}`);
}

beforeAll(async () => {
  browser = await launchChromium();
  teacher = await newPage(1280);
  await signIn(teacher.page, "teacher@knotwork.test", "practise-slowly", "/home");
});
afterAll(async () => {
  await browser?.close();
});

describe("from teacher to student", () => {
  test("the teacher invites a new student and the outbox holds the mail", async () => {
    const { page } = teacher;
    await page.goto("/students");
    await page.getByLabel("Student's e-mail").fill("not-an-address");
    await page.getByRole("button", { name: "Send invitation" }).click();
    await expect(page.getByText("Enter the student's e-mail address.").waitFor()).resolves.toBeUndefined();
    await page.getByLabel("Student's e-mail").fill(NEW_STUDENT.email);
    await page.getByRole("button", { name: "Send invitation" }).click();
    await page.getByText(`Invitation sent to ${NEW_STUDENT.email}`).waitFor();
    const violations = await seriousViolations(page);
    expect(violations, describeViolations(violations)).toEqual([]);
    await shoot(page, "students-1280");

    await page.goto("/dev/outbox");
    const mail = page.getByTestId("outbox-mail").filter({ hasText: NEW_STUDENT.email }).first();
    await mail.waitFor();
    expect(await page.getByTestId("outbox-mail").filter({ hasText: "not-an-address" }).count()).toBe(0);
    const link = await mail.locator("a[href*='/invite/']").getAttribute("href");
    expect(link).toMatch(/\/invite\/[\w-]+$/);

    student = await newPage(390);
    await student.page.goto(link!);
    await student.page.getByLabel("Your name").fill(NEW_STUDENT.name);
    await student.page.getByLabel("Choose a password").fill(NEW_STUDENT.password);
    await student.page.getByRole("button", { name: "Join the studio" }).click();
    await student.page.waitForURL("**/my");

    // the link worked once: opening it again shows a clear page and no form
    const again = await newPage(390);
    await again.page.goto(link!);
    await again.page.getByTestId("invite-problem").waitFor();
    expect(await again.page.getByTestId("invite-problem").textContent()).toMatch(/already been used/);
    expect(await again.page.getByLabel("Choose a password").count()).toBe(0);
    await again.context.close();
  });

  test("the teacher assigns the demo sheet; a past due date is refused first", async () => {
    const { page } = teacher;
    await page.goto("/assignments");
    // other browser tests may have saved newer sheets: choose the demo sheet by name
    const demoSheet = page.getByRole("navigation", { name: "Other sheets" }).getByRole("link", { name: DEMO_SHEET_TITLE, exact: true });
    if (await demoSheet.count()) {
      await demoSheet.first().click();
      await page.waitForURL(/sheet=/);
    }
    await page.getByLabel(NEW_STUDENT.name).check();
    await page.getByLabel("Due date").fill("2020-01-01");
    await page.getByRole("button", { name: "Assign and e-mail" }).click();
    await page.getByText("The due date cannot be in the past.").waitFor();
    expect(await page.getByRole("listitem").filter({ hasText: NEW_STUDENT.name }).count()).toBe(0);
    const goal = page.getByLabel(/^Tempo goal for/).first();
    await goal.fill("500");
    await page.getByLabel("Due date").fill(new Date(Date.now() + 7 * 86_400_000).toISOString().slice(0, 10));
    await page.getByRole("button", { name: "Assign and e-mail" }).click();
    await page.getByText("Tempo must be at most 300 bpm.").waitFor();
    await goal.fill("84");
    await page.getByRole("button", { name: "Assign and e-mail" }).click();
    await page.getByText(/Assigned to 1 student/).waitFor();
    await page.getByRole("listitem").filter({ hasText: NEW_STUDENT.name }).first().waitFor();
  });

  test("the student sees the assigned sheet engraved, with goals and the caution, and logs practice", async () => {
    const { page } = student;
    await page.goto("/my");
    const open = page.getByRole("link", { name: new RegExp(DEMO_SHEET_TITLE) }).first();
    assignmentPath = (await open.getAttribute("href"))!;
    expect(assignmentPath).toMatch(/^\/my\/assignments\//);
    await open.click();
    await page.waitForURL(`**${assignmentPath}`);
    const drills = page.getByTestId("student-drill");
    await drills.first().locator("svg").first().waitFor({ timeout: 60_000 });
    expect(await drills.count()).toBeGreaterThan(0);
    await expect(page.getByText("start ♩ = 54 → goal ♩ = 84").first().isVisible()).resolves.toBe(true);
    await expect(page.getByTestId("caution").textContent()).resolves.toContain(CAUTION.text);

    // bad input: messages, and nothing in the history
    await page.getByLabel("Minutes").fill("-5");
    await page.getByLabel(/^Tempo reached for/).first().fill("0");
    await page.getByLabel("Comment").fill("x".repeat(10_000));
    await page.getByRole("button", { name: "Save practice" }).click();
    await page.getByText("At least 1 minute.").waitFor();
    await page.getByText("Tempo must be at least 20 bpm.").waitFor();
    await page.getByText("Keep the comment under 2,000 characters.").waitFor();
    expect(await page.getByTestId("history").count()).toBe(0);

    await page.getByLabel("Minutes").fill("20");
    await page.getByLabel(/^Tempo reached for/).first().fill("66");
    await page.getByLabel("Comment").fill("Triplets even at 66.");
    await page.getByLabel("4", { exact: true }).check();
    await page.getByRole("button", { name: "Save practice" }).click();
    await page.getByText("Practice saved. Well done.").or(page.locator("[role=alert]").first()).first().waitFor();
    await shoot(page, "student-sheet-after-save");
    const alerts = await page.getByRole("form", { name: "Log practice" }).locator("[role=alert]").allTextContents();
    expect(alerts.filter((a) => a.trim())).toEqual([]);
    await page.getByText("Practice saved. Well done.").waitFor();
    await page.getByTestId("history").getByText("20 min · ease 4/5").waitFor();

    const violations = await seriousViolations(page);
    expect(violations, describeViolations(violations)).toEqual([]);
    await shoot(page, "student-sheet-390");
    await page.setViewportSize({ width: 1280, height: 900 });
    await shoot(page, "student-sheet-1280");

    const pdf = await page.request.get(`/api/sheets/${await sheetIdOf(page)}/handout`, { timeout: 90_000 }); // the first handout loads the engraver: slow on a busy machine
    expect(pdf.status()).toBe(200);
    expect(pdf.headers()["content-type"]).toBe("application/pdf");
  });

  test("another student cannot open the first student's sheet (404)", async () => {
    const other = await newPage(390);
    await signIn(other.page, "jonah@knotwork.test", "practise-slowly", "/my");
    const res = await other.page.goto(assignmentPath);
    expect(res?.status()).toBe(404);
    await other.context.close();
  });

  test("the teacher sees the entry in the progress table and chart", async () => {
    const { page } = teacher;
    await page.goto("/progress");
    await page.getByRole("link", { name: NEW_STUDENT.name }).click();
    await page.waitForURL(/student=/);
    const row = page.getByTestId("progress-table").getByRole("row").filter({ hasText: "Triplets even at 66." });
    await row.waitFor();
    await expect(row.textContent()).resolves.toMatch(/20.*♩ 66/);
    // one entry is one point: the line is a single dot, drawn but with no visible length
    await page.getByTestId("tempo-chart").locator(".recharts-line").first().waitFor({ state: "attached" });
    expect(await page.getByTestId("tempo-chart").locator(".recharts-line-dots circle, .recharts-dot").count()).toBeGreaterThan(0);
    await shoot(page, "progress-1280");
  });
});

async function sheetIdOf(page: Page): Promise<string> {
  const href = await page.getByRole("link", { name: "Print / Download PDF" }).getAttribute("href");
  return href!.match(/\/api\/sheets\/([^/]+)\/handout/)![1];
}
