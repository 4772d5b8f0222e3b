"use client";
/**
 * Playback of a piece or drill: play/pause, stop, loop, tempo (40–208 quarter notes per minute),
 * metronome with a one-bar count-in, and a position readout. Times come in quarter notes (from
 * lib/score's model); the tempo slider scales them. Tone loads only where a player is shown.
 */
import { useEffect, useMemo, useRef, useState } from "react";
import type { PlaybackEngine, SoundSource } from "./playback-engine";
import { describePosition, type BarMark, type PlaybackEvent } from "./playback-timeline";
import { PlayerControls } from "./player-controls";

export type { BarMark, PlaybackEvent };

export interface PlayerProps {
  events: readonly PlaybackEvent[];
  beatsPerBar: number;
  /** Beat length in quarter notes: 1 for x/4, 0.5 for x/8, 1.5 for a dotted-quarter beat. */
  beatUnitQ: number;
  /** Starting tempo in quarter notes per minute (clamped to 40–208). */
  initialBpm: number;
  /** Play only this range of the score (quarter notes); default from 0 to the end of the last bar. */
  startQ?: number;
  endQ?: number;
  /** Where a full bar starts (default `startQ`): after a pickup, the start of bar 1. */
  barAnchorQ?: number;
  /** Printed bar numbers and starts, for the position readout. */
  bars?: readonly BarMark[];
  /** Called with the score time in quarter notes while playing, and null when playback stops. */
  onCursor?(q: number | null): void;
  label?: string;
  className?: string;
}

export const MIN_BPM = 40;
export const MAX_BPM = 208;
type PlayState = "stopped" | "loading" | "playing" | "paused";
/** The cursor callback fires at most this often. */
const CURSOR_INTERVAL_MS = 40;

const clampBpm = (b: number) => Math.round(Math.min(MAX_BPM, Math.max(MIN_BPM, b)));

export function Player({
  events,
  beatsPerBar,
  beatUnitQ,
  initialBpm,
  startQ = 0,
  endQ,
  barAnchorQ,
  bars,
  onCursor,
  label = "Playback",
  className = "",
}: PlayerProps) {
  const [state, setState] = useState<PlayState>("stopped");
  const [bpm, setBpm] = useState(() => clampBpm(initialBpm));
  const [loop, setLoop] = useState(false);
  const [metronome, setMetronome] = useState(true);
  const [position, setPosition] = useState<{ q: number; countingIn: boolean }>({ q: startQ, countingIn: false });
  const [audioState, setAudioState] = useState("not-started");
  const [sound, setSound] = useState<SoundSource | null>(null);
  const tone = useRef<Promise<typeof import("tone")> | null>(null);
  const engine = useRef<PlaybackEngine | null>(null);
  const raf = useRef<number | null>(null);
  const cursorCb = useRef(onCursor);
  cursorCb.current = onCursor;
  const midis = useMemo(() => events.map((e) => e.midi), [events]);

  useEffect(() => {
    tone.current ??= import("tone");
    return () => {
      if (raf.current !== null) cancelAnimationFrame(raf.current);
      engine.current?.dispose();
      engine.current = null;
    };
  }, []);

  function follow() {
    let last = 0;
    const tick = (now: number) => {
      const p = engine.current?.position();
      if (p) {
        setPosition(p);
        if (now - last >= CURSOR_INTERVAL_MS) {
          last = now;
          cursorCb.current?.(p.countingIn ? null : p.q);
        }
      }
      raf.current = requestAnimationFrame(tick);
    };
    raf.current = requestAnimationFrame(tick);
  }

  function unfollow() {
    if (raf.current !== null) cancelAnimationFrame(raf.current);
    raf.current = null;
  }

  function ended() {
    unfollow();
    setState("stopped");
    setPosition({ q: startQ, countingIn: false });
    cursorCb.current?.(null);
  }

  async function playPause() {
    if (state === "playing") {
      engine.current?.pause();
      unfollow();
      setState("paused");
      return;
    }
    if (state === "loading") return;
    const Tone = await (tone.current ??= import("tone"));
    await Tone.start();
    setAudioState(Tone.getContext().state);
    if (!engine.current) {
      const { createPlaybackEngine } = await import("./playback-engine");
      engine.current = createPlaybackEngine(Tone, () => ended());
    }
    if (state === "paused" && engine.current.position()) {
      engine.current.resume();
    } else {
      setState("loading");
      setSound(await engine.current.prepare(midis));
      engine.current.start({ events, beatsPerBar, beatUnitQ, startQ, endQ, barAnchorQ }, { bpm, loop, metronome });
    }
    setAudioState(Tone.getContext().state);
    setState("playing");
    follow();
  }

  function stop() {
    engine.current?.stop();
    ended();
  }

  const readout = position.countingIn
    ? "Count-in"
    : describePosition(position.q, { beatsPerBar, beatUnitQ, anchor: barAnchorQ ?? startQ }, bars);

  return (
    <div
      role="group"
      aria-label={label}
      data-testid="player"
      data-audio-state={audioState}
      data-state={state}
      data-position={position.q.toFixed(3)}
      data-sound={sound ?? undefined}
      className={`flex flex-wrap items-center gap-3 rounded-md border border-line bg-card p-2 ${className}`}
    >
      <PlayerControls
        state={state}
        bpm={bpm}
        minBpm={MIN_BPM}
        maxBpm={MAX_BPM}
        loop={loop}
        metronome={metronome}
        readout={readout}
        onPlayPause={() => void playPause()}
        onStop={stop}
        onBpm={(b) => {
          setBpm(b);
          engine.current?.setBpm(b);
        }}
        onLoop={(on) => {
          setLoop(on);
          engine.current?.setLoop(on);
        }}
        onMetronome={(on) => {
          setMetronome(on);
          engine.current?.setMetronome(on);
        }}
      />
    </div>
  );
}
