/**
 * Written drills for the rubric tests that judge the MusicXML text: every STRIDE-th two-bar window of
 * each real score (fixtures/reference/scores, both hands) and every window of the demo pieces
 * (fixtures/pieces, both hands and both together), each drill written with writeMusicXML, plus a small
 * reader of the written text (fast-xml-parser, independent of the writer's own code).
 */
import fs from "node:fs";
import path from "node:path";
import { XMLParser } from "fast-xml-parser";
import { generateDrills } from "../../lib/drills";
import { pianoPart, readScore, selectPassage, writeMusicXML } from "../../lib/score";
import type { Hand, Score } from "../../lib/score/types";

const root = path.resolve(__dirname, "../..");
const corpusDir = path.join(root, "fixtures/reference/scores");
const piecesDir = path.join(root, "fixtures/pieces");
/** Every STRIDE-th two-bar window of a corpus file (the demo pieces: every window). */
const STRIDE = 8;

export type Node = Record<string, unknown>;
export const parser = new XMLParser({ preserveOrder: true, ignoreAttributes: false, attributeNamePrefix: "@_", parseTagValue: false, processEntities: false });
export const tag = (n: Node) => Object.keys(n).find((k) => k !== ":@") ?? "";
export const kids = (n: Node | undefined): Node[] => (n ? ((n[tag(n)] as Node[]) ?? []) : []);
export const child = (n: Node | undefined, name: string) => kids(n).find((c) => tag(c) === name);
export const text = (n: Node | undefined): string | undefined => {
  const t = kids(n).find((c) => "#text" in c);
  return t ? String(t["#text"]) : undefined;
};

export interface Written {
  readonly where: string;
  readonly xml: string;
}

function drillsOf(score: Score, name: string, hands: readonly (Hand | "both")[], stride: number): Written[] {
  const part = pianoPart(score) ?? score.parts[0];
  const out: Written[] = [];
  for (let b = 0; b + 1 < score.measures.length; b += stride) {
    for (const hand of hands) {
      const passage = selectPassage(score, { part: part.id, hand, from: b, to: b + 1 });
      for (const d of generateDrills(passage, { seed: 1 }).drills) {
        out.push({ where: `${name} bars ${b + 1}-${b + 2} ${hand} ${d.family}/${d.variant}`, xml: writeMusicXML(d.score) });
      }
    }
  }
  return out;
}

export const corpusFiles = fs.readdirSync(corpusDir).filter((f) => f.endsWith(".mxl")).sort();
export const pieceFiles = fs.readdirSync(piecesDir).filter((f) => f.endsWith(".musicxml")).sort();


let cache: Written[] | undefined;

/** The sampled drills of the corpus and the demo pieces, written once per test file. */
export function writtenDrills(): Written[] {
  cache ??= [
    ...corpusFiles.flatMap((f) => drillsOf(readScore(new Uint8Array(fs.readFileSync(path.join(corpusDir, f)))).score, f.split("_")[0]!, ["right", "left"], STRIDE)),
    ...pieceFiles.flatMap((f) => drillsOf(readScore(fs.readFileSync(path.join(piecesDir, f), "utf8")).score, f, ["right", "left", "both"], 1)),
  ];
  return cache;
}
