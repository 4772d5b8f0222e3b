import { readFile } from "node:fs/promises";
import path from "node:path";
import { notFound } from "next/navigation";
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
  const first = score.measures[0];
  const bar1 = score.measures.find((m) => !m.implicit) ?? first;
  const piece: LabPiece = {
    name,
    musicxml,
    bpm: score.measures.find((m) => m.tempo)?.tempo ?? 96,
    beatsPerBar: first.time.beats,
    beatUnitQ: 4 / first.time.beatType,
    barAnchorQ: bar1.start.valueOf(),
    bars: score.measures.map((m) => ({ number: Number.isFinite(Number(m.number)) ? Number(m.number) : m.index + 1, startQ: m.start.valueOf() })),
    events: score.events
      .filter((e) => e.pitch && !e.grace && e.tie !== "stop" && e.tie !== "continue")
      .map((e) => ({ midi: e.pitch!.midi, onsetQ: e.onset.valueOf(), durationQ: e.duration.valueOf(), velocity: 0.7 })),
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
