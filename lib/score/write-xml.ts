/**
 * Tiny XML text helpers for the MusicXML writer (escaping and one-line elements).
 */

/**
 * Escapes text or attribute content: `& < > "` and `'`.
 * @example
 *   escapeXml('Tom & "Jerry"'); // "Tom &amp; &quot;Jerry&quot;"
 */
export function escapeXml(text: string): string {
  return text
    .replace(/&/g, "&amp;")
    .replace(/</g, "&lt;")
    .replace(/>/g, "&gt;")
    .replace(/"/g, "&quot;")
    .replace(/'/g, "&apos;")
    // Characters XML 1.0 forbids (controls other than tab, newline, return).
    .replace(/[\u0000-\u0008\u000B\u000C\u000E-\u001F]/g, "");
}

/**
 * One element with escaped text content: `<name attr="…">text</name>`.
 * @example
 *   el("step", "C"); // "<step>C</step>"
 */
export function el(name: string, text: string | number, attrs: Record<string, string | number | undefined> = {}): string {
  return `<${name}${attrText(attrs)}>${escapeXml(String(text))}</${name}>`;
}

/**
 * An empty element: `<name attr="…"/>`.
 * @example
 *   empty("tie", { type: "start" }); // '<tie type="start"/>'
 */
export function empty(name: string, attrs: Record<string, string | number | undefined> = {}): string {
  return `<${name}${attrText(attrs)}/>`;
}

function attrText(attrs: Record<string, string | number | undefined>): string {
  return Object.entries(attrs)
    .filter(([, v]) => v !== undefined)
    .map(([k, v]) => ` ${k}="${escapeXml(String(v))}"`)
    .join("");
}
