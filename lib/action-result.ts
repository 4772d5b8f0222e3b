import { z } from "zod";

/** What every server action returns: data on success, a message and per-field errors otherwise. */
export type ActionResult<T = undefined> =
  | { ok: true; data: T }
  | { ok: false; message: string; fieldErrors?: Record<string, string[]> };

export function ok<T>(data: T): ActionResult<T> {
  return { ok: true, data };
}

export function fail(message: string, fieldErrors?: Record<string, string[]>): ActionResult<never> {
  return fieldErrors ? { ok: false, message, fieldErrors } : { ok: false, message };
}

/** Turns a zod error into a failed result listing every field's messages. */
export function fromZodError(error: z.ZodError, message = "Please check the highlighted fields."): ActionResult<never> {
  const flat = z.flattenError(error);
  const fieldErrors: Record<string, string[]> = {};
  for (const [key, messages] of Object.entries(flat.fieldErrors)) {
    if (Array.isArray(messages) && messages.length > 0) fieldErrors[key] = messages as string[];
  }
  return fail(message, fieldErrors);
}
