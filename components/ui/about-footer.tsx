import Link from "next/link";

/** The small footer of stand-alone pages (invitation, errors): the caution and a link to /about. */
export function AboutFooter({ className = "" }: { className?: string }) {
  return (
    <footer className={`px-4 py-6 text-center text-xs text-muted ${className}`}>
      A generated drill is a suggestion. Stop on pain or tension, and defer to a qualified teacher or health professional. ·{" "}
      <Link href="/about" className="underline">About and credits</Link>
    </footer>
  );
}
