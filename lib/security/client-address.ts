/**
 * The client's address for rate limits, from the socket unless a trusted proxy says otherwise.
 * `next start` copies the socket address into X-Forwarded-For only when the request has none, so a
 * client talking to the server directly could name any address and get a fresh sign-in budget on
 * every request. `installClientAddress` (called from instrumentation.ts) rewrites X-Forwarded-For on
 * every request before Next sees it, to one address:
 * - TRUSTED_PROXY unset: the socket's address, whatever the client sent;
 * - TRUSTED_PROXY set (addresses or CIDR ranges, comma separated): when the socket belongs to a
 *   trusted proxy, the forwarded chain is walked right to left past trusted hops and the first
 *   untrusted address is the client; a request from anywhere else gets its socket address.
 * better-auth's limiter and lib/rate-limit then key on a value the client cannot choose.
 * (OWASP Authentication Cheat Sheet, "Login Throttling"; better-auth docs, "Rate Limit → Connecting IP
 * address": list only headers your proxy sets, replacing any client value.)
 */
import net from "node:net";

/** "::ffff:127.0.0.1" → "127.0.0.1"; other addresses unchanged. */
export function plainAddress(address: string): string {
  const a = address.trim();
  return /^::ffff:\d+\.\d+\.\d+\.\d+$/i.test(a) ? a.slice(7) : a;
}

/** The TRUSTED_PROXY setting as a BlockList; null when unset or empty. Throws on an entry that is not an address or range. */
export function trustedProxies(setting: string | undefined): net.BlockList | null {
  const entries = (setting ?? "").split(",").map((s) => s.trim()).filter(Boolean);
  if (entries.length === 0) return null;
  const list = new net.BlockList();
  for (const entry of entries) {
    const [address, prefix] = entry.split("/");
    const family = net.isIP(address ?? "");
    if (!family) throw new Error(`TRUSTED_PROXY: "${entry}" is not an IP address or CIDR range.`);
    const type = family === 4 ? "ipv4" : "ipv6";
    if (prefix === undefined) list.addAddress(address!, type);
    else list.addSubnet(address!, Number(prefix), type);
  }
  return list;
}

function isTrusted(list: net.BlockList, address: string): boolean {
  const a = plainAddress(address);
  const family = net.isIP(a);
  return family !== 0 && list.check(a, family === 4 ? "ipv4" : "ipv6");
}

/**
 * The client address for a request that came from `socketAddress` carrying `forwardedFor`.
 *
 * @example
 * clientAddress("127.0.0.1", "203.0.113.9", null); // "127.0.0.1" — no proxy trusted
 * clientAddress("10.0.0.2", "198.51.100.7, 10.0.0.3", trustedProxies("10.0.0.0/24")); // "198.51.100.7"
 */
export function clientAddress(socketAddress: string | undefined, forwardedFor: string | string[] | undefined, trusted: net.BlockList | null): string {
  const socket = plainAddress(socketAddress ?? "");
  if (!trusted || !socket || !isTrusted(trusted, socket)) return socket || "unknown";
  const header = Array.isArray(forwardedFor) ? forwardedFor.join(",") : forwardedFor ?? "";
  const hops = header.split(",").map((h) => plainAddress(h)).filter(Boolean);
  for (let i = hops.length - 1; i >= 0; i--) {
    if (!net.isIP(hops[i]!)) return socket; // garbage in the chain: trust nothing of it
    if (!isTrusted(trusted, hops[i]!)) return hops[i]!;
  }
  return hops[0] ?? socket;
}
