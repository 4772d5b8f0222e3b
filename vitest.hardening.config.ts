import { defineConfig } from "vitest/config";
import { buildSuite, resolve } from "./vitest.shared";

/**
 * Hardening suite: hostile uploads, access control, security headers, crash safety, a load smoke run
 * and bundle sizes, all against the production build on a free loopback port with its own temp data.
 */
export default defineConfig({
  resolve,
  test: {
    ...buildSuite,
    include: ["tests/hardening/**/*.test.ts"],
    setupFiles: ["tests/setup.ts"],
    globalSetup: ["tests/hardening/global-setup.ts"],
  },
});
