/** TanStack Query key factories, one per domain, so a mutation can invalidate exactly what it changed. */
export const drillKeys = {
  all: ["drills"] as const,
  knot: (knotId: string) => [...drillKeys.all, "knot", knotId] as const,
  /** Previews of a knot for one request (families, options, hand profile). */
  preview: (knotId: string, request: unknown) => [...drillKeys.knot(knotId), "preview", request] as const,
};

export const sheetKeys = {
  all: ["sheets"] as const,
  list: () => [...sheetKeys.all, "list"] as const,
  detail: (sheetId: string) => [...sheetKeys.all, "detail", sheetId] as const,
};
