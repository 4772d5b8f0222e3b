/** Knotwork's mark: a trefoil knot drawn as one unbroken line. */
export const KNOT_PATH =
  "M16.0 13.6C17.2 13.6 18.5 13.8 19.7 14.1C20.9 14.3 22.0 14.8 23.0 15.4C24.0 15.9 24.9 16.6 25.6 17.3C26.3 18.0 26.9 18.9 27.2 19.7C27.6 20.5 27.8 21.4 27.8 22.2C27.8 22.9 27.5 23.7 27.2 24.3C26.8 25.0 26.2 25.6 25.6 26.0C24.9 26.4 24.1 26.6 23.2 26.7C22.3 26.8 21.3 26.7 20.3 26.5C19.3 26.3 18.3 25.8 17.3 25.2C16.3 24.7 15.3 23.9 14.5 23.0C13.7 22.2 12.9 21.1 12.3 20.1C11.7 19.0 11.2 17.8 10.8 16.6C10.5 15.5 10.3 14.2 10.3 13.1C10.3 12.0 10.4 10.8 10.7 9.9C11.0 8.9 11.4 8.0 11.9 7.3C12.5 6.6 13.1 6.0 13.8 5.6C14.5 5.2 15.3 5.0 16.0 5.0C16.7 5.0 17.5 5.2 18.2 5.6C18.9 6.0 19.5 6.6 20.1 7.3C20.6 8.0 21.0 8.9 21.3 9.9C21.6 10.8 21.7 12.0 21.7 13.1C21.7 14.2 21.5 15.5 21.2 16.6C20.8 17.8 20.3 19.0 19.7 20.0C19.1 21.1 18.3 22.2 17.5 23.0C16.7 23.9 15.7 24.7 14.7 25.2C13.7 25.8 12.7 26.3 11.7 26.5C10.7 26.7 9.7 26.8 8.8 26.7C7.9 26.6 7.1 26.4 6.4 26.0C5.8 25.6 5.2 25.0 4.8 24.4C4.5 23.7 4.2 22.9 4.2 22.2C4.2 21.4 4.4 20.5 4.8 19.7C5.1 18.9 5.7 18.0 6.4 17.3C7.1 16.6 8.0 15.9 9.0 15.4C10.0 14.8 11.1 14.3 12.3 14.1C13.5 13.8 14.8 13.6 16.0 13.6Z";

export function LogoMark({ className = "h-8 w-8", title }: { className?: string; title?: string }) {
  return (
    <svg
      viewBox="0 0 32 32"
      className={className}
      role={title ? "img" : undefined}
      aria-hidden={title ? undefined : true}
      aria-label={title}
    >
      <rect x="0.5" y="0.5" width="31" height="31" rx="9" className="fill-walnut" />
      <path
        d={KNOT_PATH}
        fill="none"
        className="stroke-paper"
        strokeWidth="2.4"
        strokeLinecap="round"
        strokeLinejoin="round"
      />
      <circle cx="16" cy="17.9" r="1.6" className="fill-rosin" />
    </svg>
  );
}

export function Wordmark({ className = "" }: { className?: string }) {
  return (
    <span className={`inline-flex items-center gap-2 ${className}`}>
      <LogoMark className="h-8 w-8 shrink-0" />
      <span className="font-display text-xl font-semibold tracking-tight text-walnut">Knotwork</span>
    </span>
  );
}
