/**
 * Memory and liveness probes for the hardening suite: the resident set size (RSS) of the server's
 * process tree read from /proc, and a sampler that keeps asking /api/health while something else runs.
 */
import fs from "node:fs";

function children(pid: number): number[] {
  const out: number[] = [];
  for (const d of fs.readdirSync("/proc")) {
    if (!/^\d+$/.test(d)) continue;
    try {
      const stat = fs.readFileSync(`/proc/${d}/stat`, "utf8");
      const ppid = Number(stat.slice(stat.lastIndexOf(")") + 2).split(" ")[1]);
      if (ppid === pid) out.push(Number(d));
    } catch {
      // gone meanwhile
    }
  }
  return out;
}

/** RSS in MB of `pid` and all its descendants (next start may run the server in a child). */
export function treeRssMb(pid: number): number {
  let kb = 0;
  const todo = [pid];
  while (todo.length) {
    const p = todo.pop()!;
    try {
      const m = fs.readFileSync(`/proc/${p}/status`, "utf8").match(/VmRSS:\s+(\d+)/);
      kb += m ? Number(m[1]) : 0;
    } catch {
      continue;
    }
    todo.push(...children(p));
  }
  return kb / 1024;
}

export interface Watch {
  /** Stops sampling; returns the peak RSS (MB) and every /api/health latency (ms, Infinity for a failure). */
  stop(): Promise<{ peakMb: number; healthMs: number[] }>;
}

/** Samples RSS every 50 ms and /api/health back to back until stopped. */
export function watchServer(baseURL: string, pid: number): Watch {
  let running = true;
  let peakMb = treeRssMb(pid);
  const healthMs: number[] = [];
  const rss = setInterval(() => (peakMb = Math.max(peakMb, treeRssMb(pid))), 50);
  const health = (async () => {
    while (running) {
      const t0 = performance.now();
      try {
        const res = await fetch(`${baseURL}/api/health`, { signal: AbortSignal.timeout(5000) });
        await res.text();
        healthMs.push(res.ok ? performance.now() - t0 : Infinity);
      } catch {
        healthMs.push(Infinity);
      }
      await new Promise((r) => setTimeout(r, 20));
    }
  })();
  return {
    async stop() {
      running = false;
      clearInterval(rss);
      await health;
      return { peakMb: Math.max(peakMb, treeRssMb(pid)), healthMs };
    },
  };
}

/** The p-th percentile (0–100) of the values. */
export function percentile(values: number[], p: number): number {
  const sorted = [...values].sort((x, y) => x - y);
  return sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)] ?? NaN;
}
