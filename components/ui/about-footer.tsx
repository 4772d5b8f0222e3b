import Link from "next/link";
import { CAUTION } from "@/lib/caution";

/** The small footer of stand-alone pages (invitation, errors): the caution and a link to /about. */
export function AboutFooter({ className = "" }: { className?: string }) {
  return (
    <footer className={`px-4 py-6 text-center text-xs text-muted ${className}`}>
      {CAUTION.text} ·{" "}
      <Link href="/about" className="underline">About and credits</Link>
    </footer>
  );
}
