import { Midi } from "@tonejs/midi";
import { unzipSync } from "fflate";
import { afterAll, beforeAll, describe, expect, inject, test } from "vitest";
import type { Browser, Page } from "playwright-core";
import { CAUTION } from "@/lib/caution";
import { describeViolations, seriousViolations } from "./axe";
import { launchChromium, shoot } from "./chromium";
import { notesOf, seededKnotPath, sheetOrder, signIn, soundingCount, tabTo, waitForEngravings } from "./generate-support";

const baseURL = inject("baseURL");
let browser: Browser;
let knotPath = "";
let sheetPath = "";
let savedMidiHref = "";

beforeAll(async () => {
  browser = await launchChromium();
});
afterAll(async () => {
  await browser?.close();
});

async function newPage(width: number): Promise<Page> {
  const context = await browser.newContext({ viewport: { width, height: 900 }, baseURL });
  return context.newPage();
}


describe("generate drills for a knot and save a drill sheet", () => {
  test("with the mouse: generate, regenerate on an option, pick three, reorder, save", async () => {
    const page = await newPage(1280);
    await signIn(page);
    knotPath = await seededKnotPath(page);
    await page.goto(knotPath);
    await expect(page.getByTestId("caution").isVisible()).resolves.toBe(true);
    await expect(page.getByTestId("caution").textContent()).resolves.toContain(CAUTION.text);
    await expect(page.getByRole("list", { name: "Problem tags" }).textContent()).resolves.toContain("evenness");
    // suggestFamilies(["evenness", …]) switches its families on before anything is generated.
    expect(await page.locator('input[role="switch"]:checked').count()).toBeGreaterThan(0);
    await page.getByRole("button", { name: "Generate" }).click();
    await waitForEngravings(page, 5);
    await page.evaluate(() => ((window as unknown as { __sameDocument: boolean }).__sameDocument = true));

    // Changing an option regenerates without a page reload: one fewer variant → fewer drills.
    const before = await page.locator('[data-testid="drill-card"]').count();
    await page.locator('fieldset[aria-label$=" options"] fieldset input[type="checkbox"]:checked').first().uncheck();
    await page.waitForFunction((n) => document.querySelectorAll('[data-testid="drill-card"]').length < n, before);
    expect(await page.evaluate(() => (window as unknown as { __sameDocument?: boolean }).__sameDocument)).toBe(true);
    await waitForEngravings(page, 5);
    await shoot(page, "generate-1280");

    const cards = page.locator('[data-testid="drill-card"]');
    const keys = await cards.evaluateAll((els) => els.slice(0, 3).map((e) => e.getAttribute("data-key")!));
    for (const key of keys) await page.locator(`[data-testid="drill-card"][data-key="${key}"] input[type="checkbox"][aria-label^="Pick"]`).check();
    expect(await sheetOrder(page)).toEqual(keys);

    // Drag the third drill's handle above the first.
    const handle = page.locator(`[data-testid="sheet-item"][data-key="${keys[2]}"] [data-testid="drag-handle"]`);
    const target = page.locator(`[data-testid="sheet-item"][data-key="${keys[0]}"]`);
    await handle.scrollIntoViewIfNeeded();
    const from = (await handle.boundingBox())!;
    const to = (await target.boundingBox())!;
    await page.mouse.move(from.x + from.width / 2, from.y + from.height / 2);
    await page.mouse.down();
    for (let i = 1; i <= 12; i++) await page.mouse.move(from.x + from.width / 2, from.y + (to.y + 5 - from.y) * (i / 12));
    await page.mouse.up();
    await page.waitForFunction((k) => document.querySelector('[data-testid="sheet-item"]')?.getAttribute("data-key") === k, keys[2]);
    // dnd-kit swallows clicks for 50 ms after a drop (its pointer sensor's click guard); a person is slower.
    await page.waitForTimeout(150);
    // Then a move button: the (now) last drill goes up one.
    await page.locator(`[data-testid="sheet-item"][data-key="${keys[1]}"] button[aria-label^="Move"][aria-label$=" up"]`).click();
    const expected = [keys[2], keys[1], keys[0]];
    expect(await sheetOrder(page)).toEqual(expected);
    const titles = await Promise.all(expected.map((k) => page.locator(`[data-testid="sheet-item"][data-key="${k}"] [data-testid="sheet-item-title"]`).textContent()));

    await page.getByLabel("Sheet name").fill("Even triplets after the thumb");
    await page.getByRole("button", { name: "Save sheet" }).click();
    await page.waitForURL(/\/sheets\/[^/]+$/);
    sheetPath = new URL(page.url()).pathname;
    await expect(page.locator('[data-testid="sheet-drill-title"]').allTextContents()).resolves.toEqual(titles);
    await expect(page.getByTestId("caution").isVisible()).resolves.toBe(true);
    await expect(page.getByTestId("caution").textContent()).resolves.toContain(CAUTION.text);
    await page.context().close();
  });

  test("with the keyboard only: Tab, Space, Enter and arrow keys", async () => {
    const page = await newPage(1280);
    await page.goto("/sign-in");
    await tabTo(page, 'input[type="email"]');
    await page.keyboard.type("teacher@knotwork.test");
    await tabTo(page, 'input[type="password"]');
    await page.keyboard.type("practise-slowly");
    await page.keyboard.press("Enter");
    await page.waitForURL("**/home");
    await page.goto(knotPath);
    await tabTo(page, "aside button:not([disabled])");
    await page.keyboard.press("Enter");
    await page.locator('[data-testid="drill-card"]').nth(4).waitFor();
    const keys = await page.locator('[data-testid="drill-card"]').evaluateAll((els) => els.slice(0, 3).map((e) => e.getAttribute("data-key")!));
    for (const key of keys) {
      await tabTo(page, `[data-testid="drill-card"][data-key="${key}"] input[aria-label^="Pick"]`);
      await page.keyboard.press("Space");
    }
    expect(await sheetOrder(page)).toEqual(keys);
    for (const key of keys) {
      await page.locator(`[data-testid="drill-card"][data-key="${key}"] [data-testid="drill-preview"][data-status="ready"] svg`).first().waitFor({ timeout: 30_000 });
    }
    // Keyboard drag: Space lifts the handle, ArrowUp moves, Space drops.
    await tabTo(page, `[data-testid="sheet-item"][data-key="${keys[2]}"] [data-testid="drag-handle"]`);
    for (const key of ["Space", "ArrowUp", "ArrowUp", "Space"]) {
      await page.keyboard.press(key);
      await page.waitForTimeout(250);
    }
    await page.waitForFunction((k) => document.querySelector('[data-testid="sheet-item"]')?.getAttribute("data-key") === k, keys[2]);
    // Move button with Enter: the first picked drill goes down one → keys[2], keys[1], keys[0].
    await tabTo(page, `[data-testid="sheet-item"][data-key="${keys[0]}"] button[aria-label$=" down"]`);
    await page.keyboard.press("Enter");
    const expected = [keys[2], keys[1], keys[0]];
    expect(await sheetOrder(page)).toEqual(expected);
    await tabTo(page, `[data-testid="sheet-item"][data-key="${keys[2]}"] textarea`);
    await page.keyboard.press("Control+A");
    await page.keyboard.type("Three slow rounds, then one at the goal.");
    await tabTo(page, `[data-testid="sheet-item"][data-key="${keys[2]}"] input[id$="-target"]`);
    await page.keyboard.press("Control+A");
    await page.keyboard.type("84");
    await tabTo(page, "#sheet-title");
    await page.keyboard.type("Keyboard sheet");
    await page.keyboard.press("Enter");
    await page.waitForURL(/\/sheets\/[^/]+$/);
    const items = page.locator('[data-testid="sheet-drill"]');
    expect(await items.count()).toBe(3);
    await expect(items.first().textContent()).resolves.toContain("Three slow rounds, then one at the goal.");
    await expect(items.first().locator('[data-testid="tempo-goal"]').textContent()).resolves.toContain("goal ♩ = 84");
    await page.context().close();
  });

  test("the sheet page plays drills and serves the three formats and a zip", async () => {
    const page = await newPage(1280);
    await signIn(page);
    await page.goto(sheetPath);
    const first = page.locator('[data-testid="sheet-drill"]').first();
    const hrefs = Object.fromEntries(
      await Promise.all(["MusicXML", ".mxl", "MIDI"].map(async (f) => [f, await first.locator(`a[aria-label$=" as ${f}"]`).getAttribute("href")] as const)),
    );
    savedMidiHref = hrefs.MIDI!;
    // The sheet links back to the knot it came from and to that knot's piece.
    await expect(page.getByTestId("sheet-knot-link").getAttribute("href")).resolves.toBe(knotPath);
    await expect(page.getByTestId("sheet-piece-link").getAttribute("href")).resolves.toMatch(/^\/pieces\/[^/]+$/);
    const xml = await page.request.get(hrefs.MusicXML!);
    // MusicXML 4.0 container.xsd: the recommended media types for uncompressed and compressed files.
    expect(xml.headers()["content-type"]).toBe("application/vnd.recordare.musicxml+xml");
    expect(xml.headers()["content-disposition"]).toMatch(/attachment; filename=".+\.musicxml"/);
    const xmlBytes = new Uint8Array(await xml.body());
    const mxl = await page.request.get(hrefs[".mxl"]!);
    expect(mxl.headers()["content-type"]).toBe("application/vnd.recordare.musicxml");
    expect(notesOf(new Uint8Array(await mxl.body()))).toEqual(notesOf(xmlBytes));
    const mid = await page.request.get(hrefs.MIDI!);
    expect(mid.headers()["content-type"]).toBe("audio/midi");
    // Standard MIDI File read by @tonejs/midi: one note per sounding note of the model.
    const midi = new Midi(new Uint8Array(await mid.body()));
    expect(midi.tracks.reduce((n, t) => n + t.notes.length, 0)).toBe(soundingCount(xmlBytes));
    const zip = await page.request.get(await page.getByRole("link", { name: /Download all/ }).getAttribute("href") as string);
    expect(zip.headers()["content-type"]).toBe("application/zip");
    expect(Object.keys(unzipSync(new Uint8Array(await zip.body())))).toHaveLength(9);

    await first.getByRole("button", { name: "Play" }).click();
    await page.waitForFunction(() => ["loading", "playing"].includes(document.querySelector('[data-testid="player"]')?.getAttribute("data-state") ?? ""));
    await first.getByRole("button", { name: /Pause|Loading piano/ }).waitFor();
    await page.context().close();
  });

  test("axe finds no serious or critical problems; screenshots at 390 and 1280 px", async () => {
    for (const width of [1280, 390]) {
      const page = await newPage(width);
      await signIn(page);
      await page.goto(knotPath);
      await page.getByRole("button", { name: "Generate" }).click();
      await waitForEngravings(page, 2);
      await page.locator('[data-testid="drill-card"] input[aria-label^="Pick"]').first().check();
      if (width >= 1024) {
        // Wide screens: the drill sheet sits beside the previews and stays in view while they scroll;
        // the Generate button sits below the families' own scroll area, covering none of it.
        await page.evaluate(() => window.scrollTo(0, document.documentElement.scrollHeight));
        const builder = (await page.locator("#sheet-builder").boundingBox())!;
        const previews = (await page.getByRole("region", { name: "Drill previews" }).boundingBox())!;
        expect(builder.x).toBeGreaterThan(previews.x + previews.width - 1);
        expect(builder.y).toBeGreaterThanOrEqual(0);
        expect(builder.y + builder.height).toBeLessThanOrEqual(900);
        const families = (await page.getByTestId("family-panel").boundingBox())!;
        const generate = (await page.getByRole("button", { name: "Generate" }).boundingBox())!;
        expect(generate.y).toBeGreaterThanOrEqual(families.y + families.height);
      }
      const onGenerate = await seriousViolations(page);
      expect(onGenerate, describeViolations(onGenerate)).toEqual([]);
      await page.evaluate(() => window.scrollTo(0, 0));
      await shoot(page, `generate-${width}`);
      await page.screenshot({ path: (await shoot(page, `generate-top-${width}`)), fullPage: false });
      const overflow = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
      expect(overflow).toBeLessThanOrEqual(0);
      await page.goto(sheetPath);
      await page.locator('[data-testid="drill-preview"][data-status="ready"] svg').first().waitFor({ timeout: 30_000 });
      const onSheet = await seriousViolations(page);
      expect(onSheet, describeViolations(onSheet)).toEqual([]);
      await shoot(page, `sheet-${width}`);
      await page.context().close();
    }
  });

  test("ids from another studio are not found", async () => {
    const page = await newPage(1280);
    await page.goto("/sign-up");
    await page.getByLabel("Your name").fill("Ines Marbury");
    await page.getByLabel("E-mail").fill("ines@knotwork.test");
    await page.getByLabel("Password").fill("another-long-password");
    await page.getByLabel("Studio name").fill("Fernhill Studio");
    await page.getByRole("button", { name: "Create studio" }).click();
    await page.waitForURL("**/home");
    expect((await page.goto(knotPath))?.status()).toBe(404);
    expect((await page.goto(sheetPath))?.status()).toBe(404);
    const knotId = knotPath.split("/").pop()!;
    const sheetId = sheetPath.split("/").pop()!;
    // With the page's own Origin (the Origin rule in proxy.ts), so the answer is about the foreign id.
    expect((await page.request.post(`/api/knots/${knotId}/drills`, { data: { families: ["blocking"] }, headers: { origin: new URL(page.url()).origin } })).status()).toBe(404);
    expect((await page.request.get(`/api/sheets/${sheetId}/zip`)).status()).toBe(404);
    expect((await page.request.get(savedMidiHref)).status()).toBe(404);
    const req = encodeURIComponent(JSON.stringify({ families: ["blocking"] }));
    expect((await page.request.get(`/api/drills/preview?knot=${knotId}&key=blocking:block:0&format=midi&request=${req}`)).status()).toBe(404);
    await page.context().close();
  });
});
