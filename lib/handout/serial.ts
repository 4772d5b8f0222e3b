/**
 * Runs async jobs one at a time, in call order. The engraver works on shared globals and one shared
 * container, so two renders must never interleave.
 */
let tail: Promise<unknown> = Promise.resolve();

/** Queues `job` after every job queued before it; a failing job does not block the ones after it. */
export function serial<T>(job: () => Promise<T>): Promise<T> {
  const run = tail.then(job, job);
  tail = run.catch(() => undefined);
  return run;
}
