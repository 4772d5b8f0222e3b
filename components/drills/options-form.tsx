"use client";
import { useId } from "react";
import { humanise, optionFields, type FamilyInfo } from "./family-options";

const inputClass = "rounded-lg border border-line bg-card px-2.5 py-1.5 text-sm focus:border-walnut focus:outline-none";

/** One family's options, built from its schema; every change is reported at once. */
export function OptionsForm({
  family,
  value,
  onChange,
}: {
  family: FamilyInfo;
  value: Record<string, unknown>;
  onChange(next: Record<string, unknown>): void;
}) {
  const base = useId();
  const fields = optionFields(family.schema, value);
  if (fields.length === 0) return <p className="text-sm text-muted">No options.</p>;
  const set = (name: string, v: unknown) => onChange({ ...value, [name]: v });
  return (
    <fieldset className="grid gap-3 @xs:grid-cols-2" aria-label={`${family.label} options`}>
      {fields.map((f) => {
        const id = `${base}-${f.name}`;
        if (f.kind === "boolean") {
          return (
            <label key={f.name} htmlFor={id} className="flex items-center gap-2 text-sm">
              <input id={id} type="checkbox" checked={f.value} onChange={(e) => set(f.name, e.target.checked)} className="size-4 accent-walnut" />
              {f.label}
            </label>
          );
        }
        if (f.kind === "multi") {
          return (
            <fieldset key={f.name} className="flex flex-col gap-1 @xs:col-span-2">
              <legend className="text-xs font-bold text-walnut">{f.label}</legend>
              <div className="flex flex-wrap gap-x-4 gap-y-1">
                {f.choices.map((c) => (
                  <label key={c} className="flex items-center gap-1.5 text-sm">
                    <input
                      type="checkbox"
                      className="size-4 accent-walnut"
                      checked={f.value.includes(c)}
                      onChange={(e) => set(f.name, e.target.checked ? [...f.value, c] : f.value.filter((x) => x !== c))}
                    />
                    {humanise(c)}
                  </label>
                ))}
              </div>
            </fieldset>
          );
        }
        return (
          <div key={f.name} className="flex flex-col gap-1">
            <label htmlFor={id} className="text-xs font-bold text-walnut">
              {f.label}
            </label>
            {f.kind === "enum" ? (
              <select id={id} className={inputClass} value={f.value} onChange={(e) => set(f.name, e.target.value)}>
                {f.choices.map((c) => (
                  <option key={c} value={c}>
                    {humanise(c)}
                  </option>
                ))}
              </select>
            ) : (
              <input
                id={id}
                type="number"
                className={inputClass}
                min={f.min}
                max={f.max}
                step={f.integer ? 1 : "any"}
                value={f.value ?? ""}
                onChange={(e) => set(f.name, e.target.value === "" ? undefined : Number(e.target.value))}
              />
            )}
            {f.hint ? <span className="text-xs text-muted">{f.hint}</span> : null}
          </div>
        );
      })}
    </fieldset>
  );
}
