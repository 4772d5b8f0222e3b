// What the light first load keeps working: sign-in, sign-out and password reset as plain requests to
// the auth routes, and the pieces and students tables that arrive as plain server HTML and become
// interactive (TanStack Table) once their lazily loaded code is in.
import { afterAll, beforeAll, describe, expect, inject, test } from "vitest";
import type { Browser, BrowserContext } from "playwright-core";
import { launchChromium } from "./chromium";

const baseURL = inject("baseURL");
const TEACHER = { email: "teacher@knotwork.test", password: "practise-slowly" };
let browser: Browser;
let session: Awaited<ReturnType<BrowserContext["storageState"]>>;

beforeAll(async () => {
  browser = await launchChromium();
  const context = await browser.newContext({ baseURL });
  const page = await context.newPage();
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill(TEACHER.email);
  await page.getByLabel("Password").fill(TEACHER.password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL("**/home");
  session = await context.storageState();
  await context.close();
});
afterAll(async () => {
  await browser?.close();
});

const open = async (javaScriptEnabled = true) => {
  const context = await browser.newContext({ baseURL, viewport: { width: 1280, height: 900 }, storageState: session, javaScriptEnabled });
  return { context, page: await context.newPage() };
};

describe("auth through plain requests", () => {
  test("a wrong password is named; sign-in, then sign-out ends the session", async () => {
    const context = await browser.newContext({ baseURL });
    const page = await context.newPage();
    await page.goto("/sign-in");
    await page.getByLabel("E-mail").fill(TEACHER.email);
    await page.getByLabel("Password").fill("not-the-password");
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.getByText("That e-mail and password do not match an account.").waitFor();
    await page.getByLabel("Password").fill(TEACHER.password);
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.waitForURL("**/home");

    const signOut = page.waitForResponse((r) => r.url().endsWith("/api/auth/sign-out"));
    await page.getByRole("button", { name: "Sign out" }).click();
    expect((await signOut).status()).toBe(200);
    await page.waitForURL((u) => u.pathname === "/");
    // The session is gone on the server, not only in this tab: a teacher page sends us to sign-in.
    await page.goto("/pieces");
    expect(new URL(page.url()).pathname).toBe("/sign-in");
    await context.close();
  });

  test("forgot password → mail in the outbox → new password → sign in with it", async () => {
    const context = await browser.newContext({ baseURL });
    const page = await context.newPage();
    const who = { name: "Pell Ardwin", email: "pell@knotwork.test", password: "first-long-password" };
    await page.goto("/sign-up");
    await page.getByLabel("Your name").fill(who.name);
    await page.getByLabel("E-mail").fill(who.email);
    await page.getByLabel("Password").fill(who.password);
    await page.getByLabel("Studio name").fill("Larchgate Studio");
    await page.getByRole("button", { name: "Create studio" }).click();
    await page.waitForURL("**/home");
    await page.getByRole("button", { name: "Sign out" }).click();
    await page.waitForURL((u) => u.pathname === "/");

    await page.goto("/forgot-password");
    await page.getByLabel("E-mail").fill(who.email);
    await page.getByRole("button", { name: "Send reset link" }).click();
    await page.getByText(/a reset link is on its way/).waitFor();

    await page.goto("/dev/outbox");
    const mail = page.getByTestId("outbox-mail").filter({ hasText: who.email }).first();
    const link = await mail.locator("a[href*='reset-password']").first().getAttribute("href");
    expect(link).toBeTruthy();
    await page.goto(link!);
    await page.waitForURL("**/reset-password?token=*");
    await page.getByLabel("New password").fill("second-long-password");
    await page.getByRole("button", { name: "Save new password" }).click();
    await page.getByText("Your password is changed.").waitFor();

    await page.goto("/sign-in");
    await page.getByLabel("E-mail").fill(who.email);
    await page.getByLabel("Password").fill("second-long-password");
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.waitForURL("**/home");
    await context.close();
  });
});

describe("tables: plain from the server, interactive once loaded", () => {
  test("pieces: rows and links without scripts; filter and sort once the table is loaded", async () => {
    const plain = await open(false);
    await plain.page.goto("/pieces");
    const table = plain.page.getByRole("table", { name: "Pieces" });
    expect(await table.getByRole("link", { name: "Lantern Waltz" }).count()).toBe(1);
    expect(await table.getByRole("button").count()).toBe(0);
    await plain.context.close();

    const { context, page } = await open();
    await page.goto("/pieces");
    const filter = page.getByLabel("Filter pieces");
    await expect.poll(() => filter.isEnabled()).toBe(true);
    const rows = page.getByRole("table", { name: "Pieces" }).locator("tbody tr");
    const all = await rows.count();
    expect(all).toBeGreaterThan(1);
    await filter.fill("Lantern");
    await expect.poll(() => rows.count()).toBe(1);
    await filter.fill("");
    await expect.poll(() => rows.count()).toBe(all);
    const title = page.getByRole("columnheader", { name: /Title/ });
    await title.getByRole("button").click();
    await expect.poll(() => title.getAttribute("aria-sort")).toBe("ascending");
    await page.getByRole("button", { name: "Delete Lantern Waltz" }).click();
    await page.getByRole("dialog").getByRole("button", { name: "Keep it" }).click();
    expect(await page.getByRole("link", { name: "Lantern Waltz" }).count()).toBe(1);
    await context.close();
  });

  test("students: rows without scripts; sorting by name once the table is loaded", async () => {
    const plain = await open(false);
    await plain.page.goto("/students");
    const names = (p: typeof plain.page) => p.getByTestId("students-table").locator("tbody tr td:first-child").allTextContents();
    const served = await names(plain.page);
    expect(served.length).toBeGreaterThan(1);
    expect(served).toEqual([...served].sort((a, b) => a.localeCompare(b)));
    await plain.context.close();

    const { context, page } = await open();
    await page.goto("/students");
    const sortByName = page.getByRole("columnheader", { name: /Name/ }).getByRole("button");
    await sortByName.click();
    await expect.poll(() => names(page)).toEqual([...served].reverse());
    await context.close();
  });
});

describe("main navigation", () => {
  test("the current section is marked, and the mark follows a client-side navigation", async () => {
    const { context, page } = await open();
    await page.goto("/pieces");
    const nav = page.getByRole("navigation", { name: "Main" });
    const current = () => nav.locator('[aria-current="page"]').allTextContents();
    await expect.poll(current).toEqual(["Pieces"]);
    await nav.getByRole("link", { name: "Students", exact: true }).click();
    await page.waitForURL("**/students");
    await expect.poll(current).toEqual(["Students"]);
    await page.goto("/pieces/does-not-matter-which");
    await expect.poll(current).toEqual(["Pieces"]);
    await context.close();
  });
});
