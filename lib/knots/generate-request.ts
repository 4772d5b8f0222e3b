/**
 * The request that generates drills for a knot: which families, their options and whose hand.
 * Family ids must be registered; each family's options are checked by that family's own schema,
 * so the form, the generate handler and sheet saving all agree on one shape.
 */
import { z } from "zod";
import { families } from "../drills/index";

export const GenerateRequest = z
  .object({
    families: z.array(z.string().min(1)).min(1, "Switch on at least one drill family.").max(40),
    options: z.record(z.string(), z.unknown()).default({}),
    /** A student's membership id: their hand profile measures spans. Omitted: the default hand. */
    profile: z.string().min(1).max(64).optional(),
    seed: z.number().int().min(0).max(2 ** 31).optional(),
  })
  .superRefine((req, ctx) => {
    for (const id of req.families) {
      if (!families[id]) ctx.addIssue({ code: "custom", path: ["families"], message: `Unknown drill family "${id}".` });
    }
    for (const [id, raw] of Object.entries(req.options)) {
      const family = families[id];
      if (!family) {
        ctx.addIssue({ code: "custom", path: ["options", id], message: `Options given for unknown drill family "${id}".` });
        continue;
      }
      const parsed = family.options.safeParse(raw ?? {});
      if (!parsed.success) {
        for (const issue of parsed.error.issues) {
          const where = issue.path.length ? issue.path.join(".") : "options";
          ctx.addIssue({ code: "custom", path: ["options", id, ...issue.path.map(String)], message: `${family.label} — ${where}: ${issue.message}` });
        }
      }
    }
  });

export type GenerateRequest = z.output<typeof GenerateRequest>;
export type GenerateRequestInput = z.input<typeof GenerateRequest>;

/** Every issue as one readable line (for the JSON error body and the form). */
export function requestProblems(error: z.ZodError): string[] {
  return error.issues.map((i) => i.message);
}
