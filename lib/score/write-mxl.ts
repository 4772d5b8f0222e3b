/**
 * Compressed MusicXML (.mxl): a zip whose first entry is an uncompressed `mimetype`, then
 * `META-INF/container.xml` naming the root file, then the score.
 */
import { strToU8, zipSync } from "fflate";
import type { Score } from "./types";
import { writeMusicXML } from "./write";

/** The MIME type stored in the `mimetype` entry of a compressed MusicXML file. */
export const MXL_MIME_TYPE = "application/vnd.recordare.musicxml";

/** Name of the score inside the archive. */
export const MXL_ROOT_FILE = "score.musicxml";

const CONTAINER_XML =
  '<?xml version="1.0" encoding="UTF-8"?>\n' +
  "<container>\n" +
  "  <rootfiles>\n" +
  `    <rootfile full-path="${MXL_ROOT_FILE}" media-type="application/vnd.recordare.musicxml+xml"/>\n` +
  "  </rootfiles>\n" +
  "</container>\n";

/** A fixed timestamp, so the same score always gives the same bytes. */
const MTIME = new Date(2000, 0, 1, 0, 0, 0);

/**
 * Writes a score as a compressed MusicXML (.mxl) file.
 * @example
 *   const bytes = writeMxl(score); // bytes[0..3] = "PK\x03\x04", first entry "mimetype", stored
 */
export function writeMxl(score: Score): Uint8Array {
  return zipSync(
    {
      mimetype: [strToU8(MXL_MIME_TYPE), { level: 0 }],
      "META-INF": { "container.xml": [strToU8(CONTAINER_XML), { level: 6 }] },
      [MXL_ROOT_FILE]: [strToU8(writeMusicXML(score)), { level: 6 }],
    },
    { mtime: MTIME },
  );
}
