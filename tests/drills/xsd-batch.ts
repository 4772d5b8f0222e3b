/**
 * Validate many MusicXML documents against the MusicXML 4.0 XSD with one `xmllint` run, so the
 * schema is read once instead of once per document (the single-document check is
 * tests/support/xmllint.ts `validateMusicXml`).
 */
import { spawnSync } from "node:child_process";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { musicXmlSchemaPath } from "../support/xmllint";

/**
 * xmllint's error lines per document, in input order (an empty list means valid).
 * @example
 *   const errors = validateAll([writeMusicXML(a), writeMusicXML(b)]); // [[], []]
 */
export function validateAll(xmls: readonly string[]): string[][] {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), "knotwork-xsd-"));
  try {
    const files = xmls.map((xml, i) => {
      const file = path.join(dir, `d${i}.musicxml`);
      fs.writeFileSync(file, xml);
      return file;
    });
    const r = spawnSync("xmllint", ["--noout", "--nonet", "--schema", musicXmlSchemaPath(), ...files], {
      encoding: "utf8",
      maxBuffer: 64 * 1024 * 1024,
    });
    if (r.error) throw r.error;
    const lines = (r.stderr ?? "").split("\n").filter((l) => l.trim() !== "");
    return files.map((file) => {
      const mine = lines.filter((l) => l.startsWith(`${file}:`) || l.startsWith(`${file} `));
      const failed = mine.some((l) => l === `${file} fails to validate`);
      const errors = mine.filter((l) => l !== `${file} validates`);
      return failed && errors.length === 0 ? [`${file} fails to validate`] : errors;
    });
  } finally {
    fs.rmSync(dir, { recursive: true, force: true });
  }
}
