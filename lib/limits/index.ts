/**
 * Limits that keep one request from taking the server down: bodies read with a byte cap whatever
 * the transfer encoding, knots of at most 16 bars and bounded drill output per request, and
 * fixed-window counters kept in the database so a rate limit holds across app servers. Server only.
 * (Limits on what a score may contain live with the score engine, in lib/score/limits.ts.)
 *
 * - body.ts: `readJsonCapped`, `readFormCapped`, `BodyTooLargeError`
 * - work.ts: `MAX_KNOT_BARS`, `knotLengthProblem`, `checkGeneratedOutput`, `WorkLimitError`
 * - counter.ts: `dbRateLimiter`, `dbFailureCounter` (table `limit_counter`)
 */
import "server-only";

export * from "./body";
export * from "./counter";
export * from "./work";
