import fs from "node:fs";
import { afterAll, beforeAll, describe, expect, inject, test } from "vitest";
import { type Browser, type Page } from "playwright-core";
import { launchChromium, shoot } from "./chromium";

const baseURL = inject("baseURL");
let browser: Browser;

beforeAll(async () => {
  browser = await launchChromium(["--autoplay-policy=no-user-gesture-required"]);
});
afterAll(async () => {
  await browser?.close();
});

async function openLab(width: number, piece = "lantern-waltz") {
  const context = await browser.newContext({ viewport: { width, height: 900 }, baseURL });
  const page = await context.newPage();
  const res = await page.goto(`/lab/score?piece=${piece}`);
  expect(res?.status()).toBe(200);
  await page.waitForSelector('section[data-status="ready"]', { timeout: 90_000 });
  return { context, page };
}

/** The centre of a bar cell of the overlay, scrolled into view. */
async function cellCentre(page: Page, bar: number, staff: number) {
  return page.$eval(`[data-bar="${bar}"][data-staff="${staff}"]`, (el) => {
    el.scrollIntoView({ block: "center" });
    const r = el.getBoundingClientRect();
    return { x: r.x + r.width / 2, y: r.y + r.height / 2 };
  });
}

const text = (page: Page, id: string) => page.textContent(`[data-testid="${id}"]`);

describe("score components in the browser", () => {
  test("bars are selected by click, shift-click, drag and keyboard, with highlights per staff", async () => {
    for (const width of [1280, 390]) {
      const { context, page } = await openLab(width);
      // The lab's piece has 17 bars (a pickup plus 16) on two staves: one overlay cell per bar per staff.
      expect(await page.locator("[data-bar][data-staff]").count()).toBe(34);
      let c = await cellCentre(page, 2, 0);
      await page.mouse.click(c.x, c.y);
      expect(await text(page, "lab-selection")).toBe("2-2 right");
      c = await cellCentre(page, 3, 0);
      await page.keyboard.down("Shift");
      await page.mouse.click(c.x, c.y);
      await page.keyboard.up("Shift");
      expect(await text(page, "lab-selection")).toBe("2-3 right");
      // Printed numbers: the pickup is bar 0, so index 2 is bar 2.
      expect(await text(page, "score-announcement")).toBe("Bars 2–3 selected, right hand");
      expect(await page.locator('[data-staff="0"][data-selected="true"]').count()).toBe(2);
      expect(await page.locator('[data-staff="1"][data-selected="true"]').count()).toBe(0);

      const from = await cellCentre(page, 1, 1);
      await page.mouse.move(from.x, from.y);
      await page.mouse.down();
      const to = await page.$eval('[data-bar="4"][data-staff="1"]', (el) => {
        const r = el.getBoundingClientRect();
        return { x: r.x + r.width / 2, y: r.y + r.height / 2 };
      });
      await page.mouse.move(to.x, to.y, { steps: 8 });
      await page.mouse.up();
      expect(await text(page, "lab-selection")).toBe("1-4 left");

      await page.keyboard.press("ArrowRight");
      expect(await text(page, "lab-selection")).toBe("5-5 left");
      await page.keyboard.press("Shift+ArrowRight");
      expect(await text(page, "lab-selection")).toBe("5-6 left");
      await page.keyboard.press("Shift+ArrowUp");
      await page.keyboard.press("Enter");
      expect(await text(page, "lab-confirmed")).toBe("5-6 both");
      expect(await page.locator('[data-selected="true"]').count()).toBe(4);
      expect(fs.existsSync(await shoot(page, `score-view-selection-${width}`))).toBe(true);
      await context.close();
    }
  });

  test("drill previews render as SVG, lazily", async () => {
    const { context, page } = await openLab(1280, "two-ribbons");
    await page.evaluate(() => window.scrollTo(0, document.body.scrollHeight));
    await page.waitForFunction(() => document.querySelectorAll('[data-testid="drill-preview"] svg').length >= 5, null, {
      timeout: 60_000,
    });
    expect(await page.locator('[data-testid="drill-preview"] svg').count()).toBeGreaterThanOrEqual(5);
    await context.close();
  });

  test("pressing play starts the audio context and the cursor moves", async () => {
    const { context, page } = await openLab(1280, "pebble-study");
    const player = page.getByTestId("player");
    expect(await player.getAttribute("data-audio-state")).toBe("not-started");
    await page.getByRole("button", { name: "Play" }).click();
    await page.waitForFunction(() => document.querySelector('[data-testid="player"]')?.getAttribute("data-state") === "playing", null, {
      timeout: 30_000,
    });
    expect(await player.getAttribute("data-audio-state")).toBe("running");
    const first = Number(await player.getAttribute("data-position"));
    // After the one-bar count-in (4 beats at 92 bpm ≈ 2.6 s) the position advances.
    await page.waitForFunction(
      (p) => Number(document.querySelector('[data-testid="player"]')?.getAttribute("data-position")) > p + 0.5,
      first,
      { timeout: 15_000 },
    );
    expect(await page.locator('[data-cursor="true"]').count()).toBe(1);
    await page.getByRole("button", { name: "Pause" }).click();
    expect(await player.getAttribute("data-state")).toBe("paused");
    await context.close();
  });
});
