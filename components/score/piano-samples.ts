/**
 * The piano samples the player loads: Salamander Grand Piano V3 (Alexander Holm, CC BY 3.0),
 * copied by scripts/copy-samples.mjs into public/samples/piano/ with "#" written as "s".
 * Only C, D#, F# and A of each octave exist; the sampler repitches the notes between.
 */

export const PIANO_SAMPLE_BASE_URL = "/samples/piano/";

const NAMES = ["C", "D#", "F#", "A"] as const;
const PITCH_CLASS: Record<(typeof NAMES)[number], number> = { C: 0, "D#": 3, "F#": 6, A: 9 };

/** One shipped sample: its note name for the sampler, its MIDI number and its file name. */
export interface PianoSample {
  note: string;
  midi: number;
  file: string;
}

/** Every shipped sample, low to high: A0 (MIDI 21) … C8 (MIDI 108). */
export const PIANO_SAMPLES: readonly PianoSample[] = (() => {
  const out: PianoSample[] = [];
  for (let octave = 0; octave <= 8; octave++) {
    for (const name of NAMES) {
      const midi = 12 * (octave + 1) + PITCH_CLASS[name];
      if (midi < 21 || midi > 108) continue;
      const note = `${name}${octave}`;
      out.push({ note, midi, file: `${note.replace("#", "s")}v8.mp3` });
    }
  }
  return out.sort((a, b) => a.midi - b.midi);
})();

/** The nearest shipped sample to a MIDI note (ties go to the lower sample). */
export function nearestSample(midi: number): PianoSample {
  let best = PIANO_SAMPLES[0];
  for (const s of PIANO_SAMPLES) {
    if (Math.abs(s.midi - midi) < Math.abs(best.midi - midi)) best = s;
  }
  return best;
}

/**
 * The sampler's `urls` map restricted to the samples a set of notes needs, so a short drill
 * loads a handful of files instead of all thirty. With no notes it returns every sample.
 */
export function samplerUrls(midis: Iterable<number> = []): Record<string, string> {
  const picked = new Map<string, string>();
  for (const midi of midis) {
    const s = nearestSample(midi);
    picked.set(s.note, s.file);
  }
  if (picked.size === 0) for (const s of PIANO_SAMPLES) picked.set(s.note, s.file);
  return Object.fromEntries(picked);
}
