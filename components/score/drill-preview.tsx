"use client";
/**
 * A small engraving of one drill, full width, without title. It loads only when scrolled near
 * the viewport, and previews render one after another, so a grid of many stays responsive.
 */
import { useEffect, useRef, useState } from "react";
import type { IOSMDOptions } from "opensheetmusicdisplay";
import { useOsmd } from "./use-osmd";

export interface DrillPreviewProps {
  musicxml: string;
  /** Accessible name of the engraving, e.g. the drill's title. */
  label: string;
  zoom?: number;
  className?: string;
}

const PREVIEW_OPTIONS: IOSMDOptions = {
  drawTitle: false,
  drawSubtitle: false,
  drawComposer: false,
  drawLyricist: false,
  drawCredits: false,
  drawPartNames: false,
  drawFingerings: true,
  drawMeasureNumbers: false,
  stretchLastSystemLine: true,
  disableCursor: true,
};

/** Starts loading this far before the preview scrolls into view. */
const ROOT_MARGIN = "300px 0px";
/** A preview must stay near the viewport this long (ms), so layout shifts while a page loads do not wake them all. */
const SETTLE_MS = 250;

export function DrillPreview({ musicxml, label, zoom = 0.75, className = "" }: DrillPreviewProps) {
  const host = useRef<HTMLDivElement>(null);
  const frame = useRef<HTMLDivElement>(null);
  const [visible, setVisible] = useState(false);

  useEffect(() => {
    const el = frame.current;
    if (!el) return;
    if (typeof IntersectionObserver === "undefined") {
      setVisible(true);
      return;
    }
    let timer: ReturnType<typeof setTimeout> | undefined;
    const io = new IntersectionObserver(
      (entries) => {
        clearTimeout(timer);
        if (!entries.some((e) => e.isIntersecting)) return;
        timer = setTimeout(() => {
          setVisible(true);
          io.disconnect();
        }, SETTLE_MS);
      },
      { rootMargin: ROOT_MARGIN },
    );
    io.observe(el);
    return () => {
      clearTimeout(timer);
      io.disconnect();
    };
  }, []);

  const { status, error } = useOsmd(host, frame, {
    musicxml,
    zoom,
    options: PREVIEW_OPTIONS,
    enabled: visible,
    withLayout: false,
  });

  return (
    <div className={`w-full ${className}`}>
      <figure
        ref={frame}
        role="img"
        aria-label={label}
        aria-busy={status !== "ready" && status !== "error"}
        data-status={status}
        data-testid="drill-preview"
        className="relative min-h-32 w-full overflow-hidden rounded border border-line bg-card"
      >
        <div ref={host} className="w-full" />
        {status !== "ready" && status !== "error" && (
          <div className="absolute inset-0 m-3 animate-pulse rounded bg-stone-100" aria-hidden="true" />
        )}
        {status === "error" && (
          <figcaption className="p-3 text-sm text-madder">
            Preview unavailable{error ? `: ${error}` : "."}
          </figcaption>
        )}
      </figure>
    </div>
  );
}
