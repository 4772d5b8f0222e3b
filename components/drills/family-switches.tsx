"use client";
import type { FamilyInfo } from "./family-options";
import { OptionsForm } from "./options-form";

/** Every family with an on/off switch; suggested ones first, each switched-on family with its options. */
export function FamilySwitches({
  families,
  suggested,
  enabled,
  options,
  onToggle,
  onOptions,
}: {
  families: FamilyInfo[];
  suggested: string[];
  enabled: string[];
  options: Record<string, Record<string, unknown>>;
  onToggle(id: string, on: boolean): void;
  onOptions(id: string, next: Record<string, unknown>): void;
}) {
  const group = (title: string, list: FamilyInfo[]) =>
    list.length === 0 ? null : (
      <div className="flex flex-col gap-2">
        <h3 className="text-xs font-bold uppercase tracking-wider text-muted">{title}</h3>
        <ul className="flex flex-col gap-2">
          {list.map((f) => {
            const on = enabled.includes(f.id);
            return (
              <li key={f.id} className={`rounded-xl border p-3 ${on ? "border-walnut/40 bg-card" : "border-line bg-paper"}`}>
                <label className="flex cursor-pointer items-start gap-2.5">
                  <input
                    type="checkbox"
                    role="switch"
                    aria-checked={on}
                    checked={on}
                    onChange={(e) => onToggle(f.id, e.target.checked)}
                    className="mt-1 size-4 accent-walnut"
                  />
                  <span>
                    <span className="font-bold">{f.label}</span>
                    <span className="block text-xs text-muted">{f.describe}</span>
                  </span>
                </label>
                {on && (
                  <div className="@container mt-3 border-t border-line pt-3">
                    <OptionsForm family={f} value={options[f.id] ?? {}} onChange={(next) => onOptions(f.id, next)} />
                  </div>
                )}
              </li>
            );
          })}
        </ul>
      </div>
    );
  return (
    <div className="flex flex-col gap-4">
      {group("Suggested for this knot", families.filter((f) => suggested.includes(f.id)))}
      {group("Other drill families", families.filter((f) => !suggested.includes(f.id)))}
    </div>
  );
}
