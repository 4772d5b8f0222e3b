import path from "node:path";

/** Module resolution shared by the three vitest configs. */
export const resolve = {
  alias: {
    "@": path.resolve(__dirname),
    // Outside Next, "server-only" resolves to the guard that throws; tests run server code on purpose.
    "server-only": path.resolve(__dirname, "node_modules/server-only/empty.js"),
  },
};

/** Suites that drive the production build: one file at a time, with long timeouts for the build. */
export const buildSuite = {
  pool: "forks",
  fileParallelism: false,
  testTimeout: 180_000,
  hookTimeout: 600_000,
} as const;
