/** The three download formats of one drill, as small links. `href(format)` builds each URL. */
export function DownloadLinks({ href, title }: { href: (format: "musicxml" | "mxl" | "midi") => string; title: string }) {
  const formats = [
    ["musicxml", "MusicXML"],
    ["mxl", ".mxl"],
    ["midi", "MIDI"],
  ] as const;
  return (
    <p className="flex flex-wrap items-center gap-x-3 gap-y-1 text-sm">
      <span className="text-muted">Download</span>
      {formats.map(([format, label]) => (
        <a key={format} href={href(format)} download className="font-bold text-walnut underline underline-offset-2" aria-label={`Download ${title} as ${label}`}>
          {label}
        </a>
      ))}
    </p>
  );
}
