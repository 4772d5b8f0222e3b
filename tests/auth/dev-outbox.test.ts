/**
 * /dev/outbox shows every studio's mail without signing in: it must answer 404 on a production
 * server unless KNOTWORK_DEV_OUTBOX=1, and wherever it shows, it carries the warning banner.
 */
import { afterAll, afterEach, beforeAll, describe, expect, test } from "vitest";
import { renderToStaticMarkup } from "react-dom/server";
import { useTempDatabase } from "../db/temp-db";

const NOT_FOUND = "NEXT_HTTP_ERROR_FALLBACK;404";
const env = process.env as Record<string, string | undefined>;
const saved = { NODE_ENV: env.NODE_ENV, KNOTWORK_DEV_OUTBOX: env.KNOTWORK_DEV_OUTBOX };

let t: Awaited<ReturnType<typeof useTempDatabase>>;
let Page: () => Promise<React.ReactElement>;

beforeAll(async () => {
  t = await useTempDatabase("dev-outbox");
  Page = (await import("../../app/dev/outbox/page")).default as unknown as () => Promise<React.ReactElement>;
});
afterEach(() => {
  env.NODE_ENV = saved.NODE_ENV;
  if (saved.KNOTWORK_DEV_OUTBOX === undefined) delete env.KNOTWORK_DEV_OUTBOX;
  else env.KNOTWORK_DEV_OUTBOX = saved.KNOTWORK_DEV_OUTBOX;
});
afterAll(() => t.cleanup());

async function outcome(): Promise<{ html?: string; digest?: string }> {
  try {
    return { html: renderToStaticMarkup(await Page()) };
  } catch (err) {
    return { digest: (err as { digest?: string }).digest };
  }
}

describe("development outbox", () => {
  test.each([undefined, "0", "true", "yes"])("production with KNOTWORK_DEV_OUTBOX=%s answers 404", async (flag) => {
    env.NODE_ENV = "production";
    if (flag === undefined) delete env.KNOTWORK_DEV_OUTBOX;
    else env.KNOTWORK_DEV_OUTBOX = flag;
    expect((await outcome()).digest).toBe(NOT_FOUND);
  });

  test("an unknown NODE_ENV without the flag answers 404 too", async () => {
    env.NODE_ENV = "staging";
    delete env.KNOTWORK_DEV_OUTBOX;
    expect((await outcome()).digest).toBe(NOT_FOUND);
  });

  test("production with KNOTWORK_DEV_OUTBOX=1, and tests, show it with the warning banner first", async () => {
    for (const setting of [{ NODE_ENV: "production", flag: "1" }, { NODE_ENV: "test", flag: undefined }]) {
      env.NODE_ENV = setting.NODE_ENV;
      if (setting.flag === undefined) delete env.KNOTWORK_DEV_OUTBOX;
      else env.KNOTWORK_DEV_OUTBOX = setting.flag;
      const { html } = await outcome();
      expect(html, setting.NODE_ENV).toBeTruthy();
      expect(html!.indexOf('data-testid="outbox-warning"')).toBeGreaterThan(-1);
      expect(html!.indexOf('data-testid="outbox-warning"')).toBeLessThan(html!.indexOf("<h1"));
      expect(html).toContain("not for a real studio");
    }
  });
});
