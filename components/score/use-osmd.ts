"use client";
/** Mounts OSMD into a host element, renders a MusicXML string, and re-lays out on zoom and resize. */
import { useCallback, useEffect, useRef, useState } from "react";
import type { IOSMDOptions, OpenSheetMusicDisplay } from "opensheetmusicdisplay";
import { enqueueRender, loadOsmd } from "./load-osmd";
import { EMPTY_LAYOUT, readLayout, type ScoreLayout } from "./score-layout";

export type EngraveStatus = "idle" | "loading" | "ready" | "error";

export interface EngraveResult {
  status: EngraveStatus;
  error: string | null;
  layout: ScoreLayout;
  /** Top-left of the rendered SVG inside the frame element, in CSS pixels. */
  offset: { x: number; y: number };
}

interface Options {
  musicxml: string;
  zoom: number;
  options: IOSMDOptions;
  /** When false, nothing loads yet (used for lazy previews). */
  enabled?: boolean;
  /** Read bar boxes after each render (the score view needs them, previews do not). */
  withLayout?: boolean;
}

/** Re-renders at most this often while the window is being resized. */
const RESIZE_DEBOUNCE_MS = 200;

export function useOsmd(
  host: React.RefObject<HTMLDivElement | null>,
  frame: React.RefObject<HTMLDivElement | null>,
  { musicxml, zoom, options, enabled = true, withLayout = true }: Options,
): EngraveResult {
  const osmdRef = useRef<OpenSheetMusicDisplay | null>(null);
  const zoomRef = useRef(zoom);
  const optionsRef = useRef(options);
  const [state, setState] = useState<EngraveResult>({
    status: "idle",
    error: null,
    layout: EMPTY_LAYOUT,
    offset: { x: 0, y: 0 },
  });

  const measure = useCallback(() => {
    const osmd = osmdRef.current;
    const svg = host.current?.querySelector("svg");
    if (!osmd || !svg || !frame.current) return;
    const s = svg.getBoundingClientRect();
    const f = frame.current.getBoundingClientRect();
    setState({
      status: "ready",
      error: null,
      layout: withLayout ? readLayout(osmd) : EMPTY_LAYOUT,
      offset: { x: s.left - f.left, y: s.top - f.top },
    });
  }, [host, frame, withLayout]);

  useEffect(() => {
    const el = host.current;
    if (!enabled || !el) return;
    let cancelled = false;
    setState((s) => ({ ...s, status: "loading", error: null }));
    (async () => {
      const { OpenSheetMusicDisplay } = await loadOsmd();
      if (cancelled) return;
      el.innerHTML = "";
      const osmd = new OpenSheetMusicDisplay(el, { ...optionsRef.current, backend: "svg", autoResize: false });
      await osmd.load(musicxml);
      if (cancelled) return;
      await enqueueRender(() => {
        if (cancelled) return;
        osmd.Zoom = zoomRef.current;
        osmd.render();
      });
      if (cancelled) return;
      osmdRef.current = osmd;
      measure();
    })().catch((err: unknown) => {
      if (cancelled) return;
      setState((s) => ({ ...s, status: "error", error: err instanceof Error ? err.message : String(err) }));
    });
    return () => {
      cancelled = true;
      osmdRef.current?.clear();
      osmdRef.current = null;
    };
  }, [musicxml, enabled, host, measure]);

  useEffect(() => {
    zoomRef.current = zoom;
    const osmd = osmdRef.current;
    if (!osmd || osmd.Zoom === zoom) return;
    osmd.Zoom = zoom;
    osmd.render();
    measure();
  }, [zoom, measure]);

  useEffect(() => {
    const el = frame.current?.parentElement;
    if (!el || typeof ResizeObserver === "undefined") return;
    let width = el.clientWidth;
    let timer: ReturnType<typeof setTimeout> | undefined;
    const ro = new ResizeObserver(() => {
      if (Math.abs(el.clientWidth - width) < 2) return;
      width = el.clientWidth;
      clearTimeout(timer);
      timer = setTimeout(() => {
        const osmd = osmdRef.current;
        if (!osmd) return;
        osmd.render();
        measure();
      }, RESIZE_DEBOUNCE_MS);
    });
    ro.observe(el);
    return () => {
      clearTimeout(timer);
      ro.disconnect();
    };
  }, [frame, measure]);

  return state;
}
