/**
 * Handouts (server only): drills engraved to SVG, and drill sheets as printable PDFs.
 * Imports jsdom, pdfkit and the engraver; never import this from client components.
 */
export { renderDrillSvg, DEFAULT_DRILL_WIDTH_PX, type DrillSvgOptions } from "./render-drill-svg";
export { renderHandoutPdf } from "./render-handout-pdf";
export {
  HandoutInputSchema,
  HandoutDrillSchema,
  HANDOUT_CAUTION,
  PAGE_SIZE_PT,
  PAPER_SIZES,
  type HandoutInput,
  type HandoutDrill,
  type Paper,
} from "./input";
export { handoutFontPath } from "./fonts";
