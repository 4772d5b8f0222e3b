import type { Page } from "playwright-core";
import { readScore } from "../../lib/score";
import type { Score } from "../../lib/score/types";

export const DEMO = { email: "teacher@knotwork.test", password: "practise-slowly" };

export async function signIn(page: Page) {
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill(DEMO.email);
  await page.getByLabel("Password").fill(DEMO.password);
  await page.getByRole("button", { name: "Sign in" }).click();
  await page.waitForURL("**/home");
}

/** The seeded knot's generate-screen path, found through the knots list. */
export async function seededKnotPath(page: Page): Promise<string> {
  await page.goto("/knots");
  const card = page.locator("li", { hasText: "Triplets rush after the thumb" }).first();
  const href = await card.locator('a[href^="/knots/"]').first().getAttribute("href");
  if (!href) throw new Error("the seeded knot has no link to its generate screen");
  return href;
}

/** Presses Tab until the focused element matches `selector` (keyboard only, no mouse). */
export async function tabTo(page: Page, selector: string, max = 400): Promise<void> {
  for (let i = 0; i < max; i++) {
    if (await page.evaluate((s) => document.activeElement?.matches(s) ?? false, selector)) return;
    await page.keyboard.press("Tab");
  }
  throw new Error(`Tab never reached ${selector}`);
}

/** Drill keys shown on the sheet builder, in order. */
export function sheetOrder(page: Page): Promise<(string | null)[]> {
  return page.locator('[data-testid="sheet-item"]').evaluateAll((els) => els.map((e) => e.getAttribute("data-key")));
}

/** Waits until at least `n` drill previews hold an engraved SVG, scrolling each into view. */
export async function waitForEngravings(page: Page, n: number) {
  const cards = page.locator('[data-testid="drill-card"]');
  await cards.nth(n - 1).waitFor();
  for (let i = 0; i < n; i++) {
    await cards.nth(i).scrollIntoViewIfNeeded();
    await cards.nth(i).locator('[data-testid="drill-preview"][data-status="ready"] svg').first().waitFor({ timeout: 30_000 });
  }
}

/** Pitched notes as "midi@onset/duration", sorted. */
export function notesOf(bytes: Uint8Array | string): string[] {
  const { score } = readScore(bytes);
  return pitched(score).map((e) => `${e.pitch!.midi}@${e.onset.toFraction()}/${e.duration.toFraction()}`).sort();
}

function pitched(score: Score) {
  return score.events.filter((e) => e.pitch);
}

/** The model's sounding notes: pitched, not grace, not a tie's continuation. */
export function soundingCount(bytes: Uint8Array | string): number {
  return pitched(readScore(bytes).score).filter((e) => !e.grace && e.tie !== "stop" && e.tie !== "continue").length;
}
