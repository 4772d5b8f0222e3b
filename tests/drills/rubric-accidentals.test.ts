// Accidentals as written: every drill written from two-bar windows of the real-score corpus
// (fixtures/reference/scores, every 8th window, both hands) and from the demo pieces (fixtures/pieces,
// every window, both hands and both together) is parsed back from its MusicXML text with
// fast-xml-parser, independent of the writer's own code, and every altered note must carry an
// <accidental> where the key signature and the bar's earlier notes on the same staff and octave need one.
// Sources: DRILL-RUBRIC.md §3 "Spelled as a musician spells" (common practice: an accidental holds to
// the end of the bar, for that staff and octave only; the key signature holds otherwise) and the
// MusicXML 4.0 <accidental> element documentation ("the <accidental> element is used for actual
// notated accidentals"; <alter> alone sounds the pitch and prints nothing).
import { describe, expect, test } from "vitest";
import { child, corpusFiles, kids, type Node, parser, pieceFiles, tag, text, writtenDrills } from "./written-drills";

/** Key-signature alteration of a step: sharps in the order F C G D A E B, flats the reverse (common practice). */
const STEP_FIFTHS = ["F", "C", "G", "D", "A", "E", "B"];
function keyAlter(fifths: number, step: string): number {
  const i = STEP_FIFTHS.indexOf(step);
  if (fifths > 0) return i < fifths ? 1 : 0;
  if (fifths < 0) return 6 - i < -fifths ? -1 : 0;
  return 0;
}

/** Notes whose sounding alteration differs from what the reader would assume, yet carry no <accidental>. */
function missingAccidentals(xml: string): string[] {
  const doc = parser.parse(xml) as Node[];
  const score = doc.find((n) => tag(n) === "score-partwise");
  const faults: string[] = [];
  for (const part of kids(score).filter((c) => tag(c) === "part")) {
    const fifths = new Map<number, number>(); // staff -> fifths (0 = all staves)
    for (const m of kids(part).filter((c) => tag(c) === "measure")) {
      const bar = String((m[":@"] as Record<string, string> | undefined)?.["@_number"]);
      // The bar's pitched notes in time order (voices are written one after another, <backup> between).
      const notes: { at: number; order: number; staff: number; fifths: number; el: Node }[] = [];
      let pos = 0;
      let last = 0;
      for (const el of kids(m)) {
        const t = tag(el);
        if (t === "attributes") {
          for (const k of kids(el).filter((c) => tag(c) === "key")) {
            const number = Number((k[":@"] as Record<string, string> | undefined)?.["@_number"] ?? 0);
            if (number === 0) fifths.clear();
            fifths.set(number, Number(text(child(k, "fifths")) ?? 0));
          }
        } else if (t === "backup") pos -= Number(text(child(el, "duration")));
        else if (t === "forward") pos += Number(text(child(el, "duration")));
        else if (t === "note") {
          const chord = !!child(el, "chord");
          const at = chord ? last : pos;
          const staff = Number(text(child(el, "staff")) ?? 1);
          if (child(el, "pitch")) notes.push({ at, order: notes.length, staff, fifths: fifths.get(staff) ?? fifths.get(0) ?? 0, el });
          if (!chord && !child(el, "grace")) {
            last = pos;
            pos += Number(text(child(el, "duration")) ?? 0);
          }
        }
      }
      notes.sort((a, b) => a.at - b.at || a.order - b.order);
      const shown = new Map<string, number>(); // "staff|step|octave" -> alteration in force in this bar
      for (const { staff, fifths: keyFifths, el } of notes) {
        const p = child(el, "pitch")!;
        const step = text(child(p, "step")) ?? "C";
        const octave = Number(text(child(p, "octave")));
        const alter = Math.round(Number(text(child(p, "alter")) ?? 0));
        const key = `${staff}|${step}|${octave}`;
        // A note tied over from the one before sounds its alteration without a new sign, and the sign it
        // carries does not hold for later notes of the bar (common practice; from memory: Gould, Behind Bars).
        const tiedOver = kids(el).some((c) => tag(c) === "tie" && (c[":@"] as Record<string, string> | undefined)?.["@_type"] === "stop");
        if (tiedOver) continue;
        const expected = shown.has(key) ? shown.get(key)! : keyAlter(keyFifths, step);
        if (alter !== expected && !child(el, "accidental")) faults.push(`bar ${bar} staff ${staff} ${step}${alter > 0 ? "#".repeat(alter) : "b".repeat(-alter)}${octave}`);
        shown.set(key, alter);
      }
    }
  }
  return faults;
}

describe("written drills carry the accidentals the key and the bar require (DRILL-RUBRIC §3, MusicXML 4.0 <accidental>)", () => {
  test("the judge itself: it flags a bare altered note and accepts a written one or one the bar already holds", () => {
    const bar = (notes: string) =>
      `<score-partwise version="4.0"><part id="P1"><measure number="1"><attributes><key><fifths>1</fifths></key></attributes>${notes}</measure></part></score-partwise>`;
    const note = (step: string, alter: number, acc = "") =>
      `<note><pitch><step>${step}</step>${alter ? `<alter>${alter}</alter>` : ""}<octave>4</octave></pitch><duration>1</duration>${acc}</note>`;
    // G major: F is sharp by the key; a bare F natural needs a natural sign, a bare F sharp needs nothing.
    expect(missingAccidentals(bar(note("F", 1)))).toEqual([]);
    expect(missingAccidentals(bar(note("F", 0)))).toHaveLength(1);
    expect(missingAccidentals(bar(note("F", 0, "<accidental>natural</accidental>") + note("F", 0)))).toEqual([]);
    expect(missingAccidentals(bar(note("C", 1, "<accidental>sharp</accidental>") + note("C", 0)))).toHaveLength(1);
  });

  const written = writtenDrills();

  test("the sample covers every corpus file and demo piece", () => {
    expect(new Set(written.map((w) => w.where.split(" ")[0])).size).toBe(corpusFiles.length + pieceFiles.length);
  });

  test("no altered note of any written drill lacks its <accidental>", () => {
    const faults = written.flatMap((w) => missingAccidentals(w.xml).map((f) => `${w.where}: ${f}`));
    expect(faults.slice(0, 20), `${faults.length} notes without their accidental`).toEqual([]);
  });
});
