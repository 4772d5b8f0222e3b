// Handout inputs built from the demo pieces in fixtures/pieces (composed for Knotwork).
import fs from "node:fs";
import path from "node:path";
import type { HandoutInput } from "@/lib/handout";

const piecesDir = path.resolve(__dirname, "../../fixtures/pieces");

/** The demo piece's MusicXML text. */
export function demoPiece(name: "lantern-waltz" | "pebble-study" | "two-ribbons"): string {
  return fs.readFileSync(path.join(piecesDir, `${name}.musicxml`), "utf8");
}

/**
 * The first `count` bars of a piece as a complete MusicXML document: everything up to the end of
 * the count-th <measure>, then the part and score closed. Bar 1 carries the attributes.
 */
export function firstBars(xml: string, count: number, from = 0): string {
  const starts = [...xml.matchAll(/<measure\b/g)].map((m) => m.index!);
  const partStart = xml.indexOf("<part id=");
  const head = xml.slice(0, xml.indexOf(">", partStart) + 1);
  const bars: string[] = [];
  for (let i = from; i < from + count && i < starts.length; i++) {
    const end = xml.indexOf("</measure>", starts[i]) + "</measure>".length;
    bars.push(xml.slice(starts[i], end));
  }
  // bars after the first need the first bar's attributes to stand alone
  if (from > 0) {
    const attrs = /<attributes>[\s\S]*?<\/attributes>/.exec(xml)![0];
    bars[0] = bars[0].replace(/(<measure\b[^>]*>)/, `$1\n${attrs}`);
  }
  return `${head}\n${bars.join("\n")}\n  </part>\n</score-partwise>\n`;
}

const waltz = demoPiece("lantern-waltz");
const study = demoPiece("pebble-study");
const ribbons = demoPiece("two-ribbons");

/** Eight drills over the three demo pieces, with ♭ and ♯ in their notes and one span warning. */
export function eightDrillSheet(paper: HandoutInput["paper"] = "a4"): HandoutInput {
  return {
    sheetTitle: "Even triplets and quiet thirds",
    pieceTitle: "Pebble Study",
    bars: "bars 1–3, right hand",
    studentName: "Ada Example",
    date: "3 March 2025",
    paper,
    studioName: "Maple Row Studio",
    drills: [
      { title: "Triplet run in slow motion", musicxml: firstBars(study, 1), studentNote: "Play each group of three as one gesture; let the thumb pass under on C without a bump.", tempo: { start: 56, target: 92 } },
      { title: "Triplets grouped by beat", musicxml: firstBars(study, 2, 1), studentNote: "Count 1-trip-let aloud. The F♯ in bar 2 sits high: keep the hand forward on the keys.", tempo: { start: 60, target: 92 } },
      { title: "Climb to B", musicxml: firstBars(study, 1, 2), studentNote: "Stop on every G and check the hand is loose before going on.", tempo: { start: 50, target: 88 } },
      { title: "Blocked cadence chords", musicxml: firstBars(study, 2, 6), studentNote: "Drop into each chord from the wrist; all notes exactly together.", tempo: { start: 60, target: 84 } },
      { title: "Waltz figure, left hand", musicxml: firstBars(waltz, 3), studentNote: "The C keeps returning: make it lighter than the bass note. B♭ takes finger 2.", tempo: { start: 80, target: 120 } },
      { title: "The leap to high C", musicxml: firstBars(waltz, 2, 10), studentNote: "Look at the target before you go; travel close to the keys.", tempo: { start: 72, target: 120 }, spanWarning: "A to high C is a tenth (about 212 mm on a standard keyboard): move the hand, do not stretch." },
      { title: "Thirds, top voice singing", musicxml: firstBars(ribbons, 2), studentNote: "Let the upper note sing, the lower one follows softly. Hold the tie into bar 2 for its full value; C♯ is the leading note.", tempo: { start: 48, target: 66 } },
      { title: "Sixths in slow pairs", musicxml: firstBars(ribbons, 2, 2), studentNote: "Thumb on every lower note; keep the wrist level as the sixths move.", tempo: { start: 48, target: 66 } },
    ],
  };
}
