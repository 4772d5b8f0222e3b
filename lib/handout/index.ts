/**
 * Handouts: drills engraved to SVG, and drill sheets as printable PDFs. A pure renderer (data in,
 * SVG or PDF bytes out; no app service, no db), but Node only: it imports jsdom, pdfkit and the
 * engraver, so never import it from client components.
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
