import type { ReactNode } from "react";

/** What a section shows before it has anything in it: what it is for and the next step. */
export function EmptyState({ title, children, action }: { title: string; children: ReactNode; action?: ReactNode }) {
  return (
    <div className="rounded-[var(--radius-card)] border border-dashed border-walnut/25 bg-paper/60 px-5 py-6 text-center">
      <svg viewBox="0 0 48 20" aria-hidden className="mx-auto mb-3 h-5 w-12 text-rosin">
        {[2, 6, 10, 14, 18].map((y) => (
          <line key={y} x1="0" x2="48" y1={y} y2={y} stroke="currentColor" strokeOpacity="0.45" strokeWidth="1" />
        ))}
      </svg>
      <p className="font-bold text-walnut">{title}</p>
      <div className="mx-auto mt-1 max-w-md text-sm text-muted">{children}</div>
      {action ? <div className="mt-4">{action}</div> : null}
    </div>
  );
}
