"use client";
/** The player's buttons and tempo slider: large touch targets, each with an accessible name. */
import { useId } from "react";

interface Props {
  state: "stopped" | "loading" | "playing" | "paused";
  bpm: number;
  minBpm: number;
  maxBpm: number;
  loop: boolean;
  metronome: boolean;
  readout: string;
  onPlayPause(): void;
  onStop(): void;
  onBpm(bpm: number): void;
  onLoop(on: boolean): void;
  onMetronome(on: boolean): void;
}

const BTN =
  "inline-flex min-h-11 min-w-11 items-center justify-center gap-1 rounded-md border px-3 text-sm font-medium focus-visible:outline-3 focus-visible:outline-offset-2 focus-visible:outline-rosin disabled:opacity-40";
const TOGGLE_ON = "border-walnut bg-walnut text-white";
const TOGGLE_OFF = "border-line bg-card text-ink hover:bg-rosin-soft";

export function PlayerControls(p: Props) {
  const tempoId = useId();
  const playing = p.state === "playing";
  return (
    <>
      <button
        type="button"
        onClick={p.onPlayPause}
        aria-label={playing ? "Pause" : p.state === "loading" ? "Loading piano" : "Play"}
        disabled={p.state === "loading"}
        data-testid="player-play"
        className={`${BTN} border-sage bg-sage px-4 text-white hover:brightness-110`}
      >
        <span aria-hidden="true">{playing ? "❚❚" : "▶"}</span>
        <span className="hidden sm:inline">{playing ? "Pause" : p.state === "loading" ? "Loading…" : "Play"}</span>
      </button>
      <button
        type="button"
        onClick={p.onStop}
        aria-label="Stop and go back to the start"
        disabled={p.state === "stopped"}
        className={`${BTN} ${TOGGLE_OFF}`}
      >
        <span aria-hidden="true">■</span>
      </button>
      <button
        type="button"
        aria-pressed={p.loop}
        onClick={() => p.onLoop(!p.loop)}
        aria-label="Loop"
        className={`${BTN} ${p.loop ? TOGGLE_ON : TOGGLE_OFF}`}
      >
        <span aria-hidden="true">⟳</span> Loop
      </button>
      <button
        type="button"
        aria-pressed={p.metronome}
        onClick={() => p.onMetronome(!p.metronome)}
        aria-label="Metronome click with one-bar count-in"
        className={`${BTN} ${p.metronome ? TOGGLE_ON : TOGGLE_OFF}`}
      >
        <span aria-hidden="true">♩</span> Click
      </button>
      <div className="flex min-w-48 flex-1 items-center gap-2">
        <label htmlFor={tempoId} className="text-sm whitespace-nowrap text-ink">
          Tempo <span className="tabular-nums">{p.bpm}</span> bpm
        </label>
        <input
          id={tempoId}
          type="range"
          min={p.minBpm}
          max={p.maxBpm}
          step={1}
          value={p.bpm}
          aria-valuetext={`${p.bpm} quarter notes per minute`}
          onChange={(e) => p.onBpm(Number(e.target.value))}
          className="h-11 min-w-24 flex-1 accent-walnut"
        />
      </div>
      <output aria-label="Position" data-testid="player-position" className="min-w-32 text-sm tabular-nums text-muted">
        {p.readout}
      </output>
    </>
  );
}
