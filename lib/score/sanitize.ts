/**
 * Safety gate and cleaned copy. Runs before any XML parser sees the text: refuses entity declarations
 * and DOCTYPE internal subsets, then re-serialises the file without DOCTYPE, comments or processing
 * instructions. Only that cleaned copy is ever stored or sent to a browser.
 */
import { SaxesParser } from "saxes";
import { ScoreError } from "./errors";

/** Largest MusicXML text accepted, in characters (about 10 MB). */
export const MAX_XML_CHARS = 10 * 1024 * 1024;

/**
 * Throw a `ScoreError` when the text is too large, declares entities or carries an internal DTD subset.
 * Harmless external DOCTYPEs (the usual MusicXML public identifier) pass; nothing is ever fetched.
 *
 * @example
 * assertSafeXml('<!DOCTYPE a [<!ENTITY x "y">]><a/>'); // throws ScoreError "entity-internal"
 */
export function assertSafeXml(text: string): void {
  if (text.length > MAX_XML_CHARS) {
    throw new ScoreError("too-large", `The file has ${text.length} characters; the limit is ${MAX_XML_CHARS}`);
  }
  const entityAt = text.indexOf("<!ENTITY");
  const doctypeAt = text.indexOf("<!DOCTYPE");
  if (entityAt >= 0) throw classifyEntities(text, entityAt);
  if (doctypeAt >= 0) {
    const subset = internalSubset(text, doctypeAt);
    if (subset !== null) {
      throw new ScoreError("doctype-subset", "The DOCTYPE carries an internal subset, which is not accepted", {
        element: "!DOCTYPE",
      });
    }
  }
}

/** Text of the DOCTYPE's `[ … ]` subset, or null when it has none. */
function internalSubset(text: string, doctypeAt: number): string | null {
  let quote: string | null = null;
  for (let i = doctypeAt + 9; i < text.length; i++) {
    const c = text[i];
    if (quote) {
      if (c === quote) quote = null;
    } else if (c === '"' || c === "'") quote = c;
    else if (c === "[") {
      const end = text.indexOf("]", i);
      return text.slice(i + 1, end < 0 ? text.length : end);
    } else if (c === ">") return null;
  }
  return null;
}

/** Name the kind of entity attack, most dangerous first. */
function classifyEntities(text: string, entityAt: number): ScoreError {
  const decls = text.slice(entityAt).match(/<!ENTITY[^>]*>/g) ?? [];
  const place = { element: "!ENTITY" };
  if (decls.some((d) => /^<!ENTITY\s+%/.test(d))) {
    return new ScoreError("entity-parameter", "The file declares a parameter entity", place);
  }
  if (decls.some((d) => /\s(SYSTEM|PUBLIC)\s/.test(d))) {
    return new ScoreError("entity-external", "The file declares an external entity (a file or URL)", place);
  }
  if (decls.some((d) => /&[A-Za-z_:][\w.:-]*;/.test(d))) {
    return new ScoreError("entity-nested", "The file declares entities that expand other entities", place);
  }
  return new ScoreError("entity-internal", "The file declares an entity, which is not accepted", place);
}

const ESCAPES: Record<string, string> = { "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;" };

/**
 * Escape text or attribute content for XML output.
 *
 * @example
 * escapeXml('a < b & "c"'); // 'a &lt; b &amp; &quot;c&quot;'
 */
export function escapeXml(s: string): string {
  return s.replace(/[&<>"]/g, (c) => ESCAPES[c]);
}

/** The saxes events a cleaner listens to; the reader forwards them from its own pass. */
export interface XmlCleaner {
  openTag(tag: { readonly name: string; readonly attributes: Record<string, unknown>; readonly isSelfClosing: boolean }): void;
  closeTag(tag: { readonly name: string; readonly isSelfClosing: boolean }): void;
  /** Character data (the `text` event). */
  text(t: string): void;
  cdata(t: string): void;
  /** The cleaned document so far. */
  result(): string;
}

/**
 * A serialiser fed with saxes events: elements, attributes and text (entities decoded and re-escaped);
 * no DOCTYPE, comments or processing instructions; CDATA as escaped text; text before the root dropped.
 * `cleanXml` drives it with its own saxes pass; `readScore({ clean: true })` from the reading pass.
 *
 * @example
 * const cleaner = xmlCleaner();
 * cleaner.openTag({ name: "a", attributes: {}, isSelfClosing: true });
 * cleaner.closeTag({ name: "a", isSelfClosing: true });
 * cleaner.result(); // '<?xml version="1.0" encoding="UTF-8"?>\n<a/>'
 */
export function xmlCleaner(): XmlCleaner {
  const out: string[] = ['<?xml version="1.0" encoding="UTF-8"?>\n'];
  let open: string | null = null;
  const flush = () => {
    if (open !== null) out.push(open, ">");
    open = null;
  };
  const onText = (t: string) => {
    if (t.length === 0) return;
    flush();
    out.push(escapeXml(t));
  };
  return {
    openTag(tag) {
      flush();
      let s = `<${tag.name}`;
      for (const [k, v] of Object.entries(tag.attributes)) s += ` ${k}="${escapeXml(String(v))}"`;
      if (tag.isSelfClosing) out.push(s, "/>");
      else open = s;
    },
    closeTag(tag) {
      if (tag.isSelfClosing) return;
      if (open !== null) {
        out.push(open, "/>");
        open = null;
      } else out.push(`</${tag.name}>`);
    },
    text(t) {
      if (out.length > 1) onText(t);
    },
    cdata: onText,
    result: () => out.join(""),
  };
}

/**
 * Re-serialise safe MusicXML text: keeps elements, attributes and text (entities decoded and re-escaped),
 * drops the DOCTYPE, comments and processing instructions, turns CDATA into escaped text.
 *
 * @example
 * cleanXml('<?xml version="1.0"?><!--x--><a>&#252;</a>'); // '<?xml version="1.0" encoding="UTF-8"?>\n<a>ü</a>'
 */
export function cleanXml(text: string): string {
  assertSafeXml(text);
  const cleaner = xmlCleaner();
  const parser = new SaxesParser({ position: false });
  parser.on("opentag", (tag) => cleaner.openTag(tag));
  parser.on("closetag", (tag) => cleaner.closeTag(tag));
  parser.on("text", (t) => cleaner.text(t));
  parser.on("cdata", (t) => cleaner.cdata(t));
  try {
    parser.write(text).close();
  } catch (e) {
    throw new ScoreError("xml-malformed", `The XML is not well formed: ${(e as Error).message}`);
  }
  return cleaner.result();
}
