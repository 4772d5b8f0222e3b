// Demo knots for the drill tests, the gallery and the benchmark: bars of the demo pieces.
import fs from "node:fs";
import path from "node:path";
import { readScore, selectPassage } from "../../lib/score";
import type { Hand, Passage } from "../../lib/score/types";

const piecesDir = path.resolve(__dirname, "../../fixtures/pieces");

export interface Knot {
  readonly name: string;
  readonly piece: string;
  readonly hand: Hand | "both";
  readonly from: number;
  readonly to: number;
}

/** Knots on the three demo pieces (0-based bar indexes; the waltz starts with a pickup). */
export const DEMO_KNOTS: readonly Knot[] = [
  { name: "waltz-accompaniment", piece: "lantern-waltz", hand: "left", from: 1, to: 2 },
  { name: "waltz-leap", piece: "lantern-waltz", hand: "both", from: 9, to: 10 },
  { name: "waltz-pickup", piece: "lantern-waltz", hand: "right", from: 0, to: 1 },
  { name: "pebble-triplets", piece: "pebble-study", hand: "both", from: 0, to: 1 },
  { name: "pebble-cadence", piece: "pebble-study", hand: "both", from: 6, to: 7 },
  { name: "ribbons-thirds", piece: "two-ribbons", hand: "right", from: 0, to: 1 },
  { name: "ribbons-both", piece: "two-ribbons", hand: "both", from: 2, to: 3 },
];

/** The passage of a demo knot. */
export function knotPassage(knot: Knot): Passage {
  const xml = fs.readFileSync(path.join(piecesDir, `${knot.piece}.musicxml`), "utf8");
  const { score } = readScore(xml);
  return selectPassage(score, { hand: knot.hand, from: knot.from, to: knot.to });
}
