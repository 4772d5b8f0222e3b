/**
 * Download files of a drill (MusicXML, compressed .mxl, Standard MIDI File) and of a whole sheet
 * (a zip holding each drill in the three formats), with their content types and file names.
 */
import { zipSync } from "fflate";
import { readScore, writeMidi, writeMxl } from "../score/index";

export const DRILL_FORMATS = ["musicxml", "mxl", "midi"] as const;
export type DrillFormat = (typeof DRILL_FORMATS)[number];

/** IANA media types registered for MusicXML (MusicXML 4.0 spec, "MusicXML media types") and MIDI. */
export const CONTENT_TYPES: Readonly<Record<DrillFormat, string>> = {
  musicxml: "application/vnd.recordare.musicxml+xml",
  mxl: "application/vnd.recordare.musicxml",
  midi: "audio/midi",
};
const EXTENSIONS: Readonly<Record<DrillFormat, string>> = { musicxml: "musicxml", mxl: "mxl", midi: "mid" };

export interface DownloadFile {
  bytes: Uint8Array;
  contentType: string;
  filename: string;
}

/**
 * A file-name stem from a title: lower-case ASCII words joined by hyphens, at most 60 characters,
 * or `fallback` when nothing is left. The one slug for every download name (drills, zips, handouts).
 */
export function fileStem(title: string, fallback = "drill"): string {
  const stem = title
    .normalize("NFKD")
    .replace(/[^\w\s-]/g, "")
    .toLowerCase()
    .replace(/[\s_-]+/g, "-")
    .slice(0, 60)
    .replace(/^-+|-+$/g, "");
  return stem || fallback;
}

/** One drill, from its stored MusicXML, in one format. */
export function drillFile(musicxml: string, title: string, format: DrillFormat, stem = fileStem(title)): DownloadFile {
  const name = `${stem}.${EXTENSIONS[format]}`;
  if (format === "musicxml") return { bytes: new TextEncoder().encode(musicxml), contentType: CONTENT_TYPES.musicxml, filename: name };
  const { score } = readScore(musicxml);
  const bytes = format === "mxl" ? writeMxl(score) : writeMidi(score);
  return { bytes, contentType: CONTENT_TYPES[format], filename: name };
}

/** A sheet as one zip: `01-title.musicxml`, `01-title.mxl`, `01-title.mid` per drill, in order. */
export function sheetZip(title: string, drills: readonly { title: string; musicxml: string }[]): DownloadFile {
  const entries: Record<string, Uint8Array> = {};
  drills.forEach((d, i) => {
    const stem = `${String(i + 1).padStart(2, "0")}-${fileStem(d.title)}`;
    for (const format of DRILL_FORMATS) {
      const file = drillFile(d.musicxml, d.title, format, stem);
      entries[file.filename] = file.bytes;
    }
  });
  return { bytes: zipSync(entries, { level: 6 }), contentType: "application/zip", filename: `${fileStem(title, "drill-sheet")}.zip` };
}

/** The HTTP response for a download. */
export function downloadResponse(file: DownloadFile): Response {
  return new Response(Buffer.from(file.bytes), {
    headers: {
      "Content-Type": file.contentType,
      "Content-Disposition": `attachment; filename="${file.filename}"`,
      "Cache-Control": "private, no-store",
    },
  });
}
