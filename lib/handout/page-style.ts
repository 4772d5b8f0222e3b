/** Type sizes, spacing and colours of a printed handout, in PDF points. */
export const STYLE = {
  margin: { left: 54, right: 54, top: 46, bottom: 64 },
  ink: "#1d2126",
  muted: "#5b6570",
  faint: "#9aa3ad",
  accent: "#2d6a64",
  warnFill: "#fbf1de",
  warnStroke: "#d9a441",
  size: {
    studio: 8.5,
    title: 21,
    subtitle: 12,
    meta: 10,
    drillTitle: 12.5,
    tempo: 10.5,
    note: 10,
    warning: 9.5,
    footer: 8,
    running: 8.5,
  },
  /** Indent of the drill text under its number badge. */
  indent: 26,
  badge: 9.5,
  gapBetweenDrills: 22,
  /** The blank line for a student's name on a copy printed without one. */
  blankNameWidth: 150,
  /** Space the running header takes on pages after the first. */
  runningHeader: 26,
} as const;
