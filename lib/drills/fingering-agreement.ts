/**
 * Agreement of the estimator with a score's printed fingerings: each printed mark is hidden, the
 * hand's fingering is estimated, and the estimate is compared with the printed finger.
 *
 * Protocols: "hidden" hides every printed mark of the score and estimates each hand once (the
 * estimator sees no printed finger at all — the strict figure); "leave-one-out" hides one marked
 * note at a time and keeps the others as fixed points (how the estimator is used on a fingered
 * score). A note counts as agreeing when the estimate equals its printed finger: the first mark, or
 * for a chord's stacked marks stored on one note, the mark that falls to that key
 * (`chordWrittenFingers`); `agreedAny` also accepts any other mark printed on the note (alternatives,
 * substitutions such as "3-1").
 */
import type { Hand, NoteEvent, Score } from "../score/types";
import { handsOf } from "./difficulty-bars";
import { estimateFingering } from "./fingering";
import { buildSlices } from "./fingering-slices";
import type { FingeringTuning } from "./fingering-tuning";
import type { FingeringModel } from "./fingering-rules";

export type AgreementProtocol = "hidden" | "leave-one-out";

/** One printed finger compared with the estimate. */
export interface AgreementCheck {
  /** Printed bar number. */
  readonly measure: string;
  readonly hand: Hand;
  /** Spelled note, e.g. "F#4". */
  readonly note: string;
  /** The printed finger of this key, then any other marks printed on the note. */
  readonly printed: readonly number[];
  readonly estimated: number | null;
  readonly agreed: boolean;
  readonly agreedAny: boolean;
}

export interface Agreement {
  readonly checks: readonly AgreementCheck[];
  readonly total: number;
  readonly agreed: number;
  readonly agreedAny: number;
}

export interface AgreementOptions {
  readonly protocol?: AgreementProtocol;
  readonly tuning?: FingeringTuning;
  readonly model?: FingeringModel;
}

const spelled = (e: NoteEvent): string => {
  const p = e.pitch!;
  return `${p.step}${p.alter > 0 ? "#".repeat(p.alter) : "b".repeat(-p.alter)}${p.octave}`;
};

const bare = (e: NoteEvent): NoteEvent => (e.fingering ? { ...e, fingering: undefined } : e);

/**
 * Compare the estimator with every printed fingering of a score's keyboard parts.
 *
 * @example
 * const a = fingeringAgreement(score, { protocol: "hidden" });
 * a.agreed / a.total // share of printed fingers the estimator reproduces
 */
export function fingeringAgreement(score: Score, options: AgreementOptions = {}): Agreement {
  const protocol = options.protocol ?? "hidden";
  const keyOf = (m: number) => score.measures[m]?.key;
  const estimate = (events: readonly NoteEvent[], hand: Hand) =>
    estimateFingering(events, hand, { costs: false, keyOf, ...(options.tuning ? { tuning: options.tuning } : {}), ...(options.model ? { model: options.model } : {}) }).fingers;
  const checks: AgreementCheck[] = [];
  for (const hands of handsOf(score).values()) {
    for (const hand of ["right", "left"] as const) {
      const events = hands[hand];
      const { written } = buildSlices(events, hand);
      // Which event carries the mark a key's printed finger comes from (itself, or a chord's stack holder).
      const holder = events.map((e, i) => (written[i] == null || !e.pitch ? -1 : e.fingering?.length ? i : -1));
      events.forEach((e, i) => {
        if (written[i] == null || holder[i]! >= 0) return;
        const k = events.findIndex((x, j) => x.onset.equals(e.onset) && x.fingering?.length && written[j] != null && j !== i);
        holder[i] = k;
      });
      const marked = events.map((_, i) => i).filter((i) => written[i] != null && holder[i]! >= 0);
      if (marked.length === 0) continue;
      let hiddenFingers: (number | null)[] | null = null;
      const looCache = new Map<number, (number | null)[]>();
      for (const i of marked) {
        let fingers: (number | null)[];
        if (protocol === "hidden") fingers = hiddenFingers ??= estimate(events.map(bare), hand);
        else {
          const h = holder[i]!;
          if (!looCache.has(h)) looCache.set(h, estimate(events.map((x, j) => (j === h ? bare(x) : x)), hand));
          fingers = looCache.get(h)!;
        }
        const e = events[i]!;
        const own = written[i]!;
        const others = (e.fingering?.length ?? 0) > 1 && holder[i] === i ? e.fingering!.map((m) => m.finger).filter((f) => f !== own) : [];
        const printed = [own, ...others];
        const estimated = fingers[i] ?? null;
        checks.push({
          measure: score.measures[e.measure]?.number ?? String(e.measure + 1),
          hand, note: spelled(e), printed, estimated,
          agreed: estimated === own,
          agreedAny: estimated !== null && printed.includes(estimated),
        });
      }
    }
  }
  return {
    checks,
    total: checks.length,
    agreed: checks.filter((c) => c.agreed).length,
    agreedAny: checks.filter((c) => c.agreedAny).length,
  };
}
