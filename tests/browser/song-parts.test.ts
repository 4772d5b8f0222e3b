// A song (voice + piano) on the piece page: only the piano's two staves can be selected as hands; the
// voice staff is shown but never selected. The song is a real score of the corpus
// (fixtures/reference/scores/easy-01_schroter_der-eistanz.mxl; SOURCES.md: "a vocal part plus a two-staff
// piano part", the voice first). The piece is deleted again at the end, so the other files start clean.
import path from "node:path";
import { afterAll, beforeAll, describe, expect, inject, test } from "vitest";
import type { Browser, Page } from "playwright-core";
import { launchChromium, shoot } from "./chromium";
import { repoRoot } from "./server";

const baseURL = inject("baseURL");
let browser: Browser;
// The file's <work-title> (the set's title; SOURCES.md says so), which the pieces table shows.
const TITLE = "25 Lieder";

beforeAll(async () => {
  browser = await launchChromium();
});
afterAll(async () => {
  await browser?.close();
});

async function cellCentre(page: Page, bar: number, staff: number) {
  return page.$eval(`[data-bar="${bar}"][data-staff="${staff}"]`, (el) => {
    el.scrollIntoView({ block: "center" });
    const r = el.getBoundingClientRect();
    return { x: r.x + r.width / 2, y: r.y + r.height / 2 };
  });
}

describe("a song's piano part", () => {
  test("only the piano's staves are selectable as hands; the voice staff is not", async () => {
    const context = await browser.newContext({ viewport: { width: 1280, height: 900 }, baseURL });
    const page = await context.newPage();
    await page.goto("/sign-in");
    await page.getByLabel("E-mail").fill("teacher@knotwork.test");
    await page.getByLabel("Password").fill("practise-slowly");
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.waitForURL("**/home");
    await page.goto("/pieces");
    await page.locator('input[type="file"]').setInputFiles(path.join(repoRoot, "fixtures/reference/scores/easy-01_schroter_der-eistanz.mxl"));
    const box = page.getByLabel("This piece is in the public domain or my own work.");
    if (!(await box.isChecked())) await box.check();
    await page.getByRole("button", { name: "Upload piece" }).click();
    const link = page.getByRole("table", { name: "Pieces" }).getByRole("link", { name: TITLE });
    await link.waitFor();
    await link.click();
    await page.waitForURL("**/pieces/*");
    await page.waitForSelector('section[data-status="ready"]', { timeout: 90_000 });

    // Three engraved staves: 0 = voice (not a hand), 1 = piano upper = right, 2 = piano lower = left.
    expect(await page.locator('[data-bar="2"][data-staff="0"]').getAttribute("data-hand")).toBe("none");
    expect(await page.locator('[data-bar="2"][data-staff="1"]').getAttribute("data-hand")).toBe("right");
    expect(await page.locator('[data-bar="2"][data-staff="2"]').getAttribute("data-hand")).toBe("left");

    // A click on the voice staff selects nothing.
    let c = await cellCentre(page, 2, 0);
    await page.mouse.click(c.x, c.y);
    expect(await page.locator('[data-selected="true"]').count()).toBe(0);

    // The piano's lower staff is the left hand; only its cells are selected.
    c = await cellCentre(page, 2, 2);
    await page.mouse.click(c.x, c.y);
    expect(await page.locator('[data-staff="2"][data-selected="true"]').count()).toBe(1);
    expect(await page.locator('[data-staff="0"][data-selected="true"], [data-staff="1"][data-selected="true"]').count()).toBe(0);
    expect(await page.getByTestId("knot-selection").textContent()).toContain("left hand");

    // "Both hands" from the keyboard never takes in the voice staff.
    await page.keyboard.press("Shift+ArrowUp");
    expect(await page.locator('[data-staff="1"][data-selected="true"]').count()).toBe(1);
    expect(await page.locator('[data-staff="2"][data-selected="true"]').count()).toBe(1);
    expect(await page.locator('[data-staff="0"][data-selected="true"]').count()).toBe(0);
    await shoot(page, "song-piano-part");

    // Clean up: delete the piece through the page.
    await page.goto("/pieces");
    await page.getByRole("button", { name: `Delete ${TITLE}` }).click();
    const dialog = page.getByRole("dialog");
    await dialog.getByRole("button", { name: "Delete piece" }).click();
    await dialog.waitFor({ state: "hidden" });
    await context.close();
  });
});
