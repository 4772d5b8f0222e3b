import { defineConfig } from "vitest/config";
import path from "node:path";

/**
 * Hardening suite: hostile uploads, access control, security headers, crash safety, a load smoke run
 * and bundle sizes, all against the production build on a free loopback port with its own temp data.
 */
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
    include: ["tests/hardening/**/*.test.ts"],
    fileParallelism: false,
    testTimeout: 180_000,
    hookTimeout: 600_000,
    setupFiles: ["tests/setup.ts"],
    globalSetup: ["tests/hardening/global-setup.ts"],
  },
});
