/**
 * Calling server actions over HTTP as the browser does: POST to a page with the `Next-Action`
 * header and the arguments encoded by React's own `encodeReply` (the client half of the reply
 * protocol the server decodes). The action list is the build's server-reference-manifest.json.
 */
import fs from "node:fs";
import path from "node:path";
import { createRequire } from "node:module";
import { baseURL, cookies, ids, type Persona } from "./context";
import { distDir } from "./server";
import { urlFor, type AppRoute } from "./routes";

const { encodeReply } = createRequire(__filename)("next/dist/compiled/react-server-dom-turbopack/client.node") as {
  encodeReply: (value: unknown) => Promise<string | FormData>;
};

export interface ActionEntry {
  id: string;
  filename: string;
  exportedName: string;
  page: string;
}

/** Every server action of the build with one page that serves it. */
export function buildActions(): ActionEntry[] {
  const manifest = JSON.parse(fs.readFileSync(path.join(distDir(), "server/server-reference-manifest.json"), "utf8")) as {
    node: Record<string, { workers: Record<string, unknown>; filename: string; exportedName: string }>;
  };
  return Object.entries(manifest.node).map(([id, a]) => ({ id, filename: a.filename, exportedName: a.exportedName, page: Object.keys(a.workers)[0] }));
}

/** "app/(teacher)/pieces/[pieceId]/page" → the page's URL with demo ids. */
export function pageUrl(worker: string): string {
  const segments = worker.replace(/^app\//, "").replace(/\/page$/, "").split("/").filter((s) => s && s !== "page");
  const params = segments.filter((s) => s.startsWith("[")).map((s) => s.replace(/^\[+(\.\.\.)?|\]+$/g, ""));
  const route: AppRoute = { file: worker, kind: "page", pattern: "/" + segments.filter((s) => !/^\(.+\)$/.test(s)).join("/"), group: null, params, methods: ["POST"] };
  return urlFor(route, ids);
}

/** One action call as a persona; redirects are reported, not followed. `origin: null` sends no Origin header. */
export async function callAction(action: ActionEntry, url: string, persona: Persona, args: unknown[], origin: string | null = baseURL) {
  const body = await encodeReply(args);
  const headers: Record<string, string> = { "next-action": action.id, accept: "text/x-component" };
  if (origin !== null) headers.origin = origin;
  if (typeof body === "string") headers["content-type"] = "text/plain;charset=UTF-8";
  if (cookies[persona]) headers.cookie = cookies[persona];
  const res = await fetch(new URL(url, baseURL), { method: "POST", headers, body, redirect: "manual" });
  return { status: res.status, location: res.headers.get("location"), contentType: res.headers.get("content-type") ?? "", body: await res.text(), headers: res.headers };
}

