// Property tests of the hand-position and fingering rules of the teacher's rubric (DRILL-RUBRIC.md,
// "Fingered so it can be played" and "Within the hand"; common practice of piano teaching), over
// passage windows of the vendored real-score corpus (fixtures/reference/scores) and the demo pieces
// (fixtures/pieces). Every file is covered; two-bar windows of each hand are sampled by a fixed stride
// so the run stays short on a shared machine: the position families on every third window, every
// family on every twelfth.
import fs from "node:fs";
import path from "node:path";
import { describe, expect, test } from "vitest";
import { readScore, selectPassage } from "../../lib/score";
import type { Hand, NoteEvent, Passage, Score } from "../../lib/score/types";
import { generateDrills } from "../../lib/drills";
import type { Drill } from "../../lib/drills/types";

const root = path.resolve(__dirname, "../..");
const corpusDir = path.join(root, "fixtures/reference/scores");
const piecesDir = path.join(root, "fixtures/pieces");

/** The families that work per hand position or carry fingering across held notes. */
const POSITION_FAMILIES = ["blocking", "note-pairs", "pivot-walk", "doubles", "held-tone", "voice-isolation", "chaining", "octave-doubling", "ornaments"];

interface Window { readonly name: string; readonly passage: Passage; readonly all: boolean }

function windowsOf(file: string, score: Score, stride: number, offset: number): Window[] {
  const piano = score.parts.find((p) => p.staves >= 2) ?? score.parts[0]!;
  const out: Window[] = [];
  for (let b = offset % stride; b + 1 < score.measures.length; b += stride) {
    for (const hand of ["right", "left"] as const) {
      out.push({
        name: `${path.basename(file)} bars ${b + 1}-${b + 2} ${hand}`,
        passage: selectPassage(score, { part: piano.id, hand, from: b, to: b + 1 }),
        all: (b - (offset % stride)) % (stride * 4) === 0,
      });
    }
  }
  return out;
}

const corpusFiles = fs.readdirSync(corpusDir).filter((f) => f.endsWith(".mxl")).sort();
const pieceFiles = fs.readdirSync(piecesDir).filter((f) => f.endsWith(".musicxml")).sort();
const windows: Window[] = [
  ...corpusFiles.flatMap((f, i) => windowsOf(f, readScore(new Uint8Array(fs.readFileSync(path.join(corpusDir, f)))).score, 3, i)),
  ...pieceFiles.flatMap((f) => windowsOf(f, readScore(fs.readFileSync(path.join(piecesDir, f), "utf8")).score, 1, 0)),
];

interface Run { readonly name: string; readonly passage: Passage; readonly drill: Drill }
const runs: Run[] = windows.flatMap((w) => {
  const families = w.all ? undefined : POSITION_FAMILIES;
  return generateDrills(w.passage, { families, seed: 1 }).drills.map((drill) => ({ name: `${w.name} ${drill.family}/${drill.variant}`, passage: w.passage, drill }));
});

const finger = (e: NoteEvent) => e.fingering?.[0]?.finger ?? null;
const handOf = (d: Drill, staff: number): Hand => (d.hands === "both" ? (staff === 1 ? "right" : "left") : d.hands);
const fixed = (d: Drill, e: NoteEvent) => d.fingeringSource[e.id] === "score" || d.fingeringSource[e.id] === "drill";

/** Chords of a drill: struck notes (not grace) sharing staff, voice and onset. */
function chordsOf(d: Drill): NoteEvent[][] {
  const by = new Map<string, NoteEvent[]>();
  for (const e of d.score.events) {
    if (!e.pitch || e.grace) continue;
    const k = `${e.staff}|${e.voice}|${e.onset.toFraction()}`;
    (by.get(k) ?? by.set(k, []).get(k)!).push(e);
  }
  return [...by.values()];
}

/** The passage's own widest one-hand chord (semitones) and largest chord size. */
function passageChords(p: Passage): { span: number; size: number } {
  let span = 0;
  let size = 0;
  for (const h of ["right", "left"] as const) for (const s of p.sonorities[h]) {
    const m = s.notes.map((n) => n.pitch!.midi);
    span = Math.max(span, Math.max(...m) - Math.min(...m));
    size = Math.max(size, new Set(m).size);
  }
  return { span, size };
}

