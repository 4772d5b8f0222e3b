import { defineConfig } from "vitest/config";
import path from "node:path";

/** Browser tests: a production build served on a free loopback port, driven by playwright-core + Debian chromium. */
export default defineConfig({
  resolve: {
    alias: {
      "@": path.resolve(__dirname),
      // Outside Next, "server-only" resolves to the guard that throws; tests run server code on purpose.
      "server-only": path.resolve(__dirname, "node_modules/server-only/empty.js"),
    },
  },
  test: {
    pool: "forks",
    include: ["tests/browser/**/*.test.ts"],
    fileParallelism: false,
    testTimeout: 180_000,
    hookTimeout: 600_000,
    globalSetup: ["tests/browser/global-setup.ts"],
  },
});
