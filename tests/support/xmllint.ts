/**
 * Validates MusicXML text against the MusicXML 4.0 XSD with `xmllint` (Debian libxml2-utils).
 *
 * The schema is the W3C copy vendored in fixtures/reference (see its SOURCES.md). `musicxml.local.xsd` is byte-for-byte
 * `musicxml.xsd` except that its two `xs:import` lines point at the local `xml.xsd` / `xlink.xsd`
 * (see the schema folder's README), so validation runs offline with `--nonet`; the plain
 * `musicxml.xsd` tries to fetch those two files from musicxml.org and fails to compile without network.
 */
import { spawnSync } from "node:child_process";
import fs from "node:fs";
import path from "node:path";

const repoRoot = path.resolve(__dirname, "../..");

/** The vendored reference folder (MusicXML test suite, W3C samples and XSD, real scores, FACTS.md). */
export function referenceDir(): string {
  return path.join(repoRoot, "fixtures/reference");
}

/** The offline copy of the MusicXML 4.0 XSD. */
export function musicXmlSchemaPath(): string {
  return path.join(referenceDir(), "musicxml/w3c-musicxml-4.0/schema/musicxml.local.xsd");
}

/** True when the `xmllint` binary is on the PATH. */
export function hasXmllint(): boolean {
  const r = spawnSync("xmllint", ["--version"], { encoding: "utf8" });
  return r.status === 0;
}

export interface XsdResult {
  readonly valid: boolean;
  /** xmllint's error lines (empty when valid). */
  readonly errors: string[];
}

/**
 * Validates one MusicXML document (text) against the MusicXML 4.0 XSD.
 * @example
 *   const { valid, errors } = validateMusicXml(writeMusicXML(score));
 */
export function validateMusicXml(xml: string): XsdResult {
  const schema = musicXmlSchemaPath();
  if (!fs.existsSync(schema)) throw new Error(`MusicXML schema not found at ${schema}`);
  const r = spawnSync("xmllint", ["--noout", "--nonet", "--schema", schema, "-"], {
    input: xml,
    encoding: "utf8",
    maxBuffer: 64 * 1024 * 1024,
  });
  if (r.error) throw r.error;
  const errors = (r.stderr ?? "")
    .split("\n")
    .filter((line) => line.trim() !== "" && !/ validates$/.test(line));
  return { valid: r.status === 0, errors };
}
