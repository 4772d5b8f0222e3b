import { defineConfig } from "vitest/config";
import path from "node:path";

/** Unit and integration tests: pure lib/ tests plus db/actions tests against temp SQLite files. */
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
    include: ["lib/**/*.test.ts", "tests/**/*.test.ts"],
    exclude: ["tests/browser/**", "tests/hardening/**", "node_modules/**"],
    testTimeout: 60_000,
    hookTimeout: 120_000,
    setupFiles: ["tests/setup.ts"],
  },
});
