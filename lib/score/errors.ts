/**
 * Typed failures of the score reader: every unusable upload ends in one `ScoreError` with a stable `code`.
 */

/** Every reason a file can be refused. Codes are stable: the upload form and the tests key on them. */
export const SCORE_ERROR_CODES = [
  "too-large",
  "doctype-subset",
  "entity-internal",
  "entity-nested",
  "entity-external",
  "entity-parameter",
  "xml-malformed",
  "not-musicxml",
  "timewise",
  "zip-corrupt",
  "zip-entries",
  "zip-path",
  "zip-bomb",
  "zip-no-container",
  "zip-no-rootfile",
  "missing-divisions",
  "missing-duration",
  "bad-duration",
  "too-many-measures",
  "too-many-notes",
  "bad-passage",
] as const;

export type ScoreErrorCode = (typeof SCORE_ERROR_CODES)[number];

/** Where in the file a problem sits, when known. */
export interface ScoreErrorPlace {
  /** 0-based measure index in written order. */
  readonly measure?: number;
  /** Printed bar number. */
  readonly number?: string;
  readonly element?: string;
}

/**
 * The only error `readScore`, `sanitizeScore` and `selectPassage` throw on purpose.
 *
 * @example
 * try { readScore("<html/>"); } catch (e) { if (e instanceof ScoreError) e.code; } // "not-musicxml"
 */
export class ScoreError extends Error {
  readonly code: ScoreErrorCode;
  readonly measure?: number;
  readonly element?: string;

  constructor(code: ScoreErrorCode, message: string, place: ScoreErrorPlace = {}) {
    const where = describePlace(place);
    super(where ? `${message} (${where})` : message);
    this.name = "ScoreError";
    this.code = code;
    this.measure = place.measure;
    this.element = place.element;
  }
}

function describePlace(place: ScoreErrorPlace): string {
  const parts: string[] = [];
  if (place.number !== undefined) parts.push(`bar ${place.number}`);
  else if (place.measure !== undefined) parts.push(`measure index ${place.measure}`);
  if (place.element) parts.push(`<${place.element}>`);
  return parts.join(", ");
}

/**
 * True when `e` is a `ScoreError`, optionally with the given code.
 *
 * @example
 * isScoreError(new ScoreError("zip-path", "bad name"), "zip-path"); // true
 */
export function isScoreError(e: unknown, code?: ScoreErrorCode): e is ScoreError {
  return e instanceof ScoreError && (code === undefined || e.code === code);
}
