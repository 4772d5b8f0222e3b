/**
 * Size budgets from the build output: first-load JavaScript of every page that shows no score is at
 * most 150 kB gzip (issue 9), and the engraver (OSMD) and the audio engine (tone) are only in chunks
 * of pages that use them — never in any page's first load.
 */
import { describe, expect, test } from "vitest";
import { chunksWith, gzipBytes, pageBundles } from "./bundle";

const BUDGET_KB = 150;
const pages = pageBundles().filter((p) => !p.url.startsWith("/_"));
const allChunks = [...new Set(pages.flatMap((p) => p.reachable))];

// Strings only the libraries themselves carry: OSMD's graphical model and VexFlow drawer class
// names, tone's base node class (read from their dist files in node_modules).
const OSMD = /GraphicalMusicSheet|VexFlowMusicSheetDrawer/;
const TONE = /ToneAudioNode/;
const osmdChunks = chunksWith(OSMD, allChunks);
const toneChunks = chunksWith(TONE, allChunks);

/** Pages that engrave a score or drills: the piece, knot, sheet and assignment pages, and the score lab. */
const SCORE_PAGE = /\[(pieceId|knotId|sheetId|assignmentId)\]|^\/lab\/score$/;
const kb = (chunks: string[]) => chunks.reduce((s, c) => s + gzipBytes(c), 0) / 1000;

describe("bundle sizes from the build output", () => {
  test("the build has pages, and OSMD and tone were found in its chunks (the check can see them)", () => {
    expect(pages.length).toBeGreaterThan(8);
    expect(osmdChunks.length).toBeGreaterThan(0);
    expect(toneChunks.length).toBeGreaterThan(0);
    // The score lab engraves and plays: it must reach both.
    const lab = pages.find((p) => p.url === "/lab/score");
    expect(lab?.reachable).toEqual(expect.arrayContaining([...osmdChunks.slice(0, 1), ...toneChunks.slice(0, 1)]));
  });

  test.each(pages.map((p) => [p.url, p] as const))("%s: OSMD and tone are never in the first load", (_url, page) => {
    expect(page.firstLoad.filter((c) => osmdChunks.includes(c) || toneChunks.includes(c))).toEqual([]);
  });

  test.each(pages.filter((p) => !SCORE_PAGE.test(p.url)).map((p) => [p.url, p] as const))(
    `%s shows no score: no OSMD or tone chunk reachable, first load ≤ ${BUDGET_KB} kB gzip`,
    (url, page) => {
      expect(page.reachable.filter((c) => osmdChunks.includes(c) || toneChunks.includes(c)), url).toEqual([]);
      const size = kb(page.firstLoad);
      expect(size, `${url}: ${size.toFixed(1)} kB gzip in ${page.firstLoad.length} chunks`).toBeLessThanOrEqual(BUDGET_KB);
    },
  );
});
