import { describe, expect, test } from "vitest";
import { BodyTooLargeError, readBodyCapped, readFormCapped, readJsonCapped } from "./body";

const MB = 1024 * 1024;

/** A chunked body (no Content-Length) of `total` bytes made on demand; `pulled()` says how much was made. */
function chunkedBody(total: number, chunk = 64 * 1024) {
  let made = 0;
  const stream = new ReadableStream<Uint8Array>({
    pull(controller) {
      if (made >= total) return controller.close();
      const n = Math.min(chunk, total - made);
      made += n;
      controller.enqueue(new Uint8Array(n).fill(0x61));
    },
  });
  const request = new Request("http://localhost/api/pieces", { method: "POST", body: stream, duplex: "half" } as RequestInit);
  return { request, pulled: () => made };
}

describe("readBodyCapped", () => {
  test("a 50 MB chunked body stops at the 5 MB cap: BodyTooLargeError, the rest never read", async () => {
    const { request, pulled } = chunkedBody(50 * MB);
    expect(request.headers.get("content-length")).toBeNull();
    await expect(readBodyCapped(request, 5 * MB)).rejects.toBeInstanceOf(BodyTooLargeError);
    // The stream may run a chunk or two ahead of the reader (its queue), never far past the cap.
    expect(pulled()).toBeLessThan(5 * MB + 4 * 64 * 1024);
  });

  test("a declared Content-Length over the cap is refused before reading", async () => {
    const request = new Request("http://localhost/x", { method: "POST", body: "x".repeat(100), headers: { "content-length": String(10 * MB) } });
    await expect(readBodyCapped(request, 5 * MB)).rejects.toBeInstanceOf(BodyTooLargeError);
  });

  test("a body at the cap is read whole, byte for byte", async () => {
    const { request } = chunkedBody(1 * MB, 10_000);
    const bytes = await readBodyCapped(request, 1 * MB);
    expect(bytes.byteLength).toBe(1 * MB);
    expect(bytes.every((b) => b === 0x61)).toBe(true);
  });

  test("forms and JSON parse as request.formData() and request.json() would", async () => {
    const fd = new FormData();
    fd.append("file", new File(["<score-partwise/>"], "a.musicxml", { type: "application/xml" }));
    fd.set("confirm", "yes");
    const form = await readFormCapped(new Request("http://localhost/x", { method: "POST", body: fd }), MB);
    expect(form.get("confirm")).toBe("yes");
    expect(await (form.get("file") as File).text()).toBe("<score-partwise/>");
    expect(await readJsonCapped(new Request("http://localhost/x", { method: "POST", body: '{"a":[1,2]}' }))).toEqual({ a: [1, 2] });
    expect(await readJsonCapped(new Request("http://localhost/x", { method: "POST", body: "not json" }))).toBeUndefined();
    await expect(readJsonCapped(new Request("http://localhost/x", { method: "POST", body: "[" + "1,".repeat(200_000) + "1]" }))).rejects.toBeInstanceOf(BodyTooLargeError);
  });
});
