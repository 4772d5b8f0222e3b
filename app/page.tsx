import Link from "next/link";
import { KNOT_PATH, Wordmark } from "@/components/logo-mark";
import { ButtonLink } from "@/components/ui/button";
import { CAUTION } from "@/lib/caution";
import { getStudioContext, homePathFor } from "@/lib/auth/session";

const FAMILIES = [
  ["Blocking", "Each hand position played as one chord, so the hand learns its shape before the notes run."],
  ["Note pairs", "Every move from one chord to the next, taken two notes at a time, until the hand knows the way."],
  ["Rhythm variants", "The same notes in dotted, reversed and regrouped rhythms, to even out a run."],
  ["Stops", "A pause on a different note of each group, so the hand arrives early and relaxed."],
  ["Lift and land", "A rest between groups: the hand lifts, travels, lands — for leaps and shifts."],
  ["Held tone", "The note an accompaniment keeps returning to is held while the rest moves around it."],
  ["Voices apart", "Top line alone, inner line alone, then together with the louder voice in front."],
  ["Tempo ladder", "A plan from a slow, secure tempo up to the goal, a few metronome marks at a time."],
] as const;

const STEPS = [
  ["Upload a piece", "MusicXML from any notation program. Knotwork keeps a cleaned copy."],
  ["Mark the knot", "Select the bars, pick the hand, tag what goes wrong: rhythm, stretch, leap, voicing…"],
  ["Choose drills", "Knotwork writes short drills from those very notes, with fingering and hand-span warnings."],
  ["Hand it out", "Print a PDF handout or assign the sheet online with tempo goals."],
  ["Follow practice", "Students log minutes, tempo reached and how it felt; you see it before the lesson."],
] as const;

export default async function Landing() {
  const ctx = await getStudioContext();
  return (
    <div className="flex min-h-dvh flex-col">
      <header className="mx-auto flex w-full max-w-6xl items-center justify-between gap-3 px-4 py-4 sm:px-6">
        <Wordmark />
        <nav className="flex items-center gap-2">
          {ctx ? (
            <ButtonLink href={homePathFor(ctx.role)}>Open my studio</ButtonLink>
          ) : (
            <>
              <ButtonLink href="/sign-in" variant="quiet">Sign in</ButtonLink>
              <span className="hidden sm:block">
                <ButtonLink href="/sign-up">Create a studio</ButtonLink>
              </span>
            </>
          )}
        </nav>
      </header>

      <main className="flex-1">
        <section className="stave-lines">
          <div className="relative mx-auto max-w-6xl px-4 pt-10 pb-24 sm:px-6 sm:pt-16 sm:pb-32">
            <svg
              viewBox="0 0 32 32"
              aria-hidden
              className="pointer-events-none absolute right-6 bottom-10 hidden h-72 w-72 text-rosin/60 xl:block"
            >
              <path d={KNOT_PATH} fill="none" stroke="currentColor" strokeWidth="0.9" strokeLinecap="round" />
            </svg>
            <p className="text-sm font-bold uppercase tracking-widest text-rosin">For piano teachers and their students</p>
            <h1 className="mt-3 max-w-3xl text-4xl font-semibold sm:text-6xl">
              Untangle the bars that trip your students up.
            </h1>
            <p className="mt-5 max-w-2xl text-lg text-ink/85">
              Mark a knot in the score — the few bars where a student stumbles — and Knotwork turns those very notes into
              short practice drills, engraved with fingering, ready to print or assign, with a practice log that tells you
              how the week went.
            </p>
            <div className="mt-8 flex flex-wrap gap-3">
              <ButtonLink href="/sign-up">Create your studio</ButtonLink>
              <ButtonLink href="/sign-in" variant="secondary">I have an account</ButtonLink>
            </div>
          </div>
        </section>

        <section className="border-y border-line bg-card">
          <div className="mx-auto grid max-w-6xl gap-8 px-4 py-14 sm:px-6 md:grid-cols-[1fr_2fr]">
            <div>
              <h2 className="text-3xl font-semibold">What is a knot?</h2>
            </div>
            <div className="space-y-3 text-ink/90">
              <p>
                Every student has them: a left-hand leap that lands late, a run that goes lumpy after the thumb turns, a
                chord change the hand never quite finds. A <strong>knot</strong> is those bars — which hand, from which
                bar to which — with a word about what goes wrong.
              </p>
              <p>
                Practising the whole piece again rarely fixes a knot. Working on it in isolation, slowly and in changing
                shapes, usually does. Knotwork does the copying-out for you.
              </p>
            </div>
          </div>
        </section>

        <section className="mx-auto max-w-6xl px-4 py-14 sm:px-6">
          <h2 className="text-3xl font-semibold">Drill families, in plain words</h2>
          <p className="mt-2 max-w-2xl text-muted">Each family rewrites the knot's own notes in a different way. You choose, order and annotate.</p>
          <ul className="mt-8 grid gap-4 sm:grid-cols-2 lg:grid-cols-4">
            {FAMILIES.map(([name, text]) => (
              <li key={name} className="rounded-[var(--radius-card)] border border-line bg-card p-5">
                <h3 className="text-lg font-semibold">{name}</h3>
                <p className="mt-1 text-sm text-ink/85">{text}</p>
              </li>
            ))}
          </ul>
        </section>

        <section className="bg-walnut text-paper">
          <div className="mx-auto max-w-6xl px-4 py-14 sm:px-6">
            <h2 className="text-3xl font-semibold text-paper">From lesson to lesson</h2>
            <ol className="mt-8 grid gap-6 sm:grid-cols-2 lg:grid-cols-5">
              {STEPS.map(([name, text], i) => (
                <li key={name}>
                  <span className="font-mono text-sm text-rosin">{String(i + 1).padStart(2, "0")}</span>
                  <h3 className="mt-1 text-lg font-semibold text-paper">{name}</h3>
                  <p className="mt-1 text-sm text-paper/80">{text}</p>
                </li>
              ))}
            </ol>
          </div>
        </section>

        <section className="mx-auto max-w-6xl px-4 py-14 sm:px-6">
          <div className="rounded-[var(--radius-card)] border border-rosin/50 bg-rosin-soft/60 p-6">
            <h2 className="text-2xl font-semibold">{CAUTION.title}</h2>
            <p className="mt-2 max-w-3xl">
              {CAUTION.text} Knotwork warns when a drill asks for a
              wider stretch than a student&apos;s hand profile, but it cannot see the hand.
            </p>
          </div>
        </section>
      </main>

      <footer className="border-t border-line px-4 py-6 text-center text-xs text-muted">
        Knotwork · <Link href="/sign-in" className="underline">Sign in</Link> ·{" "}
        <Link href="/about" className="underline">About and credits</Link> · Text set in Atkinson Hyperlegible Next,
        figures in IBM Plex Mono, headings in Fraunces (SIL Open Font License).
      </footer>
    </div>
  );
}
