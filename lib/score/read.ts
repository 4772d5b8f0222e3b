/**
 * `readScore`: MusicXML text, or the bytes of a .musicxml / .xml / .mxl file, into the exact model.
 */
import { ScoreError } from "./errors";
import { isZip, unpackMxl } from "./mxl";
import { buildScore } from "./read-build";
import { parsePartwise } from "./read-partwise";
import { DEFAULT_LIMITS, type ReadOptions } from "./read-types";
import { assertSafeXml, xmlCleaner } from "./sanitize";
import type { Score, ScoreWarning } from "./types";

export type { ReadOptions } from "./read-types";

/** What `readScore` returns: the model and everything it had to tolerate. */
export interface ReadResult {
  readonly score: Score;
  readonly warnings: ScoreWarning[];
}

/** What `readScore(input, { clean: true })` returns: also the cleaned copy, made in the same pass. */
export interface CleanReadResult extends ReadResult {
  /** Exactly what `sanitizeScore(input)` returns. */
  readonly cleaned: string;
}

/**
 * Read partwise MusicXML (text or bytes, zipped .mxl detected by content) into a `Score`.
 * Throws `ScoreError` only when the file cannot be used; oddities become warnings. With
 * `{ clean: true }` it also returns the cleaned copy (`sanitizeScore`'s text) from the same pass.
 *
 * @example
 * const { score, warnings } = readScore(xmlText);
 * score.events[0].onset.toFraction(); // "0"
 * const { cleaned } = readScore(uploadBytes, { clean: true }); // what gets stored
 */
export function readScore(input: string | Uint8Array, options: ReadOptions & { clean: true }): CleanReadResult;
export function readScore(input: string | Uint8Array, options?: ReadOptions): ReadResult;
export function readScore(input: string | Uint8Array, options: ReadOptions = {}): ReadResult | CleanReadResult {
  const text = scoreText(input);
  assertSafeXml(text);
  const limits = { ...DEFAULT_LIMITS, ...options };
  const cleaner = options.clean ? xmlCleaner() : undefined;
  const raw = parsePartwise(text, limits, cleaner);
  const score = buildScore(raw);
  return cleaner ? { score, warnings: raw.warnings, cleaned: cleaner.result() } : { score, warnings: raw.warnings };
}

/**
 * The cleaned MusicXML text of an upload — the only copy ever stored or sent to a browser. The file is
 * read in full (so hostile or unusable files throw the same `ScoreError`s as `readScore`) and, in the
 * same pass, re-serialised without DOCTYPE, comments and processing instructions, entities decoded.
 * When the `Score` is needed too, `readScore(input, { clean: true })` gives both at once.
 *
 * @example
 * sanitizeScore(mxlBytes).startsWith('<?xml version="1.0" encoding="UTF-8"?>'); // true
 */
export function sanitizeScore(input: string | Uint8Array, options: ReadOptions = {}): string {
  const text = scoreText(input);
  assertSafeXml(text);
  const cleaner = xmlCleaner();
  parsePartwise(text, { ...DEFAULT_LIMITS, ...options }, cleaner);
  return cleaner.result();
}

/**
 * The MusicXML text of an upload: unpacks .mxl, decodes bytes (UTF-8, UTF-16 with BOM, or the
 * encoding the XML declaration names). Text input passes through unchanged.
 *
 * @example
 * scoreText(new TextEncoder().encode("<score-partwise/>")); // "<score-partwise/>"
 */
export function scoreText(input: string | Uint8Array): string {
  if (typeof input === "string") return input;
  const bytes = isZip(input) ? unpackMxl(input).xml : input;
  return decodeXml(bytes);
}

function decodeXml(bytes: Uint8Array): string {
  if (bytes[0] === 0xff && bytes[1] === 0xfe) return new TextDecoder("utf-16le").decode(bytes);
  if (bytes[0] === 0xfe && bytes[1] === 0xff) return new TextDecoder("utf-16be").decode(bytes);
  const head = new TextDecoder("latin1").decode(bytes.subarray(0, 200));
  const declared = /^\s*<\?xml[^>]*encoding\s*=\s*["']([\w.-]+)["']/.exec(head)?.[1];
  let decoder: TextDecoder;
  try {
    decoder = new TextDecoder(declared && !/^utf-?16$/i.test(declared) ? declared : "utf-8");
  } catch {
    throw new ScoreError("xml-malformed", `Unknown character encoding "${declared}"`);
  }
  const text = decoder.decode(bytes);
  return text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
}
