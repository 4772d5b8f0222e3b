/**
 * The server-side DOM the engraver needs: one jsdom window with two patches jsdom lacks — element
 * width from `style.width`, and a canvas context that can measure text.
 *
 * Its globals (`window`, `document`, …) are installed only while an engraving runs and removed
 * afterwards, so other server code that tests `typeof window` still sees a server.
 */
import { JSDOM } from "jsdom";
import { createMeasureContext } from "./text-metrics";

const GLOBALS = ["window", "document", "DOMParser", "Node", "HTMLElement", "HTMLAnchorElement", "XMLHttpRequest"] as const;

export type DomWindow = JSDOM["window"];

let shared: DomWindow | null = null;

/** The shared, patched jsdom window (created on first use). */
export function domWindow(): DomWindow {
  if (shared) return shared;
  const win = new JSDOM("<!DOCTYPE html><html><head></head><body></body></html>", { pretendToBeVisual: true }).window;
  Object.defineProperty(win.HTMLElement.prototype, "offsetWidth", {
    configurable: true,
    get(this: HTMLElement) {
      return parseFloat(this.style.width) || 0;
    },
  });
  win.HTMLCanvasElement.prototype.getContext = function getContext(kind: string) {
    return kind === "2d" ? createMeasureContext() : null;
  } as unknown as typeof win.HTMLCanvasElement.prototype.getContext;
  shared = win;
  return win;
}

/** Installs the jsdom globals and returns a function that puts the previous values back. */
export function installDomGlobals(): () => void {
  const win = domWindow();
  const g = globalThis as Record<string, unknown>;
  const saved = GLOBALS.map((name) => [name, Object.getOwnPropertyDescriptor(g, name)] as const);
  for (const name of GLOBALS) {
    const value = name === "window" ? win : (win as unknown as Record<string, unknown>)[name];
    Object.defineProperty(g, name, { value, configurable: true, writable: true, enumerable: false });
  }
  return () => {
    for (const [name, desc] of saved) {
      if (desc) Object.defineProperty(g, name, desc);
      else delete g[name];
    }
  };
}
