import { defineConfig } from "vitest/config";
import { buildSuite, resolve } from "./vitest.shared";

/** Browser tests: a production build served on a free loopback port, driven by playwright-core + Debian chromium. */
export default defineConfig({
  resolve,
  test: {
    ...buildSuite,
    include: ["tests/browser/**/*.test.ts"],
    globalSetup: ["tests/browser/global-setup.ts"],
  },
});
