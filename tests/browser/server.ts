/**
 * The browser tests serve the same production build as the hardening suite: one set of helpers to
 * build it when stale, find a free loopback port, start `next start` and wait for /api/health.
 */
export { buildIsStale, freePort, repoRoot, run, startNext, waitForHealth } from "../hardening/server";
