// Shared test helpers: where the reference corpus lives and how verovio reports notes.
import fs from "node:fs";
import path from "node:path";
import { SaxesParser } from "saxes";

const repoRoot = path.resolve(__dirname, "../..");

/** The vendored reference folder (MusicXML test suite, W3C examples, real scores, FACTS.md). */
export const referenceDir = path.join(repoRoot, "fixtures/reference");

/** Every MusicXML file of the reference corpus, relative to referenceDir/musicxml. */
export function referenceFiles(): string[] {
  const root = path.join(referenceDir, "musicxml");
  const out: string[] = [];
  const walk = (dir: string) => {
    for (const entry of fs.readdirSync(dir, { withFileTypes: true })) {
      const full = path.join(dir, entry.name);
      if (entry.isDirectory()) walk(full);
      else if (/\.(xml|musicxml|mxl)$/.test(entry.name) && !entry.name.endsWith(".fragment.xml")) {
        out.push(path.relative(root, full));
      }
    }
  };
  walk(root);
  return out.filter((f) => !f.includes("/schema/")).sort();
}

export function readReference(relative: string): Uint8Array {
  return new Uint8Array(fs.readFileSync(path.join(referenceDir, "musicxml", relative)));
}

export interface VerovioToolkitLike {
  setOptions(o: object): void;
  loadData(xml: string): boolean;
  renderToTimemap(o: object): { qstamp: number; on?: string[] }[];
  getMEI(o?: object): string;
  getMIDIValuesForElement(id: string): { pitch: number };
}

/** Start verovio once per test file (about half a second). */
export async function loadVerovio(): Promise<VerovioToolkitLike> {
  // verovio's wasm/esm entry points ship no type declarations.
  // @ts-ignore
  const { default: createVerovioModule } = await import("verovio/wasm");
  // @ts-ignore
  const { VerovioToolkit } = await import("verovio/esm");
  return new VerovioToolkit(await createVerovioModule()) as unknown as VerovioToolkitLike;
}

/** One sounding note as verovio reports it: global staff number (MEI staff @n), MIDI pitch, onset. */
export interface VerovioNote {
  readonly staff: number;
  readonly midi: number;
  readonly onset: number;
}

/**
 * Non-grace notes verovio starts in its timemap, written order (expandNever keeps repeats unexpanded).
 * Staff and grace flags come from verovio's own MEI export, pitch from getMIDIValuesForElement.
 */
export function verovioNotes(tk: VerovioToolkitLike, xml: string): VerovioNote[] {
  tk.setOptions({ inputFrom: "musicxml", breaks: "none", expandNever: true });
  if (!tk.loadData(xml)) throw new Error("verovio could not load the file");
  const info = meiNoteInfo(tk.getMEI());
  const notes: VerovioNote[] = [];
  for (const entry of tk.renderToTimemap({ includeMeasures: false, includeRests: false })) {
    for (const id of entry.on ?? []) {
      const n = info.get(id);
      if (!n || n.grace) continue;
      notes.push({ staff: n.staff, midi: tk.getMIDIValuesForElement(id).pitch, onset: entry.qstamp });
    }
  }
  return notes;
}

function meiNoteInfo(mei: string): Map<string, { staff: number; grace: boolean }> {
  const info = new Map<string, { staff: number; grace: boolean }>();
  const stack: { staff?: number; grace: boolean }[] = [{ grace: false }];
  const parser = new SaxesParser({ position: false });
  parser.on("opentag", (tag) => {
    const a = tag.attributes as Record<string, string>;
    const top = stack[stack.length - 1];
    const frame = {
      // Cross-staff notes and chords carry their own @staff inside another staff's layer.
      staff: tag.name === "staff" ? Number(a.n) : a.staff !== undefined ? Number(a.staff) : top.staff,
      grace: top.grace || a.grace !== undefined || tag.name === "graceGrp",
    };
    if (tag.name === "note" && a["xml:id"]) info.set(a["xml:id"], { staff: frame.staff ?? 0, grace: frame.grace });
    stack.push(frame);
  });
  parser.on("closetag", () => {
    stack.pop();
  });
  parser.write(mei).close();
  return info;
}
