import fs from "node:fs";
import path from "node:path";
import type { ScorePartSummary } from "../../db/schema";

export interface DemoPiece {
  fileName: string;
  title: string;
  composer: string | null;
  bars: number;
  parts: ScorePartSummary[];
  musicxml: string;
}

const unescape = (s: string) =>
  s
    .replace(/&#(\d+);/g, (_, n) => String.fromCodePoint(Number(n)))
    .replace(/&#x([0-9a-f]+);/gi, (_, n) => String.fromCodePoint(parseInt(n, 16)))
    .replace(/&lt;/g, "<")
    .replace(/&gt;/g, ">")
    .replace(/&quot;/g, '"')
    .replace(/&apos;/g, "'")
    .replace(/&amp;/g, "&");

/**
 * A light summary of a trusted, committed MusicXML file (title, composer, bar count, parts), read
 * with regular expressions. Uploads go through lib/score's sanitizer and reader instead.
 * Bars count the first part's measures, leaving out an implicit pickup bar.
 */
export function summariseMusicXml(xml: string, fallbackTitle: string): Omit<DemoPiece, "fileName" | "musicxml"> {
  const title =
    xml.match(/<work-title>([^<]*)<\/work-title>/)?.[1] ?? xml.match(/<movement-title>([^<]*)<\/movement-title>/)?.[1];
  const composer = xml.match(/<creator[^>]*type="composer"[^>]*>([^<]*)<\/creator>/)?.[1];
  const parts: ScorePartSummary[] = [];
  for (const m of xml.matchAll(/<score-part\s+id="([^"]+)"[^>]*>([\s\S]*?)<\/score-part>/g)) {
    const name = m[2].match(/<part-name[^>]*>([^<]*)<\/part-name>/)?.[1] ?? m[1];
    const partBody = xml.match(new RegExp(`<part\\s+id="${m[1]}"[^>]*>([\\s\\S]*?)</part>`))?.[1] ?? "";
    const staves = Number(partBody.match(/<staves>(\d+)<\/staves>/)?.[1] ?? 1);
    parts.push({ id: m[1], name: unescape(name.trim()), staves });
  }
  const firstPart = xml.match(/<part\s+id="[^"]+"[^>]*>([\s\S]*?)<\/part>/)?.[1] ?? "";
  const measures = [...firstPart.matchAll(/<measure\b([^>]*)>/g)];
  const bars = measures.filter((m) => !/implicit="yes"/.test(m[1])).length;
  return {
    title: unescape((title ?? fallbackTitle).trim()),
    composer: composer ? unescape(composer.trim()) : null,
    bars,
    parts,
  };
}

/** The demo studio's pieces from fixtures/pieces, sorted by file name. */
export function loadDemoPieces(dir = path.resolve(__dirname, "../../fixtures/pieces")): DemoPiece[] {
  if (!fs.existsSync(dir)) return [];
  return fs
    .readdirSync(dir)
    .filter((f) => f.endsWith(".musicxml"))
    .sort()
    .map((fileName) => {
      const musicxml = fs.readFileSync(path.join(dir, fileName), "utf8");
      return { fileName, musicxml, ...summariseMusicXml(musicxml, fileName.replace(/\.musicxml$/, "")) };
    });
}
