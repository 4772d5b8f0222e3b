/**
 * Engraves one drill's MusicXML to SVG on the server: the engraver (OSMD) in a jsdom window,
 * loaded once per process, renders one drill at a time.
 */
import type { OpenSheetMusicDisplay } from "opensheetmusicdisplay";
import { domWindow, installDomGlobals } from "./dom-env";
import { serial } from "./serial";

export interface DrillSvgOptions {
  /** Width of the engraving in CSS px (OSMD units); the PDF scales it to the column. Default 800. */
  widthPx?: number;
}

export const DEFAULT_DRILL_WIDTH_PX = 800;

interface Engine {
  osmd: OpenSheetMusicDisplay;
  container: HTMLDivElement;
}

let engine: Promise<Engine> | null = null;

async function createEngine(): Promise<Engine> {
  const restore = installDomGlobals();
  try {
    const mod = (await import("opensheetmusicdisplay")) as unknown as {
      OpenSheetMusicDisplay?: typeof OpenSheetMusicDisplay;
      default?: { OpenSheetMusicDisplay: typeof OpenSheetMusicDisplay };
    };
    const Osmd = mod.OpenSheetMusicDisplay ?? mod.default?.OpenSheetMusicDisplay;
    if (!Osmd) throw new Error("The engraver module has no OpenSheetMusicDisplay export");
    const doc = domWindow().document;
    const container = doc.createElement("div");
    container.style.width = `${DEFAULT_DRILL_WIDTH_PX}px`;
    doc.body.appendChild(container);
    const osmd = new Osmd(container as unknown as HTMLElement, {
      autoResize: false,
      backend: "svg",
      pageFormat: "Endless",
      drawTitle: false,
      drawSubtitle: false,
      drawComposer: false,
      drawLyricist: false,
      drawCredits: false,
      drawPartNames: false,
      drawPartAbbreviations: false,
      drawMeasureNumbers: false,
      drawMetronomeMarks: false,
      drawFingerings: true,
    });
    return { osmd, container: container as unknown as HTMLDivElement };
  } finally {
    restore();
  }
}

function getEngine(): Promise<Engine> {
  engine ??= createEngine().catch((e: unknown) => {
    engine = null;
    throw e;
  });
  return engine;
}

/** Refuses DOCTYPE internal subsets and entity declarations: jsdom would expand them without limit. */
function assertNoEntities(xml: string): void {
  if (/<!ENTITY/i.test(xml) || /<!DOCTYPE[^>]*\[/i.test(xml)) {
    throw new Error("Drill MusicXML must not declare entities or an internal DOCTYPE subset");
  }
}

/** OSMD's unit: 10 px at zoom 1. */
const UNIT_PX = 10;
const CROP_PAD_PX = 6;

/** Trims the empty page margin above and below the music, from the engraver's own bounding boxes. */
function cropToContent(svg: SVGSVGElement, osmd: OpenSheetMusicDisplay): void {
  const page = osmd.GraphicSheet?.MusicPages?.[0]?.PositionAndShape;
  const width = parseFloat(svg.getAttribute("width") ?? "");
  const height = parseFloat(svg.getAttribute("height") ?? "");
  if (!page || !(width > 0) || !(height > 0)) return;
  const scale = UNIT_PX * osmd.Zoom;
  const top = Math.max(0, page.AbsolutePosition.y + page.BorderMarginTop) * scale - CROP_PAD_PX;
  const bottom = (page.AbsolutePosition.y + page.BorderMarginBottom) * scale + CROP_PAD_PX;
  const y0 = Math.max(0, top);
  const y1 = Math.min(height, bottom);
  if (!(y1 - y0 > 10)) return;
  const h = +(y1 - y0).toFixed(2);
  svg.setAttribute("viewBox", `0 ${+y0.toFixed(2)} ${width} ${h}`);
  svg.setAttribute("height", String(h));
}

/**
 * Engraves a drill (MusicXML text, already cleaned) to a standalone SVG string, without title,
 * credits or part names (the handout prints those as text), with fingerings and the last system
 * stretched to full width.
 * @example
 *   const svg = await renderDrillSvg(drill.musicxml, { widthPx: 800 });
 *   // svg starts with "<svg" and carries width, height and viewBox in px
 */
export async function renderDrillSvg(musicxml: string, opts: DrillSvgOptions = {}): Promise<string> {
  assertNoEntities(musicxml);
  const widthPx = Math.round(opts.widthPx ?? DEFAULT_DRILL_WIDTH_PX);
  if (!(widthPx >= 200 && widthPx <= 4000)) throw new RangeError(`widthPx must be 200–4000, got ${opts.widthPx}`);
  return serial(async () => {
    const { osmd, container } = await getEngine();
    const restore = installDomGlobals();
    try {
      container.style.width = `${widthPx}px`;
      await osmd.load(musicxml);
      osmd.EngravingRules.StretchLastSystemLine = true;
      osmd.render();
      const svg = container.querySelector("svg");
      if (!svg) throw new Error("The engraver produced no SVG");
      svg.setAttribute("xmlns", "http://www.w3.org/2000/svg");
      cropToContent(svg, osmd);
      return svg.outerHTML;
    } finally {
      try {
        osmd.clear();
      } finally {
        restore();
      }
    }
  });
}
