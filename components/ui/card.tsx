import type { ReactNode } from "react";

export function Card({ children, className = "" }: { children: ReactNode; className?: string }) {
  return (
    <div className={`rounded-[var(--radius-card)] border border-line bg-card p-5 shadow-[0_1px_0_rgba(91,58,41,0.06)] ${className}`}>
      {children}
    </div>
  );
}

export function PageHeader({ title, lead, action }: { title: string; lead?: ReactNode; action?: ReactNode }) {
  return (
    <header className="mb-6 flex flex-col gap-3 sm:flex-row sm:items-end sm:justify-between">
      <div>
        <h1 className="text-3xl font-semibold sm:text-4xl">{title}</h1>
        {lead ? <p className="mt-2 max-w-2xl text-muted">{lead}</p> : null}
      </div>
      {action ? <div className="shrink-0">{action}</div> : null}
    </header>
  );
}

export function Badge({ children, tone = "rosin" }: { children: ReactNode; tone?: "rosin" | "sage" | "madder" }) {
  const tones = {
    rosin: "bg-rosin-soft text-walnut",
    sage: "bg-sage-soft text-sage",
    madder: "bg-madder-soft text-madder",
  };
  return <span className={`inline-flex items-center rounded-full px-2.5 py-0.5 text-xs font-bold ${tones[tone]}`}>{children}</span>;
}
