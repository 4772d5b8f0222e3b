/**
 * How much work one request may ask for: a knot is a few bars (1–16), and one generate request makes
 * a bounded number of drills and notes. Checked on the server (knot marking, generating, previewing,
 * saving a sheet), whatever the browser sends; a request past a limit gets a 422 with a sentence
 * saying what to change. Measured on the 12 real scores of fixtures/reference/scores with every family
 * switched on over 16 bars: at most 38 drills and 2,019 notes, so the limits leave room for options.
 */

/** Most bars in one knot (the knot form offers 1–16). */
export const MAX_KNOT_BARS = 16;
/** Most drills one generate request may make. */
export const MAX_DRILLS_PER_REQUEST = 80;
/** Most notes and rests in all the drills of one request. */
export const MAX_NOTES_PER_REQUEST = 12_000;

/** A request asked for more work than Knotwork does at once; `message` says what to change. */
export class WorkLimitError extends Error {
  readonly status = 422;
  constructor(message: string) {
    super(message);
    this.name = "WorkLimitError";
  }
}

/** The refusal for a knot of `bars` bars, or null when it is within the limit. */
export function knotLengthProblem(bars: number): string | null {
  if (bars <= MAX_KNOT_BARS) return null;
  return `A knot can be at most ${MAX_KNOT_BARS} bars long; this one has ${bars}. Mark a shorter passage (a few bars work best).`;
}

/** Throws WorkLimitError when a knot of `bars` bars is too long to generate drills for. */
export function checkKnotLength(bars: number): void {
  const problem = knotLengthProblem(bars);
  if (problem) throw new WorkLimitError(problem);
}

/** Throws WorkLimitError when generated drills exceed the per-request output limits. */
export function checkGeneratedOutput(drills: readonly { score: { events: readonly unknown[] } }[]): void {
  if (drills.length > MAX_DRILLS_PER_REQUEST) {
    throw new WorkLimitError(`This request makes ${drills.length} drills; the most at once is ${MAX_DRILLS_PER_REQUEST}. Switch off some drill families or options.`);
  }
  const notes = drills.reduce((sum, d) => sum + d.score.events.length, 0);
  if (notes > MAX_NOTES_PER_REQUEST) {
    throw new WorkLimitError(`These drills hold ${notes.toLocaleString("en")} notes; the most at once is ${MAX_NOTES_PER_REQUEST.toLocaleString("en")}. Switch off some drill families or mark fewer bars.`);
  }
}

/** True when `e` is a WorkLimitError. */
export function isWorkLimitError(e: unknown): e is WorkLimitError {
  return e instanceof WorkLimitError;
}
