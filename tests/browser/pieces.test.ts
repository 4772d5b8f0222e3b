// The teacher's piece workflow through the real pages: upload, table, piece page, bar selection by
// mouse and by keyboard, knot saved and listed; hostile files refused with nothing stored; axe checks.
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { createClient, type Client } from "@libsql/client";
import { afterAll, beforeAll, describe, expect, inject, test } from "vitest";
import type { Browser, Page } from "playwright-core";
import { describeViolations, seriousViolations } from "./axe";
import { launchChromium, screenshotDir, shoot } from "./chromium";
import { repoRoot } from "./server";

const baseURL = inject("baseURL");
const uploadsDir = inject("uploadsDir");
let browser: Browser;
let dbClient: Client;
let tmp: string;
const UPLOAD_TITLE = "Pebble Study (upload check)";

beforeAll(async () => {
  browser = await launchChromium();
  dbClient = createClient({ url: `file:${inject("databaseFile")}` });
  tmp = fs.mkdtempSync(path.join(os.tmpdir(), "knotwork-pieces-"));
  // A demo fixture piece under its own title, so it is told apart from the seeded copy.
  const xml = fs.readFileSync(path.join(repoRoot, "fixtures/pieces/pebble-study.musicxml"), "utf8");
  fs.writeFileSync(path.join(tmp, "pebble-upload.musicxml"), xml.replace(/<work-title>[^<]*<\/work-title>/, `<work-title>${UPLOAD_TITLE}</work-title>`));
});
afterAll(async () => {
  dbClient?.close();
  await browser?.close();
  fs.rmSync(tmp, { recursive: true, force: true });
});

let session: Awaited<ReturnType<import("playwright-core").BrowserContext["storageState"]>> | null = null;

/** A context signed in as the demo teacher; the sign-in form is used once and its cookies reused. */
async function signedIn(width: number) {
  if (!session) {
    const first = await browser.newContext({ baseURL });
    const page = await first.newPage();
    await page.goto("/sign-in");
    await page.getByLabel("E-mail").fill("teacher@knotwork.test");
    await page.getByLabel("Password").fill("practise-slowly");
    await page.getByRole("button", { name: "Sign in" }).click();
    await page.waitForURL("**/home");
    session = await first.storageState();
    await first.close();
  }
  const context = await browser.newContext({ viewport: { width, height: 900 }, baseURL, storageState: session });
  return { context, page: await context.newPage() };
}

const scoreRows = async () => Number((await dbClient.execute("select count(*) as n from score")).rows[0]!.n);
const storedFiles = () => (fs.existsSync(uploadsDir) ? fs.readdirSync(uploadsDir).length : 0);

async function upload(page: Page, file: string) {
  await page.locator('input[type="file"]').setInputFiles(file);
  const box = page.getByLabel("This piece is in the public domain or my own work.");
  if (!(await box.isChecked())) await box.check();
  await page.getByRole("button", { name: "Upload piece" }).click();
}

async function cellCentre(page: Page, bar: number, staff: number) {
  return page.$eval(`[data-bar="${bar}"][data-staff="${staff}"]`, (el) => {
    el.scrollIntoView({ block: "center" });
    const r = el.getBoundingClientRect();
    return { x: r.x + r.width / 2, y: r.y + r.height / 2 };
  });
}

async function tabTo(page: Page, selector: string, max = 200) {
  for (let i = 0; i < max; i++) {
    if (await page.evaluate((s) => document.activeElement?.matches(s) ?? false, selector)) return;
    await page.keyboard.press("Tab");
  }
  throw new Error(`Tab never reached ${selector}`);
}

