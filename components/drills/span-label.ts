type Span = { semitones: number; mm: number };

/**
 * The span badge's parts, one per hand that plays at all. A hand whose widest reach is 0 semitones
 * never holds two notes at once or within one hand position: it reads "single notes". Returns [] when
 * no hand stretches at all, so the badge is left out.
 */
export function spanParts(maxSpan: { right?: Span; left?: Span } | undefined): string[] {
  const hands = (["right", "left"] as const).flatMap((h) => {
    const s = maxSpan?.[h];
    return s ? [{ hand: h === "right" ? "RH" : "LH", s }] : [];
  });
  if (!hands.some(({ s }) => s.semitones > 0)) return [];
  return hands.map(({ hand, s }) => (s.semitones > 0 ? `${hand} ${s.semitones} st · ${Math.round(s.mm)} mm` : `${hand} single notes`));
}