/**
 * True when the fingers printed in the score (or prescribed by the drill) on a chord's keys, low to
 * high, leave no ordered choice for the rest: the printed marks themselves cross, so the drill keeps
 * them as printed (rubric: "printed fingerings of the score are kept").
 */
function printedConflict(d: Drill, keys: readonly NoteEvent[], right: boolean): boolean {
  const k = keys.length;
  let last = 0;
  return keys.some((e, i) => {
    if (!fixed(d, e)) return false;
    const f = right ? finger(e)! : 6 - finger(e)!;
    const bad = f < i + 1 || f > 5 - (k - 1 - i) || f <= last;
    last = f;
    return bad;
  });
}

function report(bad: string[]): string {
  return `${bad.length} faults, e.g.\n${bad.slice(0, 8).join("\n")}`;
}

describe("hand positions and fingering on real scores (DRILL-RUBRIC.md)", () => {
  test("the sample covers every corpus file and demo piece, and the position families write drills", () => {
    const named = new Set(windows.map((w) => w.name.split(" bars")[0]));
    expect(named.size).toBe(corpusFiles.length + pieceFiles.length);
    const families = new Set(runs.map((r) => r.drill.family));
    for (const f of ["blocking", "note-pairs", "voice-isolation", "doubles"]) expect(families).toContain(f);
  });

  // Rubric: "fingers in a chord ascend with pitch in the right hand and descend in the left" (common practice).
  test("chord fingers are ordered with pitch per hand", () => {
    const bad: string[] = [];
    for (const r of runs) for (const c of chordsOf(r.drill)) {
      const keys = [...new Map(c.map((e) => [e.pitch!.midi, e])).values()].sort((a, b) => a.pitch!.midi - b.pitch!.midi);
      const right = handOf(r.drill, c[0]!.staff) === "right";
      if (keys.length < 2 || keys.some((e) => finger(e) == null) || printedConflict(r.drill, keys, right)) continue;
      const f = keys.map((e) => finger(e)!);
      if (!f.every((x, i) => i === 0 || (right ? x > f[i - 1]! : x < f[i - 1]!))) bad.push(`${r.name}: ${right ? "right" : "left"} ${f.join("-")}`);
    }
    expect(bad, report(bad)).toEqual([]);
  });

  // Rubric: "no finger used on two different keys in a row inside a legato group" (common practice):
  // single notes 1-4 semitones apart in one line with no rest between.
  test("no finger plays two different nearby keys in a row", () => {
    const bad: string[] = [];
    for (const r of runs) {
      const lines = new Map<string, NoteEvent[]>();
      for (const e of r.drill.score.events) if (!e.grace) (lines.get(`${e.staff}|${e.voice}`) ?? lines.set(`${e.staff}|${e.voice}`, []).get(`${e.staff}|${e.voice}`)!).push(e);
      for (const line of lines.values()) {
        const heads = line.filter((e, i) => !e.chord && !line[i + 1]?.chord);
        const singles = line.filter((e) => !e.chord).map((e) => (heads.includes(e) ? e : null));
        for (let i = 0; i + 1 < singles.length; i++) {
          const [a, b] = [singles[i], singles[i + 1]];
          if (!a?.pitch || !b?.pitch || b.tie === "stop" || b.tie === "continue") continue;
          const d = Math.abs(a.pitch.midi - b.pitch.midi);
          if (d >= 1 && d <= 4 && finger(a) != null && finger(a) === finger(b) && !(fixed(r.drill, a) && fixed(r.drill, b))) {
            bad.push(`${r.name}: finger ${finger(a)} on ${a.pitch.midi} then ${b.pitch.midi}`);
          }
        }
      }
    }
    expect(bad, report(bad)).toEqual([]);
  });

  // Rubric: "Within the hand" — one-hand chords no wider than a major 10th (16 semitones) and no more
  // than five notes, unless the passage itself has such chords (common practice).
  test("one-hand chords stay within the profile unless the passage has them", () => {
    const bad: string[] = [];
    for (const r of runs) {
      const own = passageChords(r.passage);
      for (const c of chordsOf(r.drill)) {
        const m = c.map((e) => e.pitch!.midi);
        const span = Math.max(...m) - Math.min(...m);
        if (span > Math.max(16, own.span) || new Set(m).size > Math.max(5, own.size)) bad.push(`${r.name}: ${c.length} notes over ${span}`);
      }
      // A blocked position is one hand position: never wider than the comfortable span unless the passage's chord is.
      if (r.drill.family === "blocking" && r.drill.maxSpan.right?.overComfortable && own.span < (r.drill.maxSpan.right?.semitones ?? 0)) bad.push(`${r.name}: blocked wider than the hand`);
      if (r.drill.family === "blocking" && r.drill.maxSpan.left?.overComfortable && own.span < (r.drill.maxSpan.left?.semitones ?? 0)) bad.push(`${r.name}: blocked wider than the hand`);
    }
    expect(bad, report(bad)).toEqual([]);
  });

  // Rubric: a chord has one finger per key ("no crossed fingers inside one chord"; a unison is one key).
  test("no finger is used twice in one chord", () => {
    const bad: string[] = [];
    for (const r of runs) for (const c of chordsOf(r.drill)) {
      const keys = [...new Map(c.map((e) => [e.pitch!.midi, e])).values()].sort((a, b) => a.pitch!.midi - b.pitch!.midi);
      const f = keys.map(finger).filter((x): x is number => x != null);
      if (new Set(f).size < f.length && !printedConflict(r.drill, keys, handOf(r.drill, c[0]!.staff) === "right")) bad.push(`${r.name}: ${f.join(",")}`);
    }
    expect(bad, report(bad)).toEqual([]);
  });

  // Rubric: "a unison is not two notes with one finger" (issue #17; common practice): one key, one note.
  test("no chord writes the same key twice", () => {
    const bad: string[] = [];
    for (const r of runs) for (const c of chordsOf(r.drill)) {
      const keys = c.map((e) => e.pitch!.midi);
      if (new Set(keys).size < keys.length) bad.push(`${r.name}: ${keys.join(",")}`);
    }
    expect(bad, report(bad)).toEqual([]);
  });

  // Rubric: held notes keep their finger, and a held note and a moving note never share a finger;
  // the left-hand thumb never below a key the hand holds (common practice).
  test("held notes keep their finger and no struck note borrows it", () => {
    const bad: string[] = [];
    for (const r of runs) {
      const events = r.drill.score.events.filter((e) => e.pitch && !e.grace);
      const hands = new Map<Hand, NoteEvent[]>();
      for (const e of events) {
        const h = r.drill.hands === "both" ? handOf(r.drill, e.staff) : r.drill.hands;
        (hands.get(h) ?? hands.set(h, []).get(h)!).push(e);
      }
      for (const [hand, list] of hands) {
        // Struck notes with their end after merging ties.
        const struck: { e: NoteEvent; end: number }[] = [];
        for (const e of list) {
          if (e.tie === "stop" || e.tie === "continue") {
            const from = [...struck].reverse().find((s) => s.e.pitch!.midi === e.pitch!.midi && s.e.staff === e.staff && s.e.voice === e.voice);
            if (from) {
              from.end = Math.max(from.end, e.onset.add(e.duration).valueOf());
              if (finger(e) != null && finger(e) !== finger(from.e)) bad.push(`${r.name}: tied note changes finger`);
            }
            continue;
          }
          struck.push({ e, end: e.onset.add(e.duration).valueOf() });
        }
        for (const s of struck) {
          const t = s.e.onset.valueOf();
          const f = finger(s.e);
          if (f == null) continue;
          for (const h of struck) {
            if (h.e.onset.valueOf() >= t || h.end <= t + 1e-9 || h.e.pitch!.midi === s.e.pitch!.midi || finger(h.e) == null) continue;
            if (fixed(r.drill, h.e) && fixed(r.drill, s.e)) continue;
            const hf = finger(h.e)!;
            const below = s.e.pitch!.midi < h.e.pitch!.midi;
            const ordered = hand === "right" ? (below ? f < hf : f > hf) : below ? f > hf : f < hf;
            if (!ordered) bad.push(`${r.name}: ${hand} finger ${f} on ${s.e.pitch!.midi} while ${hf} holds ${h.e.pitch!.midi}`);
          }
        }
      }
    }
    expect(bad, report(bad)).toEqual([]);
  });
});
