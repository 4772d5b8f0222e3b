/**
 * Engraved drill SVGs (OSMD in jsdom, 0.1–0.4 s each) kept by content: the same MusicXML engraved at
 * the same width is engraved once per process. A student copy of a sheet already printed for another
 * student reuses every drill's engraving.
 */
import { renderDrillSvg } from "./render-drill-svg";
import { contentCache } from "./content-cache";

const svgs = contentCache("drill-svg", (i: { musicxml: string; widthPx: number }) => renderDrillSvg(i.musicxml, { widthPx: i.widthPx }), {
  maxEntries: 512,
  maxBytes: 64 * 1024 * 1024,
  weigh: (svg) => svg.length * 2,
});

/** The drill engraved as SVG at `widthPx`, from the cache when the same MusicXML was engraved at that width. */
export function engravedDrillSvg(musicxml: string, widthPx: number): Promise<string> {
  return svgs.get({ musicxml, widthPx });
}

/** Hit and miss counts (tests and benchmarks). */
export const engravingCacheStats = () => svgs.stats();
