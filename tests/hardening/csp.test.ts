/**
 * The Content-Security-Policy in next.config.ts must not break the engraver (OSMD: inline SVG,
 * data: URIs) or playback (tone: AudioContext, blob: worklets, samples from this origin). Chromium
 * opens the score lab, the piece page and the sheet page of the production build with the policy on,
 * engraving and playback must work, and the page must report no policy violation.
 */
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { type Browser, type BrowserContext, type Page } from "playwright-core";
import { baseURL, cookies, ids } from "./context";
import { launchChromium } from "../browser/chromium";

let browser: Browser;

beforeAll(async () => {
  browser = await launchChromium(["--autoplay-policy=no-user-gesture-required"]);
});
afterAll(async () => {
  await browser?.close();
});

/** A page that records every CSP violation (the DOM event and the console's "Refused to …" lines). */
async function watchedPage(cookieHeader = ""): Promise<{ context: BrowserContext; page: Page; violations: string[] }> {
  const context = await browser.newContext({ baseURL, viewport: { width: 1280, height: 900 } });
  if (cookieHeader) {
    await context.addCookies(cookieHeader.split("; ").map((c) => {
      const i = c.indexOf("=");
      return { name: c.slice(0, i), value: c.slice(i + 1), url: baseURL };
    }));
  }
  const violations: string[] = [];
  await context.exposeFunction("__reportCsp", (v: string) => violations.push(v));
  await context.addInitScript(() => {
    document.addEventListener("securitypolicyviolation", (e) => {
      (window as unknown as { __reportCsp: (v: string) => void }).__reportCsp(`${e.violatedDirective} ${e.blockedURI}`);
    });
  });
  const page = await context.newPage();
  page.on("console", (m) => {
    if (/Content Security Policy|Refused to/i.test(m.text())) violations.push(m.text());
  });
  return { context, page, violations };
}

async function openWithPolicy(page: Page, url: string) {
  const res = await page.goto(url);
  expect(res?.status(), url).toBe(200);
  expect((await res!.allHeaders())["content-security-policy"], "the policy is on").toContain("default-src 'self'");
}

describe("the Content-Security-Policy leaves engraving and playback working", () => {
  test("score lab: the score engraves and playback runs", async () => {
    const { context, page, violations } = await watchedPage();
    await openWithPolicy(page, "/lab/score?piece=pebble-study");
    await page.waitForSelector('section[data-status="ready"] svg', { timeout: 90_000 });
    const player = page.getByTestId("player");
    await page.getByRole("button", { name: "Play" }).click();
    await page.waitForFunction(() => document.querySelector('[data-testid="player"]')?.getAttribute("data-state") === "playing", null, { timeout: 30_000 });
    expect(await player.getAttribute("data-audio-state")).toBe("running");
    const first = Number(await player.getAttribute("data-position"));
    await page.waitForFunction(
      (p) => Number(document.querySelector('[data-testid="player"]')?.getAttribute("data-position")) > p + 0.5,
      first,
      { timeout: 15_000 },
    );
    await page.getByRole("button", { name: "Pause" }).click();
    expect(violations).toEqual([]);
    await context.close();
  });

  test("piece page and sheet page: scores and drills engrave as SVG", async () => {
    const { context, page, violations } = await watchedPage(cookies.demoTeacher);
    await openWithPolicy(page, `/pieces/${ids.scoreId}`);
    await page.waitForFunction(() => document.querySelectorAll("svg path").length > 50, null, { timeout: 90_000 });
    await openWithPolicy(page, `/sheets/${ids.sheetId}`);
    await page.evaluate(() => window.scrollTo(0, document.body.scrollHeight));
    await page.waitForFunction(() => document.querySelectorAll("svg path").length > 50, null, { timeout: 90_000 });
    expect(violations).toEqual([]);
    await context.close();
  });
});
