import { defineConfig } from "vitest/config";
import { resolve } from "./vitest.shared";

/** Unit and integration tests: pure lib/ tests plus db/actions tests against temp SQLite files. */
export default defineConfig({
  resolve,
  test: {
    pool: "forks",
    include: ["lib/**/*.test.ts", "tests/**/*.test.ts"],
    exclude: ["tests/browser/**", "tests/hardening/**", "node_modules/**"],
    testTimeout: 60_000,
    hookTimeout: 120_000,
    setupFiles: ["tests/setup.ts"],
  },
});
