// Engraving drills on the server (OSMD 2.1.3 in jsdom), checked against the demo pieces.
import { describe, expect, test } from "vitest";
import { renderDrillSvg } from "@/lib/handout";
import { demoPiece, firstBars } from "./sample-sheet";

const study = demoPiece("pebble-study");
const ribbons = demoPiece("two-ribbons");

describe("renderDrillSvg", () => {
  test("returns a standalone SVG of the requested width, cropped to the music", async () => {
    const svg = await renderDrillSvg(firstBars(study, 2), { widthPx: 640 });
    expect(svg.startsWith("<svg")).toBe(true);
    expect(svg).toContain('xmlns="http://www.w3.org/2000/svg"');
    expect(svg).toMatch(/^<svg[^>]*\swidth="640"/);
    const height = Number(/^<svg[^>]*\sheight="([\d.]+)"/.exec(svg)![1]);
    // one grand-staff system: two staves of 40 px plus the space between them and around the marks
    expect(height).toBeGreaterThan(80);
    expect(height).toBeLessThan(400);
  });

  test("draws fingerings but not the title, composer or part name", async () => {
    const svg = await renderDrillSvg(firstBars(study, 1));
    const texts = [...svg.matchAll(/<text[^>]*>([^<]*)<\/text>/g)].map((m) => m[1]);
    // fingerings of bar 1 of the piece: 1 2 3 1 2 3 2 in the right hand, 5 3 1 in the left
    for (const f of ["1", "2", "3", "5"]) expect(texts).toContain(f);
    expect(svg).not.toContain("Pebble Study");
    expect(svg).not.toContain("Knotwork demo");
    expect(svg).not.toContain(">Piano<");
  });

  test("leaves no browser globals behind", async () => {
    await renderDrillSvg(firstBars(ribbons, 1));
    expect(typeof (globalThis as { window?: unknown }).window).toBe("undefined");
    expect(typeof (globalThis as { document?: unknown }).document).toBe("undefined");
  });

  test("renders requests one at a time, each from its own input", async () => {
    const inputs = [firstBars(study, 1), firstBars(ribbons, 2), firstBars(study, 2, 6)];
    const svgs = await Promise.all(inputs.map((x) => renderDrillSvg(x)));
    expect(new Set(svgs).size).toBe(3);
    // one bar of 4/4 holds fewer notes than two bars of thirds
    const heads = (s: string) => (s.match(/class="vf-notehead"/g) ?? []).length;
    expect(heads(svgs[1])).toBeGreaterThan(heads(svgs[0]));
    // the same input engraves the same way again (element ids are counters, so leave them out)
    const noIds = (s: string) => s.replace(/\sid="[^"]*"/g, "");
    const again = await renderDrillSvg(inputs[0]);
    expect(noIds(again) === noIds(svgs[0])).toBe(true);
  });

  test("refuses entity declarations before any parser sees them", async () => {
    const hostile = firstBars(study, 1).replace(
      "<score-partwise",
      '<!DOCTYPE x [<!ENTITY a "aaaaaaaaaa">]><score-partwise',
    );
    await expect(renderDrillSvg(hostile)).rejects.toThrow(/entities/);
  });

  test("a broken file fails that render only", async () => {
    await expect(renderDrillSvg("<score-partwise><part-list/></score-partwise>")).rejects.toThrow();
    const svg = await renderDrillSvg(firstBars(study, 1));
    expect(svg.startsWith("<svg")).toBe(true);
  });
});
