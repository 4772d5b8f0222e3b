/**
 * Uploaded files: one `FileStore` interface with a local-disk store and an UploadThing store, and
 * the store the environment picks. Server only (`import "server-only"`).
 */
import "server-only";
import path from "node:path";
import { localStore } from "./local";
import type { FileStore } from "./types";
import { uploadThingStore } from "./uploadthing";

export type { FileStore } from "./types";
export { localStore, safeName } from "./local";
export { uploadThingStore } from "./uploadthing";

/** The default folder for local uploads (git-ignored). */
export const DEFAULT_UPLOADS_DIR = "./data/uploads";

/**
 * The configured store: UploadThing when UPLOADTHING_TOKEN is set (UPLOADTHING_API_URL,
 * UPLOADTHING_INGEST_URL and UPLOADTHING_UFS_HOST override its endpoints), else local disk
 * under UPLOADS_DIR.
 */
export function storeFromEnv(env: Readonly<Record<string, string | undefined>> = process.env): FileStore {
  const token = env.UPLOADTHING_TOKEN;
  if (token) {
    return uploadThingStore({
      token,
      apiUrl: env.UPLOADTHING_API_URL || undefined,
      ingestUrl: env.UPLOADTHING_INGEST_URL || undefined,
      ufsHost: env.UPLOADTHING_UFS_HOST || undefined,
      ufsAppIdLocation: env.UPLOADTHING_UFS_HOST ? "path" : undefined,
    });
  }
  return localStore(path.resolve(env.UPLOADS_DIR || DEFAULT_UPLOADS_DIR));
}
