/** Reads the outer size of an SVG string (its root `width`/`height`, else its `viewBox`), in px. */
export function svgSize(svg: string): { width: number; height: number } {
  const open = /<svg\b[^>]*>/i.exec(svg)?.[0];
  if (!open) throw new Error("Not an SVG document");
  const attr = (name: string) => {
    const m = new RegExp(`\\s${name}="([\\d.]+)(px)?"`).exec(open);
    return m ? parseFloat(m[1]) : NaN;
  };
  let width = attr("width");
  let height = attr("height");
  if (!(width > 0 && height > 0)) {
    const vb = /viewBox="\s*[-\d.]+[\s,]+[-\d.]+[\s,]+([\d.]+)[\s,]+([\d.]+)\s*"/.exec(open);
    if (!vb) throw new Error("SVG has no size");
    width = parseFloat(vb[1]);
    height = parseFloat(vb[2]);
  }
  return { width, height };
}
