/** The caution shown wherever drills are: a suggestion, stop on pain, defer to a qualified person. */
export const CAUTION_TEXT =
  "A drill is a suggestion, not a prescription. Stop on pain or tension; defer to a qualified teacher or a health professional.";

export function Caution({ className = "" }: { className?: string }) {
  return (
    <p role="note" data-testid="caution" className={`rounded-xl border border-rosin/40 bg-rosin-soft/50 px-4 py-2.5 text-sm text-walnut ${className}`}>
      <strong>Caution.</strong> {CAUTION_TEXT}
    </p>
  );
}
