/**
 * Compressed MusicXML (.mxl): a zip with META-INF/container.xml naming the root file.
 * Reads the zip's central directory itself and inflates in small steps, so caps hold even when
 * the archive lies about its sizes.
 */
import { Inflate } from "fflate";
import { ScoreError } from "./errors";

/** Caps for compressed uploads. */
export const MXL_LIMITS = {
  /** Largest .mxl accepted, in bytes. */
  maxZipBytes: 10 * 1024 * 1024,
  maxEntries: 200,
  /** Largest inflated root file (and total of what is inflated), in bytes. */
  maxInflatedBytes: 10 * 1024 * 1024,
  /** Largest inflated/compressed ratio of an entry over 1 MB (ordinary MusicXML is about 10–40). */
  maxRatio: 200,
} as const;

/** One file listed in the archive's central directory. */
export interface ZipEntry {
  readonly name: string;
  readonly method: number;
  readonly compressedSize: number;
  readonly size: number;
  readonly localOffset: number;
}

/**
 * True when the bytes start like a zip archive (PK\x03\x04), whatever the file was called.
 *
 * @example
 * isZip(new Uint8Array([0x50, 0x4b, 3, 4])); // true
 */
export function isZip(bytes: Uint8Array): boolean {
  return bytes.length >= 4 && bytes[0] === 0x50 && bytes[1] === 0x4b && bytes[2] === 3 && bytes[3] === 4;
}

const u16 = (b: Uint8Array, o: number) => b[o] | (b[o + 1] << 8);
const u32 = (b: Uint8Array, o: number) => (b[o] | (b[o + 1] << 8) | (b[o + 2] << 16) | (b[o + 3] << 24)) >>> 0;
const utf8 = new TextDecoder("utf-8");

/**
 * List the entries of a zip from its central directory, refusing odd names and too many entries.
 *
 * @example
 * listZip(zipSync({ "a.xml": strToU8("<a/>") })).map((e) => e.name); // ["a.xml"]
 */
export function listZip(bytes: Uint8Array): ZipEntry[] {
  if (bytes.length > MXL_LIMITS.maxZipBytes) {
    throw new ScoreError("too-large", `The archive has ${bytes.length} bytes; the limit is ${MXL_LIMITS.maxZipBytes}`);
  }
  let eocd = -1;
  for (let i = bytes.length - 22; i >= Math.max(0, bytes.length - 65558); i--) {
    if (u32(bytes, i) === 0x06054b50) {
      eocd = i;
      break;
    }
  }
  if (eocd < 0) throw new ScoreError("zip-corrupt", "The archive has no central directory (truncated zip?)");
  const count = u16(bytes, eocd + 10);
  let p = u32(bytes, eocd + 16);
  if (count === 0xffff || p === 0xffffffff) throw new ScoreError("zip-corrupt", "ZIP64 archives are not accepted");
  if (count > MXL_LIMITS.maxEntries) {
    throw new ScoreError("zip-entries", `The archive has ${count} entries; the limit is ${MXL_LIMITS.maxEntries}`);
  }
  const entries: ZipEntry[] = [];
  for (let i = 0; i < count; i++) {
    if (p + 46 > bytes.length || u32(bytes, p) !== 0x02014b50) {
      throw new ScoreError("zip-corrupt", "The archive's central directory is damaged");
    }
    const nameLen = u16(bytes, p + 28);
    const name = utf8.decode(bytes.subarray(p + 46, p + 46 + nameLen));
    assertSafeName(name);
    entries.push({
      name,
      method: u16(bytes, p + 10),
      compressedSize: u32(bytes, p + 20),
      size: u32(bytes, p + 24),
      localOffset: u32(bytes, p + 42),
    });
    p += 46 + nameLen + u16(bytes, p + 30) + u16(bytes, p + 32);
  }
  return entries;
}

function assertSafeName(name: string): void {
  const parts = name.split(/[\\/]/);
  if (/^([\\/]|[A-Za-z]:)/.test(name) || parts.includes("..") || name.includes("\0")) {
    throw new ScoreError("zip-path", `The archive holds an unsafe path name: ${JSON.stringify(name.slice(0, 80))}`);
  }
}

/**
 * Inflate one entry, stopping as soon as the output passes the cap or the ratio cap.
 *
 * @example
 * utf8.decode(inflateEntry(bytes, listZip(bytes)[0]));
 */
export function inflateEntry(bytes: Uint8Array, entry: ZipEntry): Uint8Array {
  const { maxInflatedBytes, maxRatio } = MXL_LIMITS;
  const bomb = (why: string) => new ScoreError("zip-bomb", `${entry.name}: ${why}`);
  if (entry.size > maxInflatedBytes) throw bomb(`declares ${entry.size} bytes; the limit is ${maxInflatedBytes}`);
  const lo = entry.localOffset;
  if (lo + 30 > bytes.length || u32(bytes, lo) !== 0x04034b50) throw new ScoreError("zip-corrupt", `${entry.name}: bad local header`);
  const start = lo + 30 + u16(bytes, lo + 26) + u16(bytes, lo + 28);
  const data = bytes.subarray(start, start + entry.compressedSize);
  if (entry.method === 0) return data.slice();
  if (entry.method !== 8) throw new ScoreError("zip-corrupt", `${entry.name}: unknown compression method ${entry.method}`);
  const chunks: Uint8Array[] = [];
  let total = 0;
  const inflater = new Inflate((chunk) => {
    total += chunk.length;
    if (total > maxInflatedBytes) throw bomb(`inflates past ${maxInflatedBytes} bytes`);
    if (total > 1024 * 1024 && total > maxRatio * Math.max(1, data.length)) {
      throw bomb(`inflates more than ${maxRatio} times its compressed size`);
    }
    chunks.push(chunk);
  });
  const step = 4096;
  try {
    for (let i = 0; i < data.length; i += step) inflater.push(data.subarray(i, i + step), i + step >= data.length);
  } catch (e) {
    if (e instanceof ScoreError) throw e;
    throw new ScoreError("zip-corrupt", `${entry.name}: ${(e as Error).message}`);
  }
  const out = new Uint8Array(total);
  let o = 0;
  for (const c of chunks) {
    out.set(c, o);
    o += c.length;
  }
  return out;
}

/**
 * Unpack an .mxl to its root MusicXML bytes, following META-INF/container.xml.
 *
 * @example
 * const { name, xml } = unpackMxl(bytes); // name "score.musicxml"
 */
export function unpackMxl(bytes: Uint8Array): { name: string; xml: Uint8Array } {
  const entries = listZip(bytes);
  const container = entries.find((e) => e.name === "META-INF/container.xml");
  if (!container) {
    throw new ScoreError("zip-no-container", "The archive has no META-INF/container.xml, which MusicXML requires");
  }
  const text = utf8.decode(inflateEntry(bytes, container));
  const rootPath = /<rootfile\b[^>]*\bfull-path\s*=\s*("([^"]*)"|'([^']*)')/.exec(text);
  const path = rootPath ? (rootPath[2] ?? rootPath[3]) : undefined;
  const root = path === undefined ? undefined : entries.find((e) => e.name === path);
  if (!root) {
    throw new ScoreError("zip-no-rootfile", `The container names no root file present in the archive (${path ?? "none"})`);
  }
  return { name: root.name, xml: inflateEntry(bytes, root) };
}
