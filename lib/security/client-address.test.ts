// The rate-limit key: the socket address unless a trusted proxy forwards the client's.
// better-auth docs ("Rate Limit → Connecting IP address"): only trust forwarded headers your proxy
// sets; OWASP Authentication Cheat Sheet ("Login Throttling"). Addresses from RFC 5737 test ranges.
import http from "node:http";
import type { AddressInfo } from "node:net";
import { describe, expect, test } from "vitest";
import { clientAddress, plainAddress, trustedProxies } from "./client-address";
import { installClientAddress } from "./install-client-address";

describe("clientAddress", () => {
  test("no proxy trusted: the socket address, whatever X-Forwarded-For says", () => {
    for (let i = 1; i <= 5; i++) expect(clientAddress("127.0.0.1", `203.0.113.${i}`, null)).toBe("127.0.0.1");
    expect(clientAddress("::ffff:192.0.2.4", "203.0.113.1, 10.0.0.1", null)).toBe("192.0.2.4");
  });

  test("a trusted proxy: the first untrusted hop from the right", () => {
    const trusted = trustedProxies("10.0.0.0/24, 192.0.2.10");
    expect(clientAddress("10.0.0.2", "198.51.100.7", trusted)).toBe("198.51.100.7");
    // A client that prepends its own guess cannot choose: the proxy appended the real address last.
    expect(clientAddress("10.0.0.2", "203.0.113.66, 198.51.100.7", trusted)).toBe("198.51.100.7");
    expect(clientAddress("192.0.2.10", "198.51.100.7, 10.0.0.3", trusted)).toBe("198.51.100.7");
    expect(clientAddress("10.0.0.2", "not-an-address", trusted)).toBe("10.0.0.2");
  });

  test("a request that does not come from the trusted proxy gets its socket address", () => {
    expect(clientAddress("198.51.100.20", "203.0.113.5", trustedProxies("10.0.0.1"))).toBe("198.51.100.20");
  });

  test("a bad TRUSTED_PROXY entry is refused at start-up; empty means none", () => {
    expect(() => trustedProxies("10.0.0.0/24, proxy.internal")).toThrow(/proxy.internal/);
    expect(trustedProxies("")).toBeNull();
    expect(trustedProxies(undefined)).toBeNull();
    expect(plainAddress("::ffff:127.0.0.1")).toBe("127.0.0.1");
  });
});

describe("installClientAddress", () => {
  test("an HTTP server of this process sees X-Forwarded-For replaced by the socket address", async () => {
    installClientAddress(undefined);
    const server = http.createServer((req, res) => res.end(JSON.stringify([req.headers["x-forwarded-for"], req.headers["x-real-ip"] ?? null])));
    await new Promise<void>((r) => server.listen(0, "127.0.0.1", r));
    const { port } = server.address() as AddressInfo;
    try {
      const res = await fetch(`http://127.0.0.1:${port}/`, { headers: { "x-forwarded-for": "203.0.113.9", "x-real-ip": "203.0.113.10" } });
      expect(await res.json()).toEqual(["127.0.0.1", null]);
    } finally {
      server.close();
    }
  });
});
