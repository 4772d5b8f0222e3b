/**
 * What a handout is made of: the sheet's header data and its drills, validated with zod so the
 * route handler and the renderer accept the same shape.
 */
import { z } from "zod";
import { CAUTION } from "../caution";

export const PAPER_SIZES = ["a4", "letter"] as const;
export type Paper = (typeof PAPER_SIZES)[number];

const tempo = z.number().int().min(20).max(320);

/** Longest drill warning text (all of a drill's warnings, one a line) a handout takes. */
export const HANDOUT_WARNING_MAX = 2000;

export const HandoutDrillSchema = z.object({
  title: z.string().trim().min(1).max(200),
  musicxml: z.string().min(1),
  studentNote: z.string().max(2000),
  tempo: z.object({ start: tempo, target: tempo }),
  spanWarning: z.string().max(HANDOUT_WARNING_MAX).optional(),
});

export const HandoutInputSchema = z.object({
  sheetTitle: z.string().trim().min(1).max(200),
  pieceTitle: z.string().trim().min(1).max(200),
  /** e.g. "bars 5–6, right hand" */
  bars: z.string().trim().min(1).max(200),
  studentName: z.string().trim().max(120).optional(),
  /** As it should be printed, e.g. "12 March 2025". */
  date: z.string().trim().min(1).max(60),
  paper: z.enum(PAPER_SIZES),
  studioName: z.string().trim().max(120).optional(),
  drills: z.array(HandoutDrillSchema).min(1).max(40),
});

export type HandoutDrill = z.infer<typeof HandoutDrillSchema>;
export type HandoutInput = z.infer<typeof HandoutInputSchema>;

/** The caution printed in the footer of every handout page: the product's one caution text. */
export const HANDOUT_CAUTION: string = CAUTION.text;

/** Page sizes in PDF points (1/72 in): A4 per ISO 216 (210 × 297 mm), Letter per ANSI/ASME Y14.1 (8.5 × 11 in). */
export const PAGE_SIZE_PT: Record<Paper, { width: number; height: number }> = {
  a4: { width: 595.28, height: 841.89 },
  letter: { width: 612, height: 792 },
};
