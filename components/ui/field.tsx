import type { ComponentProps } from "react";

/** A labelled input with its error messages tied to it for screen readers. */
export function Field({
  label,
  name,
  errors,
  hint,
  ...input
}: ComponentProps<"input"> & { label: string; name: string; errors?: string[]; hint?: string }) {
  const errorId = `${name}-error`;
  const hintId = `${name}-hint`;
  const invalid = Boolean(errors && errors.length);
  return (
    <div className="flex flex-col gap-1.5">
      <label htmlFor={name} className="text-sm font-bold text-walnut">
        {label}
      </label>
      <input
        id={name}
        name={name}
        aria-invalid={invalid || undefined}
        aria-describedby={[invalid ? errorId : null, hint ? hintId : null].filter(Boolean).join(" ") || undefined}
        className={`rounded-xl border bg-card px-3.5 py-2.5 text-base outline-none transition-colors focus:border-walnut ${
          invalid ? "border-madder" : "border-line"
        }`}
        {...input}
      />
      {hint ? (
        <p id={hintId} className="text-xs text-muted">
          {hint}
        </p>
      ) : null}
      {invalid ? (
        <p id={errorId} className="text-sm text-madder" role="alert">
          {errors!.join(" ")}
        </p>
      ) : null}
    </div>
  );
}

export function FormMessage({ message }: { message?: string | null }) {
  if (!message) return null;
  return (
    <p role="alert" className="rounded-xl bg-madder-soft px-3.5 py-2.5 text-sm text-madder">
      {message}
    </p>
  );
}
