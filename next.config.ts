import type { NextConfig } from "next";

/**
 * Content-Security-Policy: only this origin. Next's inline bootstrap scripts and React/OSMD inline
 * styles need 'unsafe-inline'; OSMD's SVG and fonts may use data: URIs; tone's audio worklets and
 * decoded samples use blob: URLs. `next dev` also needs eval for fast refresh.
 */
const dev = process.env.NODE_ENV === "development";
const contentSecurityPolicy = [
  "default-src 'self'",
  `script-src 'self' 'unsafe-inline' blob:${dev ? " 'unsafe-eval'" : ""}`,
  "style-src 'self' 'unsafe-inline'",
  "img-src 'self' data: blob:",
  "font-src 'self' data:",
  "connect-src 'self' blob: data:",
  "media-src 'self' blob: data:",
  "worker-src 'self' blob:",
  "object-src 'none'",
  "base-uri 'self'",
  "form-action 'self'",
  "frame-ancestors 'none'",
].join("; ");

const securityHeaders = [
  { key: "Content-Security-Policy", value: contentSecurityPolicy },
  { key: "X-Content-Type-Options", value: "nosniff" },
  { key: "X-Frame-Options", value: "DENY" },
  { key: "Referrer-Policy", value: "strict-origin-when-cross-origin" },
];

const nextConfig: NextConfig = {
  // No X-Powered-By: Next.js header (OWASP HTTP Headers Cheat Sheet: remove fingerprinting headers).
  poweredByHeader: false,
  // A second build folder (e.g. for the hardening suite) so two builds never overwrite each other.
  distDir: process.env.KNOTWORK_DIST_DIR || ".next",
  // piscina loads its own worker file from node_modules, so it must not be bundled either.
  serverExternalPackages: ["jsdom", "pdfkit", "svg-to-pdfkit", "opensheetmusicdisplay", "piscina"],
  // forbidden() + app/forbidden.tsx: a student opening a teacher page gets a real 403.
  experimental: {
    authInterrupts: true,
    // With proxy.ts on every path, Next copies each request body for it, up to this size (default 10 MB),
    // before any handler runs. Just above the upload cap (5 MB + 64 KB): a larger body is cut there and
    // the upload handler answers 413 (lib/limits/body.ts).
    proxyClientMaxBodySize: "6mb",
  },
  // `npm test` type-checks the whole project once with tsc; the build does not repeat it.
  typescript: { ignoreBuildErrors: true },
  async headers() {
    return [{ source: "/:path*", headers: securityHeaders }];
  },
};

export default nextConfig;
