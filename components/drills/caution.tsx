import { CAUTION } from "@/lib/caution";

/** The caution shown wherever drills are: a suggestion, stop on pain, defer to a qualified person. */
export function Caution({ className = "" }: { className?: string }) {
  return (
    <p role="note" data-testid="caution" className={`rounded-xl border border-rosin/40 bg-rosin-soft/50 px-4 py-2.5 text-sm text-walnut ${className}`}>
      <strong>Caution.</strong> {CAUTION.text}
    </p>
  );
}
