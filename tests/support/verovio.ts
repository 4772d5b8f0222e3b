/**
 * verovio (LGPL, test-only) as an independent MusicXML reader: load the module once per test file,
 * read a MusicXML string and return the notes its timemap plays.
 *
 * Each note is `{ staff, midi, onset }`: verovio's staff number (`<staff n>` in its MEI; for a
 * one-part score this is the part's staff, later parts continue the count), the MIDI number verovio
 * computes (octave shifts applied) and the onset in quarter notes (`qstamp`, a float). Grace notes,
 * rests and spaces are left out. Repeats stay in written order (`expandNever`). Tied continuations
 * are kept as separate notes, as verovio lists them, unless `mergeTies` is set.
 */
type Toolkit = {
  setOptions(o: Record<string, unknown>): void;
  loadData(data: string): boolean;
  renderToTimemap(o: Record<string, unknown>): TimemapEntry[];
  getMEI(o?: Record<string, unknown>): string;
  getMIDIValuesForElement(id: string): { pitch: number; time: number; duration: number };
};
type TimemapEntry = { qstamp: number; on?: string[]; off?: string[] };

export interface VerovioNote {
  readonly staff: number;
  readonly midi: number;
  readonly onset: number;
}

let toolkit: Promise<Toolkit> | null = null;

/** The shared verovio toolkit (created on first use). */
export function verovioToolkit(): Promise<Toolkit> {
  toolkit ??= (async () => {
    // @ts-expect-error verovio ships no type declarations for its wasm entry
    const { default: createVerovioModule } = await import("verovio/wasm");
    // @ts-expect-error verovio ships no type declarations for its esm entry
    const { VerovioToolkit } = await import("verovio/esm");
    return new VerovioToolkit(await createVerovioModule()) as unknown as Toolkit;
  })();
  return toolkit;
}

interface MeiNote {
  staff: number;
  grace: boolean;
  tieEnd: boolean;
}

const attr = (tag: string, name: string): string | undefined =>
  new RegExp(`\\s${name}="([^"]*)"`).exec(tag)?.[1];

/** Staff, grace and tie facts of every MEI note, keyed by xml:id. */
function meiNotes(mei: string): Map<string, MeiNote> {
  const notes = new Map<string, MeiNote>();
  const tieEnds = new Set<string>();
  let staff = 0;
  const open: { name: string; staff?: number; grace: boolean }[] = [];
  for (const m of mei.matchAll(/<(\/?)([A-Za-z]+)([^>]*?)(\/?)>/g)) {
    const [, closing, name, rest, selfClosing] = m;
    if (closing) {
      if (name === "staff") staff = 0;
      if (name === "chord" || name === "graceGrp") open.pop();
      continue;
    }
    if (name === "staff") staff = Number(attr(rest, "n") ?? 0);
    if (name === "tie") {
      const end = attr(rest, "endid");
      if (end) tieEnds.add(end.replace(/^#/, ""));
    }
    if ((name === "chord" || name === "graceGrp") && !selfClosing) {
      const s = attr(rest, "staff");
      open.push({ name, staff: s ? Number(s.split(" ")[0]) : undefined, grace: name === "graceGrp" || attr(rest, "grace") !== undefined });
    }
    if (name === "note") {
      const id = attr(rest, "xml:id");
      if (!id) continue;
      const own = attr(rest, "staff");
      const outer = [...open].reverse().find((o) => o.staff !== undefined)?.staff;
      const tie = attr(rest, "tie");
      notes.set(id, {
        staff: own ? Number(own.split(" ")[0]) : (outer ?? staff),
        grace: attr(rest, "grace") !== undefined || open.some((o) => o.grace),
        tieEnd: tie === "m" || tie === "t",
      });
    }
  }
  for (const id of tieEnds) {
    const n = notes.get(id);
    if (n) n.tieEnd = true;
  }
  return notes;
}

/**
 * The non-grace notes verovio plays for a MusicXML string, sorted by onset, staff, midi.
 * @example
 *   const notes = await verovioNotes(xml); // [{ staff: 1, midi: 60, onset: 0 }, …]
 */
export async function verovioNotes(xml: string, options: { mergeTies?: boolean } = {}): Promise<VerovioNote[]> {
  const tk = await verovioToolkit();
  tk.setOptions({ inputFrom: "musicxml", breaks: "none", expandNever: true });
  if (!tk.loadData(xml)) throw new Error("verovio could not load the MusicXML");
  const map = tk.renderToTimemap({ includeMeasures: false, includeRests: false });
  const info = meiNotes(tk.getMEI());
  const out: VerovioNote[] = [];
  for (const entry of map) {
    for (const id of entry.on ?? []) {
      const n = info.get(id);
      if (!n || n.grace || (options.mergeTies && n.tieEnd)) continue;
      out.push({ staff: n.staff, midi: tk.getMIDIValuesForElement(id).pitch, onset: entry.qstamp });
    }
  }
  return out.sort((a, b) => a.onset - b.onset || a.staff - b.staff || a.midi - b.midi);
}
