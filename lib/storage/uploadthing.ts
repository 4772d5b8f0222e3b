import { UTApi, UTFile } from "uploadthing/server";
import type { FileStore } from "./types";
import { safeName } from "./local";

/** Overrides for UploadThing's endpoints; tests point these at a local fake. */
export interface UploadThingOptions {
  token: string;
  apiUrl?: string;
  ingestUrl?: string;
  ufsHost?: string;
  ufsAppIdLocation?: "subdomain" | "path";
}

/** Files kept by UploadThing (private ACL is not assumed: reads go through a short-lived signed URL). */
export function uploadThingStore(options: UploadThingOptions): FileStore {
  const api = new UTApi({ ...options, logLevel: "Error" });
  return {
    kind: "uploadthing",
    async putFile(name, body, contentType) {
      const file = new UTFile([body as BlobPart], safeName(name), { type: contentType });
      const res = await api.uploadFiles(file);
      if (res.error || !res.data) throw new Error(`The file could not be stored: ${res.error?.message ?? "no answer"}`);
      return res.data.key;
    },
    async getFile(key) {
      const { ufsUrl } = await api.generateSignedURL(key, { expiresIn: 60 });
      const res = await fetch(ufsUrl);
      if (res.status === 404) return null;
      if (!res.ok) throw new Error(`The stored file could not be read (HTTP ${res.status}).`);
      return new Uint8Array(await res.arrayBuffer());
    },
    async deleteFile(key) {
      await api.deleteFiles(key);
    },
  };
}
