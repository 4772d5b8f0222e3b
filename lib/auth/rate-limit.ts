/**
 * A small in-memory fixed-window limiter for server actions that better-auth's own limiter does not
 * see (it only guards /api/auth/*). One process, so a hosted multi-instance setup needs a shared store.
 */
export function createRateLimiter(max: number, windowMs: number) {
  const hits = new Map<string, { count: number; resetAt: number }>();
  return {
    /** Records one attempt; false when the key has used up its window. */
    take(key: string, now: number = Date.now()): boolean {
      const entry = hits.get(key);
      if (!entry || entry.resetAt <= now) {
        hits.set(key, { count: 1, resetAt: now + windowMs });
        if (hits.size > 10_000) {
          for (const [k, v] of hits) if (v.resetAt <= now) hits.delete(k);
        }
        return true;
      }
      entry.count += 1;
      return entry.count <= max;
    },
  };
}

/** The caller's address as the proxy in front of Next reports it, or "local". */
export function clientKey(h: Headers): string {
  return h.get("x-forwarded-for")?.split(",")[0]?.trim() || h.get("x-real-ip") || "local";
}
