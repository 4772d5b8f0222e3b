import { z } from "zod";
import { OCTAVE_WIDTHS } from "@/lib/drills/hand";

export const InviteInput = z.object({
  email: z.email("Enter the student's e-mail address.").max(254),
});

/**
 * A hand profile as the teacher enters it: the comfortable 1–5 span in mm, or the measured full
 * span in inches (converted with profileFromInches), and the keyboard the student plays on.
 * Limits are common practice: adult and child 1–5 spans lie far inside 100–280 mm (4–11 in).
 */
export const HandProfileInput = z
  .object({
    membershipId: z.string().min(1),
    unit: z.enum(["mm", "in"]),
    span: z.number({ error: "Enter the span as a number." }).positive("The span must be above zero."),
    octave: z.enum(OCTAVE_WIDTHS.map((o) => o.id) as [string, ...string[]]),
  })
  .superRefine((v, ctx) => {
    const [lo, hi] = v.unit === "mm" ? [100, 280] : [4, 11];
    if (v.span < lo || v.span > hi) {
      ctx.addIssue({ code: "custom", path: ["span"], message: `A span between ${lo} and ${hi} ${v.unit === "mm" ? "mm" : "inches"}, please.` });
    }
  });

export type HandProfileInput = z.infer<typeof HandProfileInput>;
