/** Loads opensheetmusicdisplay once, on demand, so pages without a score never ship it. */
import type * as Osmd from "opensheetmusicdisplay";

let pending: Promise<typeof Osmd> | null = null;

export function loadOsmd(): Promise<typeof Osmd> {
  pending ??= import("opensheetmusicdisplay").catch((err: unknown) => {
    pending = null;
    throw err;
  });
  return pending;
}

/** Runs engraving jobs one at a time, yielding to the browser between them, so a grid of previews stays responsive. */
let queue: Promise<unknown> = Promise.resolve();

export function enqueueRender<T>(job: () => Promise<T> | T): Promise<T> {
  const run = queue.then(
    () => new Promise<void>((r) => setTimeout(r, 0)).then(job),
  );
  queue = run.catch(() => undefined);
  return run;
}
