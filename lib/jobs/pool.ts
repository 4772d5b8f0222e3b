/**
 * A pool of worker threads for CPU-heavy jobs (piscina): each job runs off the request thread, with a
 * time limit (the job is aborted and its worker terminated) and a heap limit per worker (V8
 * `resourceLimits`: a job that needs more dies with its worker, which frees all it held). A job past
 * either limit rejects with a `JobLimitError` whose message is a sentence for the person who asked.
 *
 * The worker file must be a standalone script (Next's server bundle cannot be loaded in a worker
 * thread): see scripts/build-worker.mjs and lib/jobs/worker.ts.
 */
import { Piscina } from "piscina";

/** A job ran past its time or memory limit; its worker was stopped and its memory freed. */
export class JobLimitError extends Error {
  constructor(
    readonly limit: "time" | "memory",
    message: string,
  ) {
    super(message);
    this.name = "JobLimitError";
  }
}

export interface PoolOptions {
  /** Absolute path of the worker script (its default export handles one task). */
  filename: string;
  /** Worker threads (default 2, like the gate's running slots). */
  threads?: number;
  /** Time limit per job in ms. */
  timeoutMs: number;
  /** Old-generation heap per worker in MB (V8 resourceLimits.maxOldGenerationSizeMb). */
  maxOldGenerationSizeMb: number;
  /** An idle worker exits after this many ms (default 5 s). */
  idleTimeoutMs?: number;
  /** Added to the workers' nice value (default 10; 0 keeps the request thread's priority). */
  niceIncrement?: number;
  /** What the job was, for messages ("this handout"). */
  what?: string;
}

export interface JobPool {
  run<T>(task: unknown, transfer?: Transferable[]): Promise<T>;
  /** Threads alive right now and jobs completed (tests). */
  stats(): { threads: number; completed: number };
  close(): Promise<void>;
}

function isOutOfMemory(err: unknown): boolean {
  const code = (err as { code?: string } | null)?.code;
  return code === "ERR_WORKER_OUT_OF_MEMORY" || /out of memory|heap limit/i.test(String((err as Error)?.message ?? ""));
}

/** A worker pool with per-job time and memory limits. */
export function createPool(opts: PoolOptions): JobPool {
  const threads = opts.threads ?? 2;
  const piscina = new Piscina({
    filename: opts.filename,
    // No thread while idle: a worker (jsdom, the engraver, its caches) gives all its memory back 5 s after its
    // last job, at the cost of a cold start (about a second) for the next one.
    minThreads: 0,
    maxThreads: threads,
    // Every caller goes through the gate (lib/jobs/gate.ts), which bounds the queue and answers 503.
    maxQueue: Infinity,
    idleTimeout: opts.idleTimeoutMs ?? 5_000,
    // Workers run at a lower priority (nice +10, Linux) so the request thread answers first on a busy machine.
    niceIncrement: opts.niceIncrement ?? 10,
    resourceLimits: { maxOldGenerationSizeMb: opts.maxOldGenerationSizeMb, maxYoungGenerationSizeMb: 32 },
  });
  const what = opts.what ?? "this job";
  return {
    async run<T>(task: unknown, transfer?: Transferable[]): Promise<T> {
      const signal = AbortSignal.timeout(opts.timeoutMs);
      try {
        return (await piscina.run(task, { signal, transferList: transfer as never })) as T;
      } catch (err) {
        if (isOutOfMemory(err)) {
          throw new JobLimitError("memory", `Making ${what} needed more than ${opts.maxOldGenerationSizeMb} MB of memory, so it was stopped. Try fewer or shorter drills.`);
        }
        if (signal.aborted) {
          throw new JobLimitError("time", `Making ${what} took longer than ${opts.timeoutMs / 1000} s, so it was stopped. Try fewer or shorter drills.`);
        }
        throw err;
      }
    },
    stats: () => ({ threads: piscina.threads.length, completed: piscina.completed }),
    close: () => piscina.close({ force: true }),
  };
}

/** The answer for a job past its limit: 503 with a sentence (the server was not able to finish it). */
export function limitResponse(err: JobLimitError): Response {
  return Response.json({ message: err.message }, { status: 503, headers: { "Retry-After": "30" } });
}
