/**
 * Installs the X-Forwarded-For rewrite of lib/security/client-address.ts into this Node process's
 * HTTP servers: every "request" event of any http.Server gets the header replaced before Next's own
 * handler runs. Called once from instrumentation.ts (Node runtime only).
 */
import http from "node:http";
import { clientAddress, trustedProxies } from "./client-address";

const INSTALLED = Symbol.for("knotwork.clientAddress");

/** Rewrites X-Forwarded-For (and drops X-Real-IP) on every request of every HTTP server in the process. */
export function installClientAddress(setting: string | undefined = process.env.TRUSTED_PROXY): void {
  const proto = http.Server.prototype as unknown as Record<symbol, unknown> & { emit: (...args: unknown[]) => boolean };
  if (proto[INSTALLED]) return;
  const trusted = trustedProxies(setting);
  const emit = proto.emit;
  proto.emit = function (this: http.Server, event: unknown, ...args: unknown[]): boolean {
    if (event === "request") {
      const req = args[0] as http.IncomingMessage;
      req.headers["x-forwarded-for"] = clientAddress(req.socket?.remoteAddress, req.headers["x-forwarded-for"], trusted);
      delete req.headers["x-real-ip"];
    }
    return emit.call(this, event, ...args);
  };
  proto[INSTALLED] = true;
}
