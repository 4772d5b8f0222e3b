import http from "node:http";
import type { AddressInfo } from "node:net";

/**
 * A local stand-in for UploadThing's HTTP endpoints, enough for the server SDK (`UTApi`) as
 * uploadthing 7.7 calls them (read from node_modules/uploadthing/server/index.js):
 * - ingest: `PUT <ingestUrl>/<key>?…&signature=…` with a multipart body whose field is `file`;
 * - files: `GET http://<ufsHost>/a/<appId>/<key>?…&signature=…` (ufsAppIdLocation "path");
 * - API: `POST <apiUrl>/v6/deleteFiles` with `{ fileKeys }` and the `x-uploadthing-api-key` header.
 */
export interface UploadThingFake {
  url: string;
  /** The token to give UTApi (base64 JSON of apiKey, appId, regions). */
  token: string;
  appId: string;
  files: Map<string, { name: string; type: string; body: Buffer }>;
  requests: { method: string; path: string }[];
  /** Make the next ingest PUT fail with this status. */
  failNextUpload(status: number): void;
  close(): Promise<void>;
}

const API_KEY = "sk_fake_local_only_0000";

function readBody(req: http.IncomingMessage): Promise<Buffer> {
  return new Promise((resolve, reject) => {
    const chunks: Buffer[] = [];
    req.on("data", (c: Buffer) => chunks.push(c));
    req.on("end", () => resolve(Buffer.concat(chunks)));
    req.on("error", reject);
  });
}

function json(res: http.ServerResponse, status: number, body: unknown) {
  res.writeHead(status, { "content-type": "application/json" });
  res.end(JSON.stringify(body));
}

export async function startUploadThingFake(): Promise<UploadThingFake> {
  const appId = "fakeapp";
  const files = new Map<string, { name: string; type: string; body: Buffer }>();
  const requests: { method: string; path: string }[] = [];
  let failStatus: number | null = null;
  let base = "";

  const server = http.createServer(async (req, res) => {
    const url = new URL(req.url ?? "/", base);
    requests.push({ method: req.method ?? "", path: url.pathname });
    const body = await readBody(req);
    if (req.method === "PUT") {
      if (!url.searchParams.get("signature")) return json(res, 403, { error: "unsigned" });
      if (failStatus !== null) {
        const s = failStatus;
        failStatus = null;
        return json(res, s, { error: "ingest failed" });
      }
      const key = decodeURIComponent(url.pathname.slice(1));
      const form = await new Request(url, { method: "PUT", headers: req.headers as HeadersInit, body: new Uint8Array(body) }).formData();
      const file = form.get("file");
      if (!(file instanceof Blob)) return json(res, 400, { error: "no file field" });
      files.set(key, { name: (file as File).name, type: file.type, body: Buffer.from(await file.arrayBuffer()) });
      const ufsUrl = `${base}/a/${appId}/${key}`;
      return json(res, 200, { url: ufsUrl, appUrl: ufsUrl, ufsUrl, fileHash: "fake" });
    }
    if (req.method === "GET" && url.pathname.startsWith(`/a/${appId}/`)) {
      if (!url.searchParams.get("signature")) return json(res, 403, { error: "unsigned" });
      const f = files.get(decodeURIComponent(url.pathname.slice(`/a/${appId}/`.length)));
      if (!f) return json(res, 404, { error: "not found" });
      res.writeHead(200, { "content-type": f.type });
      return res.end(f.body);
    }
    if (req.method === "POST" && url.pathname === "/v6/deleteFiles") {
      if (req.headers["x-uploadthing-api-key"] !== API_KEY) return json(res, 401, { error: "bad key" });
      const { fileKeys = [] } = JSON.parse(body.toString("utf8") || "{}") as { fileKeys?: string[] };
      let deletedCount = 0;
      for (const k of fileKeys) if (files.delete(k)) deletedCount++;
      return json(res, 200, { success: true, deletedCount });
    }
    json(res, 404, { error: `no fake for ${req.method} ${url.pathname}` });
  });
  await new Promise<void>((resolve) => server.listen(0, "localhost", resolve));
  const { port } = server.address() as AddressInfo;
  base = `http://localhost:${port}`;
  const token = Buffer.from(JSON.stringify({ apiKey: API_KEY, appId, regions: ["fake1"] })).toString("base64");
  return {
    url: base,
    token,
    appId,
    files,
    requests,
    failNextUpload(status) {
      failStatus = status;
    },
    close: () => new Promise((resolve) => server.close(() => resolve())),
  };
}
