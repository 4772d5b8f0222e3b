/** Where uploaded pieces live: local disk by default, UploadThing when a token is configured. */
export interface FileStore {
  /** Which backend this is, for logs and tests. */
  readonly kind: "local" | "uploadthing";
  /** Stores bytes under a name and returns the key to read or delete them later. */
  putFile(name: string, body: Uint8Array, contentType: string): Promise<string>;
  /** The stored bytes, or null when the key is unknown. */
  getFile(key: string): Promise<Uint8Array | null>;
  /** Removes a file; removing a missing file is not an error. */
  deleteFile(key: string): Promise<void>;
}
