/**
 * Knots into drills: generating a knot's drills, the caches that keep the answers, the drill shape
 * the browser sees and the download files. This index is server only (`import "server-only"`);
 * client components import the two client-safe files directly.
 *
 * - generate.ts: cut the knot's bars out of the piece, run the families with a hand profile (no db)
 * - request.ts: load a studio's knot and hand profile from the database, then generate
 * - cache.ts, score-cache.ts: the generate handler's answers and the parsed pieces, kept in LRUs
 * - files.ts: a drill as MusicXML, .mxl or MIDI, a sheet as a zip, and their download responses
 * - generate-request.ts (client-safe): the request schema the form and the handlers share
 * - dto.ts (client-safe): the JSON shape of a drill as the browser sees it
 */
import "server-only";

export * from "./cache";
export * from "./dto";
export * from "./files";
export * from "./generate";
export * from "./generate-request";
export * from "./request";
export * from "./score-cache";
