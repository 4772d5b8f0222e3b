/**
 * Request bodies read with a byte cap, whatever the transfer encoding. `request.formData()` and
 * `request.json()` buffer the whole body before anyone can look at its size, and a chunked upload
 * has no Content-Length to check first; here the stream is read chunk by chunk and cancelled as soon
 * as the count passes the cap, so a 50 MB body costs at most the cap in memory.
 * (OWASP File Upload Cheat Sheet: "Set a file size limit"; OWASP Denial of Service Cheat Sheet:
 * limit request body sizes.)
 */

/** The body was larger than the cap (the stream has been cancelled). */
export class BodyTooLargeError extends Error {
  constructor(readonly maxBytes: number) {
    super(`The request body is larger than ${maxBytes} bytes.`);
    this.name = "BodyTooLargeError";
  }
}

/** Most bytes of a JSON body for the generate and sheet handlers (a sheet request is a few KB). */
export const MAX_JSON_BYTES = 256 * 1024;

/**
 * The body's bytes, or BodyTooLargeError once more than `maxBytes` have arrived (a declared
 * Content-Length over the cap is refused before reading anything).
 *
 * @example
 * const bytes = await readBodyCapped(request, 5 * 1024 * 1024);
 */
export async function readBodyCapped(request: Request, maxBytes: number): Promise<Uint8Array<ArrayBuffer>> {
  const declared = Number(request.headers.get("content-length") ?? NaN);
  if (Number.isFinite(declared) && declared > maxBytes) {
    await request.body?.cancel().catch(() => undefined);
    throw new BodyTooLargeError(maxBytes);
  }
  if (!request.body) return new Uint8Array(0);
  const reader = request.body.getReader();
  const chunks: Uint8Array[] = [];
  let total = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    total += value.byteLength;
    if (total > maxBytes) {
      await reader.cancel().catch(() => undefined);
      throw new BodyTooLargeError(maxBytes);
    }
    chunks.push(value);
  }
  const out = new Uint8Array(total);
  let at = 0;
  for (const c of chunks) {
    out.set(c, at);
    at += c.byteLength;
  }
  return out;
}

/** The body parsed as JSON within `maxBytes`; undefined when it is not JSON. Throws BodyTooLargeError. */
export async function readJsonCapped(request: Request, maxBytes: number = MAX_JSON_BYTES): Promise<unknown> {
  const bytes = await readBodyCapped(request, maxBytes);
  try {
    return JSON.parse(new TextDecoder().decode(bytes));
  } catch {
    return undefined;
  }
}

/** The body parsed as a multipart or urlencoded form within `maxBytes`. Throws BodyTooLargeError, or TypeError when malformed. */
export async function readFormCapped(request: Request, maxBytes: number): Promise<FormData> {
  const bytes = await readBodyCapped(request, maxBytes);
  return new Response(bytes, { headers: { "content-type": request.headers.get("content-type") ?? "" } }).formData();
}
