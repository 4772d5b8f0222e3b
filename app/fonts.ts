import localFont from "next/font/local";

/** Text face: Atkinson Hyperlegible Next (OFL), chosen for legibility at a music stand. */
export const textFont = localFont({
  variable: "--font-text",
  display: "swap",
  src: [
    { path: "../public/fonts/atkinson-hyperlegible-next-latin-400-normal.woff2", weight: "400", style: "normal" },
    { path: "../public/fonts/atkinson-hyperlegible-next-latin-400-italic.woff2", weight: "400", style: "italic" },
    { path: "../public/fonts/atkinson-hyperlegible-next-latin-700-normal.woff2", weight: "700", style: "normal" },
  ],
});

/** Figures face: IBM Plex Mono (OFL), for bar numbers, tempos and spans. */
export const figuresFont = localFont({
  variable: "--font-figures",
  display: "swap",
  src: [
    { path: "../public/fonts/ibm-plex-mono-latin-400-normal.woff2", weight: "400", style: "normal" },
    { path: "../public/fonts/ibm-plex-mono-latin-500-normal.woff2", weight: "500", style: "normal" },
  ],
});

/** Display face: Fraunces (OFL), for headings only. */
export const headingFont = localFont({
  variable: "--font-heading",
  display: "swap",
  src: [
    { path: "../public/fonts/fraunces-latin-500-normal.woff2", weight: "500", style: "normal" },
    { path: "../public/fonts/fraunces-latin-600-normal.woff2", weight: "600", style: "normal" },
  ],
});
