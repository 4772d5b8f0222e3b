/**
 * Warnings of the reader: one per (code, element, bar), capped so a broken file cannot flood memory.
 */
import type { ScoreWarning } from "./types";

/** Most warnings kept per file; the last one says how many more were dropped. */
export const MAX_WARNINGS = 200;

const seen = new WeakMap<object, Set<string>>();

/**
 * Record a warning once per code, element and bar.
 *
 * @example
 * warn(raw, "unsupported", "<tremolo> is not modelled", 3, "tremolo");
 */
export function warn(
  target: { readonly warnings: ScoreWarning[] },
  code: string,
  message: string,
  measure?: number,
  element?: string,
): void {
  let keys = seen.get(target);
  if (!keys) {
    keys = new Set();
    seen.set(target, keys);
  }
  const key = `${code}|${element ?? ""}|${measure ?? ""}`;
  if (keys.has(key)) return;
  keys.add(key);
  if (target.warnings.length === MAX_WARNINGS) {
    target.warnings.push({ code: "too-many-warnings", message: "Further warnings were dropped" });
  }
  if (target.warnings.length > MAX_WARNINGS) return;
  target.warnings.push({
    code,
    message: measure === undefined ? message : `${message} (measure index ${measure})`,
    ...(measure === undefined ? {} : { measure }),
    ...(element === undefined ? {} : { element }),
  });
}
