import fs from "node:fs";
import { afterAll, beforeAll, describe, expect, inject, test } from "vitest";
import type { Browser } from "playwright-core";
import { CAUTION } from "@/lib/caution";
import { launchChromium, shoot } from "./chromium";

const baseURL = inject("baseURL");
let browser: Browser;

beforeAll(async () => {
  browser = await launchChromium();
});
afterAll(async () => {
  await browser?.close();
});

async function newPage(width: number) {
  const context = await browser.newContext({ viewport: { width, height: 900 }, baseURL });
  return { context, page: await context.newPage() };
}

describe("foundation in the browser", () => {
  test("landing explains the product at phone and desktop widths", async () => {
    for (const width of [390, 1280]) {
      const { context, page } = await newPage(width);
      const res = await page.goto("/");
      expect(res?.status()).toBe(200);
      await expect(page.getByRole("heading", { level: 1 }).textContent()).resolves.toMatch(/bars that trip/);
      await expect(page.getByText("What is a knot?").isVisible()).resolves.toBe(true);
      await expect(page.getByText(CAUTION.text).isVisible()).resolves.toBe(true);
      // Nothing wider than the viewport on a phone.
      const wide = await page.evaluate(() =>
        [...document.querySelectorAll("body *")]
          .filter((el) => el.getBoundingClientRect().right > window.innerWidth + 0.5)
          .slice(0, 3)
          .map((el) => `${el.tagName.toLowerCase()}.${el.className}`.slice(0, 80)),
      );
      expect(wide, `wider than ${width}px`).toEqual([]);
      expect(fs.existsSync(await shoot(page, `landing-${width}`))).toBe(true);
      await context.close();
    }
  });

  test("anonymous visitors to a teacher page are sent to sign-in", async () => {
    const { context, page } = await newPage(1280);
    await page.goto("/pieces");
    expect(new URL(page.url()).pathname).toBe("/sign-in");
    await context.close();
  });

  test("a teacher signs up through the real form and lands on teacher home", async () => {
    const { context, page } = await newPage(1280);
    await page.goto("/sign-up");
    // Bad input first: a short password is named in the message and nothing is created.
    await page.getByLabel("Your name").fill("Bea Vantongeren");
    await page.getByLabel("E-mail").fill("bea@knotwork.test");
    await page.getByLabel("Password").fill("short");
    await page.getByLabel("Studio name").fill("Mossgate Studio");
    await page.getByRole("button", { name: "Create studio" }).click();
    await page.getByText("Password must be at least 8 characters.").waitFor();
    expect(new URL(page.url()).pathname).toBe("/sign-up");

    await page.getByLabel("Password").fill("a-good-long-password");
    await page.getByRole("button", { name: "Create studio" }).click();
    await page.waitForURL("**/home");
    await expect(page.getByRole("heading", { level: 1 }).textContent()).resolves.toContain("Bea");
    await expect(page.getByText("Mossgate Studio").first().isVisible()).resolves.toBe(true);
    await expect(page.getByText("No pieces yet").isVisible()).resolves.toBe(true);
    for (const label of ["Home", "Pieces", "Knots", "Drill sheets", "Students"]) {
      await expect(page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: label, exact: true }).count()).resolves.toBe(1);
    }
    await shoot(page, "teacher-home-new-1280");
    await page.setViewportSize({ width: 390, height: 900 });
    await shoot(page, "teacher-home-new-390");
    await page.getByRole("button", { name: "Sign out" }).click();
    await page.waitForURL((u) => u.pathname === "/");
    await context.close();
  });

  test("the demo teacher sees the demo pieces on teacher home", async () => {
    for (const width of [1280, 390]) {
      const { context, page } = await newPage(width);
      await page.goto("/sign-in");
      await page.getByLabel("E-mail").fill("teacher@knotwork.test");
      await page.getByLabel("Password").fill("practise-slowly");
      await page.getByRole("button", { name: "Sign in" }).click();
      await page.waitForURL("**/home");
      await expect(page.getByText("Pebble Study").first().isVisible()).resolves.toBe(true);
      await shoot(page, `teacher-home-${width}`);
      await context.close();
    }
  });

  test("the demo student signs in to their home and gets 403 on teacher pages", async () => {
    const { context, page } = await newPage(390);
    await page.goto("/sign-in");
    await page.getByLabel("E-mail").fill("tamsin@knotwork.test");
    await page.getByLabel("Password").fill("practise-slowly");
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.waitForURL("**/my");
    await expect(page.getByRole("heading", { name: "My drill sheets" }).isVisible()).resolves.toBe(true);
    await shoot(page, "student-home-390");
    for (const path of ["/home", "/pieces", "/knots", "/sheets", "/students"]) {
      const res = await page.goto(path);
      expect(res?.status(), path).toBe(403);
      await expect(page.getByText("This page is not for your role").isVisible()).resolves.toBe(true);
    }
    await context.close();
  });
});
