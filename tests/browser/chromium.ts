import fs from "node:fs";
import path from "node:path";
import { chromium, type Browser, type Page } from "playwright-core";
import { repoRoot } from "./server";

/** Debian chromium driven by playwright-core (flags from the project's stack notes), plus any extra flags. */
export async function launchChromium(extraArgs: readonly string[] = []): Promise<Browser> {
  return chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium",
    headless: true,
    args: [
      "--headless",
      "--no-sandbox",
      "--disable-gpu",
      "--disable-quic",
      "--no-first-run",
      "--disable-background-networking",
      "--disable-component-update",
      "--disable-sync",
      ...extraArgs,
    ],
  });
}

export const screenshotDir = path.join(repoRoot, "artifacts/screenshots");

/** Full-page screenshot into artifacts/screenshots (git-ignored). */
export async function shoot(page: Page, name: string): Promise<string> {
  fs.mkdirSync(screenshotDir, { recursive: true });
  const file = path.join(screenshotDir, `${name}.png`);
  await page.screenshot({ path: file, fullPage: true });
  return file;
}
