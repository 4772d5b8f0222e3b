"use client";
/**
 * Sound for the player: tone's transport drives a piano sampler and a metronome click.
 * Tone is passed in (loaded with a dynamic import) so only pages with a player ship it.
 */
import { PIANO_SAMPLE_BASE_URL, samplerUrls } from "./piano-samples";
import { buildTimeline, scoreTimeAtTick, type Timeline, type TimelineInput } from "./playback-timeline";

type ToneModule = typeof import("tone");

/** Tone's transport is shared by the page: the player that starts last takes it over. */
let owner: { halt(): void } | null = null;

export type SoundSource = "piano" | "synth";

export interface PlaybackSettings {
  bpm: number;
  loop: boolean;
  metronome: boolean;
}

export interface PlaybackEngine {
  /** Loads the piano samples the notes need; falls back to a synth when they cannot be fetched. */
  prepare(midis: Iterable<number>): Promise<SoundSource>;
  /** Starts from the beginning (with a count-in when the metronome is on). */
  start(input: Omit<TimelineInput, "countIn">, settings: PlaybackSettings): void;
  pause(): void;
  resume(): void;
  stop(): void;
  setBpm(bpm: number): void;
  setLoop(loop: boolean): void;
  setMetronome(on: boolean): void;
  /** Current score time in quarter notes, or null when stopped. */
  position(): { q: number; countingIn: boolean } | null;
  dispose(): void;
}

export function createPlaybackEngine(Tone: ToneModule, onEnd: () => void): PlaybackEngine {
  const transport = Tone.getTransport();
  const click = new Tone.Synth({
    oscillator: { type: "square" },
    envelope: { attack: 0.001, decay: 0.04, sustain: 0, release: 0.02 },
    volume: -14,
  }).toDestination();
  let piano: InstanceType<ToneModule["Sampler"]> | InstanceType<ToneModule["PolySynth"]> | null = null;
  let loadedKeys = "";
  let timeline: Timeline | null = null;
  let loop = false;
  let metronome = true;

  async function prepare(midis: Iterable<number>): Promise<SoundSource> {
    const urls = samplerUrls(midis);
    const keys = Object.keys(urls).sort().join(",");
    if (piano && keys === loadedKeys) return piano instanceof Tone.Sampler ? "piano" : "synth";
    piano?.dispose();
    try {
      piano = await new Promise<InstanceType<ToneModule["Sampler"]>>((resolve, reject) => {
        const s: InstanceType<ToneModule["Sampler"]> = new Tone.Sampler({
          urls,
          baseUrl: PIANO_SAMPLE_BASE_URL,
          release: 1,
          onload: () => resolve(s),
          onerror: (err) => {
            s.dispose();
            reject(err);
          },
        }).toDestination();
      });
      loadedKeys = keys;
      return "piano";
    } catch {
      piano = new Tone.PolySynth(Tone.Synth, { envelope: { attack: 0.005, decay: 0.3, sustain: 0.2, release: 0.6 } }).toDestination();
      piano.volume.value = -8;
      loadedKeys = keys;
      return "synth";
    }
  }

  const self = {
    halt() {
      timeline = null;
      piano?.releaseAll();
      onEnd();
    },
  };

  function start(input: Omit<TimelineInput, "countIn">, settings: PlaybackSettings) {
    if (owner && owner !== self) owner.halt();
    owner = self;
    stop();
    loop = settings.loop;
    metronome = settings.metronome;
    const ppq = transport.PPQ;
    const t = buildTimeline({ ...input, countIn: settings.metronome }, ppq);
    timeline = t;
    transport.bpm.value = settings.bpm;
    for (const n of t.notes) {
      transport.schedule((time) => {
        const seconds = (n.durationQ * 60) / transport.bpm.value;
        piano?.triggerAttackRelease(Tone.Frequency(n.midi, "midi").toFrequency(), seconds, time, n.velocity);
      }, `${n.tick}i`);
    }
    for (const c of t.clicks) {
      transport.schedule((time) => {
        if (metronome || c.tick < t.loopStartTick) click.triggerAttackRelease(c.downbeat ? "C7" : "G6", 0.03, time, c.downbeat ? 1 : 0.6);
      }, `${c.tick}i`);
    }
    transport.schedule((time) => {
      if (loop) return;
      transport.stop(time);
      Tone.getDraw().schedule(() => {
        timeline = null;
        onEnd();
      }, time);
    }, `${t.loopEndTick}i`);
    transport.setLoopPoints(`${t.loopStartTick}i`, `${t.loopEndTick}i`);
    transport.loop = loop;
    transport.position = 0;
    transport.start("+0.05");
  }

  function stop() {
    if (owner !== self) return;
    transport.stop();
    transport.cancel(0);
    piano?.releaseAll();
    timeline = null;
  }

  return {
    prepare,
    start,
    pause: () => {
      if (owner !== self) return;
      transport.pause();
      piano?.releaseAll();
    },
    resume: () => {
      if (owner === self && timeline) transport.start("+0.02");
    },
    stop,
    setBpm: (bpm) => {
      if (owner === self) transport.bpm.rampTo(bpm, 0.05);
    },
    setLoop: (on) => {
      loop = on;
      if (owner === self) transport.loop = on;
    },
    setMetronome: (on) => {
      metronome = on;
    },
    position: () => (timeline ? scoreTimeAtTick(timeline, transport.ticks, transport.PPQ) : null),
    dispose: () => {
      stop();
      if (owner === self) owner = null;
      click.dispose();
      piano?.dispose();
      piano = null;
    },
  };
}
