/**
 * A bounded queue in front of CPU-heavy work (generating drills, engraving, PDF handouts): at most
 * `running` jobs at once and `queued` waiting; a request that finds the queue full is answered at once
 * with 503 and Retry-After instead of waiting behind everyone (OWASP Denial of Service Cheat Sheet:
 * bound queues, fail fast). The jobs themselves run in the worker pool (lib/jobs/heavy.ts), so the gate
 * bounds how many wait; the pool keeps them off the request thread and limits their time and memory.
 */

/** The queue was full; answer 503 with Retry-After. */
export class QueueFullError extends Error {
  constructor(readonly retryAfterSeconds: number) {
    super("Knotwork is busy with other drills and handouts right now. Please try again in a few seconds.");
    this.name = "QueueFullError";
  }
}

export interface Gate {
  run<T>(job: () => Promise<T>): Promise<T>;
  readonly stats: () => { running: number; queued: number; refused: number };
}

/** A gate with `running` slots and room for `queued` waiting jobs. */
export function createGate(running: number, queued: number, retryAfterSeconds = 5): Gate {
  let active = 0;
  let refused = 0;
  const waiting: (() => void)[] = [];
  const release = () => {
    const next = waiting.shift();
    if (next) next();
    else active--;
  };
  return {
    async run<T>(job: () => Promise<T>): Promise<T> {
      if (active >= running) {
        if (waiting.length >= queued) {
          refused++;
          throw new QueueFullError(retryAfterSeconds);
        }
        await new Promise<void>((resolve) => waiting.push(resolve));
      } else {
        active++;
      }
      try {
        return await job();
      } finally {
        release();
      }
    },
    stats: () => ({ running: active, queued: waiting.length, refused }),
  };
}

/** The 503 answer for a full queue (JSON with a message, Retry-After in seconds). */
export function busyResponse(err: QueueFullError): Response {
  return Response.json({ message: err.message }, { status: 503, headers: { "Retry-After": String(err.retryAfterSeconds) } });
}

/** The one gate for heavy work in this process: 2 at once, 16 waiting. */
export const heavyWork = createGate(2, 16);