describe("pieces in the browser", () => {
  test("upload through the form, open the piece, mark a knot by mouse and one by keyboard", async () => {
    const { context, page } = await signedIn(1280);
    await page.goto("/pieces");
    // The cap is shown before any upload.
    expect(await page.getByText("up to 5 MB").isVisible()).toBe(true);
    const rows = await scoreRows();
    await upload(page, path.join(tmp, "pebble-upload.musicxml"));
    await page.getByText(`Uploaded ${UPLOAD_TITLE}`).waitFor();
    const link = page.getByRole("table", { name: "Pieces" }).getByRole("link", { name: UPLOAD_TITLE });
    await link.waitFor();
    expect(await scoreRows()).toBe(rows + 1);
    expect(storedFiles()).toBe(1);

    await link.click();
    await page.waitForURL("**/pieces/*");
    await page.waitForSelector('section[data-status="ready"]', { timeout: 90_000 });
    // Right hand (staff 0), bars at indexes 2 and 3: click, then shift-click.
    let c = await cellCentre(page, 2, 0);
    await page.mouse.click(c.x, c.y);
    c = await cellCentre(page, 3, 0);
    await page.keyboard.down("Shift");
    await page.mouse.click(c.x, c.y);
    await page.keyboard.up("Shift");
    expect(await page.locator('[data-staff="0"][data-selected="true"]').count()).toBe(2);
    expect(await page.locator('[data-staff="1"][data-selected="true"]').count()).toBe(0);
    // fixtures/pieces/README.md: Pebble Study has no pickup, so indexes 2–3 are printed bars 3–4.
    expect(await page.getByTestId("knot-selection").textContent()).toContain("bars 3–4, right hand");
    await page.getByText("evenness", { exact: true }).click();
    await page.getByRole("button", { name: "Save knot" }).click();
    await page.getByText("Knot saved: bars 3–4, right hand.").waitFor();
    const knots = page.getByRole("list", { name: "Knots" });
    await knots.getByText("bars 3–4 · right hand").waitFor();
    expect(await knots.getByText("evenness").count()).toBe(1);

    // Keyboard only: into the score, bar index 1 → extend to 2, confirm, tag, save.
    await page.reload();
    await page.waitForSelector('section[data-status="ready"]', { timeout: 90_000 });
    await tabTo(page, '[data-testid="score-frame"]');
    await page.keyboard.press("ArrowRight");
    await page.keyboard.press("Shift+ArrowRight");
    await page.keyboard.press("Enter");
    expect(await page.getByTestId("knot-selection").textContent()).toContain("bars 2–3, right hand");
    await tabTo(page, 'input[type="checkbox"]:not([aria-invalid])');
    while (!(await page.evaluate(() => document.activeElement?.parentElement?.textContent === "evenness"))) await page.keyboard.press("Tab");
    await page.keyboard.press("Space");
    await tabTo(page, 'button[type="submit"]');
    await page.keyboard.press("Enter");
    await page.getByText("Knot saved: bars 2–3, right hand.").waitFor();
    await knots.getByText("bars 2–3 · right hand").waitFor();

    await page.goto("/knots");
    expect(await page.getByRole("link", { name: new RegExp(`${UPLOAD_TITLE.replace(/[()]/g, "\\$&")}.*bars 3–4`) }).count()).toBe(1);

    // Delete with confirmation: the dialog names the two knots; row, knots and file go together.
    await page.goto("/pieces");
    await page.getByRole("button", { name: `Delete ${UPLOAD_TITLE}` }).click();
    const dialog = page.getByRole("dialog");
    expect(await dialog.getByText("Its 2 knots are removed too.").isVisible()).toBe(true);
    await dialog.getByRole("button", { name: "Delete piece" }).click();
    await dialog.waitFor({ state: "hidden" });
    await page.getByRole("table", { name: "Pieces" }).getByRole("link", { name: UPLOAD_TITLE }).waitFor({ state: "detached" });
    expect(await scoreRows()).toBe(rows);
    expect(storedFiles()).toBe(0);
    await context.close();
  });

  test("each hostile file is refused through the real form with a clear message and nothing stored", async () => {
    const { context, page } = await signedIn(1280);
    await page.goto("/pieces");
    const dir = path.join(repoRoot, "fixtures/hostile");
    for (const name of fs.readdirSync(dir).sort()) {
      const rows = await scoreRows();
      const files = storedFiles();
      await upload(page, path.join(dir, name));
      const alert = page.getByRole("alert").filter({ hasText: name });
      await alert.waitFor();
      expect((await alert.textContent())!.length, name).toBeGreaterThan(name.length + 20);
      expect(await scoreRows(), name).toBe(rows);
      expect(storedFiles(), name).toBe(files);
    }
    await shoot(page, "pieces-refused-1280");
    await context.close();
  });

  test("multipart tricks sent straight to the upload handler get 4xx and store nothing", async () => {
    const { context, page } = await signedIn(1280);
    const xml = fs.readFileSync(path.join(tmp, "pebble-upload.musicxml"));
    const cases: { label: string; name: string; mimeType: string; buffer: Buffer; confirm?: string; status: number; message: RegExp }[] = [
      { label: "path in the name", name: "../../pebble.musicxml", mimeType: "text/xml", buffer: xml, confirm: "yes", status: 400, message: /folder path/ },
      { label: "wrong content type", name: "pebble.musicxml", mimeType: "text/html", buffer: xml, confirm: "yes", status: 415, message: /text\/html/ },
      { label: "double extension", name: "pebble.html.xml", mimeType: "text/xml", buffer: xml, confirm: "yes", status: 415, message: /second file type/ },
      { label: "empty file", name: "pebble.musicxml", mimeType: "text/xml", buffer: Buffer.alloc(0), confirm: "yes", status: 400, message: /empty/ },
      { label: "over the cap", name: "big.musicxml", mimeType: "text/xml", buffer: Buffer.alloc(5 * 1024 * 1024 + 10, 0x20), confirm: "yes", status: 413, message: /5 MB/ },
      { label: "no confirmation", name: "pebble.musicxml", mimeType: "text/xml", buffer: xml, status: 400, message: /public domain/ },
    ];
    for (const c of cases) {
      const rows = await scoreRows();
      const files = storedFiles();
      const multipart: Record<string, string | { name: string; mimeType: string; buffer: Buffer }> = { file: { name: c.name, mimeType: c.mimeType, buffer: c.buffer } };
      if (c.confirm) multipart.confirm = c.confirm;
      // A state-changing request carries the page's Origin, as a browser sends it (the Origin rule in proxy.ts).
      const res = await page.request.post("/api/pieces", { multipart, headers: { origin: new URL(baseURL).origin } });
      expect(res.status(), c.label).toBe(c.status);
      expect(((await res.json()) as { error: string }).error, c.label).toMatch(c.message);
      expect(await scoreRows(), c.label).toBe(rows);
      expect(storedFiles(), c.label).toBe(files);
    }
    const anonymous = await browser.newContext({ baseURL });
    expect((await anonymous.request.get("/api/pieces")).status()).toBe(401);
    await anonymous.close();
    await context.close();
  });

  test("pieces and piece pages pass axe (no serious or critical) and look finished at 390 and 1280 px", async () => {
    for (const width of [1280, 390]) {
      const { context, page } = await signedIn(width);
      await page.goto("/pieces");
      await page.getByRole("table", { name: "Pieces" }).waitFor();
      let found = await seriousViolations(page);
      expect(found, describeViolations(found)).toEqual([]);
      await shoot(page, `pieces-${width}`);
      const wide = await page.evaluate(() =>
        [...document.querySelectorAll("body *")]
          .filter((el) => el.getBoundingClientRect().right > window.innerWidth + 1 && !el.closest(".overflow-x-auto"))
          .slice(-3)
          .map((el) => `${el.tagName.toLowerCase()}.${String(el.className).slice(0, 60)}`),
      );
      expect(wide, "elements wider than the phone screen").toEqual([]);
      const overflow = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
      expect(overflow, "the page scrolls sideways").toBeLessThanOrEqual(0);

      await page.getByRole("table", { name: "Pieces" }).getByRole("link", { name: "Lantern Waltz" }).click();
      await page.waitForSelector('section[data-status="ready"]', { timeout: 90_000 });
      await page.getByLabel("Show difficulty").check();
      await page.getByRole("heading", { name: "Hardest bars" }).waitFor();
      found = await seriousViolations(page);
      expect(found, describeViolations(found)).toEqual([]);
      await shoot(page, `piece-${width}`);
      // Picking a hardest bar selects it in the score.
      await page.getByRole("heading", { name: "Hardest bars" }).locator("xpath=..").getByRole("button").first().click();
      await expect.poll(() => page.locator('[data-selected="true"]').count()).toBeGreaterThan(0);
      await page.setViewportSize({ width, height: 900 });
      await page.screenshot({ path: `${screenshotDir}/piece-selected-${width}.png` });

      await page.goto("/knots");
      await page.getByRole("list", { name: "Knots" }).waitFor();
      found = await seriousViolations(page);
      expect(found, describeViolations(found)).toEqual([]);
      await shoot(page, `knots-${width}`);
      await context.close();
    }
  });
});
