/**
 * The one caution Knotwork shows wherever drills are: on screen, in the page footers, on the
 * landing and About pages, and in the footer of every handout page. A generated drill is a
 * suggestion, not a prescription; stop at once on pain or tension; defer to a qualified teacher
 * or a health professional. Pure and client-safe (no imports), so the handout renderer, pages and
 * client components all show the same words.
 *
 * @example
 * import { CAUTION } from "../caution";
 * `${CAUTION.title}: ${CAUTION.text}`;
 */
export const CAUTION = {
  title: "A word of caution",
  text:
    "A generated drill is a suggestion, not a prescription. Stop at once on any pain or tension, " +
    "and defer to a qualified teacher or a health professional.",
} as const;
