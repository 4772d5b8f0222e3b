"use client";
import dynamic from "next/dynamic";
import type { PlaybackData } from "@/lib/knots/dto";

const Player = dynamic(() => import("@/components/score/player").then((m) => m.Player), {
  ssr: false,
  loading: () => <div className="h-12 animate-pulse rounded-md bg-stone-100" aria-hidden="true" />,
});

/** Playback of one drill at its start tempo, loaded only where a drill is shown. */
export function DrillPlayer({ playback, bpm, title }: { playback: PlaybackData; bpm: number; title: string }) {
  return (
    <Player
      events={playback.events}
      beatsPerBar={playback.beatsPerBar}
      beatUnitQ={playback.beatUnitQ}
      initialBpm={bpm}
      label={`Play ${title}`}
    />
  );
}
