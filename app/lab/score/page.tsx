import { readFile } from "node:fs/promises";
import path from "node:path";
import { notFound } from "next/navigation";
import { playbackEvents } from "@/lib/playback";
import { readScore } from "@/lib/score/read";
import { LabScore, type LabPiece } from "./lab-score";
import { LAB_DRILL_XML } from "./lab-drill";

export const dynamic = "force-dynamic";
export const metadata = { title: "Score lab" };

const PIECES = ["lantern-waltz", "pebble-study", "two-ribbons"] as const;

/** Development playground for the score components; hidden in production unless KNOTWORK_LAB=1. */
export default async function ScoreLabPage({ searchParams }: { searchParams: Promise<{ piece?: string }> }) {
  if (process.env.NODE_ENV === "production" && process.env.KNOTWORK_LAB !== "1") notFound();
  const { piece: asked } = await searchParams;
  const name = PIECES.find((p) => p === asked) ?? PIECES[0];
  const musicxml = await readFile(path.join(process.cwd(), "fixtures", "pieces", `${name}.musicxml`), "utf8");
  const { score } = readScore(musicxml);
  const p = playbackEvents(score);
  const piece: LabPiece = {
    name,
    musicxml,
    bpm: score.measures.find((m) => m.tempo) ? p.initialBpm : 96,
    beatsPerBar: p.beatsPerBar,
    beatUnitQ: p.beatUnitQ,
    barAnchorQ: p.barAnchorQ,
    bars: p.bars,
    events: p.events,
  };
  return (
    <main className="mx-auto flex max-w-6xl flex-col gap-6 p-4">
      <h1 className="text-2xl">Score lab</h1>
      <nav aria-label="Pieces" className="flex gap-3 text-sm">
        {PIECES.map((p) => (
          <a key={p} href={`?piece=${p}`} aria-current={p === name ? "page" : undefined} className="underline">
            {p}
          </a>
        ))}
      </nav>
      <LabScore piece={piece} drillXml={LAB_DRILL_XML} />
    </main>
  );
}
