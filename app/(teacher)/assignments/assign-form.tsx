"use client";
import { zodResolver } from "@hookform/resolvers/zod";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { useForm } from "react-hook-form";
import { Button } from "@/components/ui/button";
import { FormMessage } from "@/components/ui/field";
import { assignSheetAction } from "./actions";
import { AssignmentInput } from "./assignment-input";

const inputClass = "rounded-xl border border-line bg-card px-3 py-2 text-base outline-none focus:border-walnut";
const numberOrUndefined = (v: unknown) => (v === "" || v == null ? undefined : Number(v));

/** Assign one sheet to students with a due date and a tempo goal per drill. */
export function AssignForm({ sheet, students, today }: {
  sheet: { id: string; drills: { id: string; title: string; target: number | null }[] };
  students: { membershipId: string; name: string }[];
  today: string;
}) {
  const router = useRouter();
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  const defaults = { sheetId: sheet.id, studentMembershipIds: [], dueDate: today, note: "", tempoGoals: Object.fromEntries(sheet.drills.map((d) => [d.id, d.target ?? undefined])) };
  const form = useForm<AssignmentInput>({ resolver: zodResolver(AssignmentInput), defaultValues: defaults });
  const { errors, isSubmitting } = form.formState;
  async function onSubmit(values: AssignmentInput) {
    const r = await assignSheetAction(values);
    if (!r.ok) {
      setMessage({ ok: false, text: [r.message, ...Object.values(r.fieldErrors ?? {}).flat()].join(" ") });
      return;
    }
    setMessage({ ok: true, text: `Assigned to ${r.data.ids.length} student${r.data.ids.length === 1 ? "" : "s"}; each got an e-mail with the link.` });
    form.reset(defaults);
    router.refresh();
  }
  const tempoMessages = errors.tempoGoals ? Object.values(errors.tempoGoals).map((e) => (e as { message?: string })?.message).filter(Boolean).join(" ") : null;
  return (
    <form onSubmit={form.handleSubmit(onSubmit)} className="flex flex-col gap-4" noValidate aria-label="Assign this sheet">
      {message ? (message.ok ? <p role="status" className="text-sm text-sage">{message.text}</p> : <FormMessage message={message.text} />) : null}
      <fieldset>
        <legend className="text-sm font-bold text-walnut">Students</legend>
        <div className="mt-1 flex flex-wrap gap-2">
          {students.map((s) => (
            <label key={s.membershipId} className="flex items-center gap-1.5 rounded-full border border-line bg-card px-3 py-1.5 text-sm">
              <input type="checkbox" value={s.membershipId} {...form.register("studentMembershipIds")} /> {s.name}
            </label>
          ))}
        </div>
        {errors.studentMembershipIds ? <p role="alert" className="text-sm text-madder">{errors.studentMembershipIds.message}</p> : null}
      </fieldset>
      <label className="flex flex-col gap-1 text-sm font-bold text-walnut">
        Due date
        <input type="date" className={inputClass} aria-invalid={Boolean(errors.dueDate)} {...form.register("dueDate")} />
      </label>
      {errors.dueDate ? <p role="alert" className="text-sm text-madder">{errors.dueDate.message}</p> : null}
      <fieldset className="flex flex-col gap-2">
        <legend className="text-sm font-bold text-walnut">Tempo goal per drill (♩ per minute)</legend>
        {sheet.drills.map((d, i) => (
          <label key={d.id} className="flex items-center justify-between gap-3 text-sm">
            <span>{i + 1}. {d.title}</span>
            <input type="number" inputMode="numeric" className={`${inputClass} w-24`} aria-label={`Tempo goal for ${d.title}`} {...form.register(`tempoGoals.${d.id}`, { setValueAs: numberOrUndefined })} />
          </label>
        ))}
        {tempoMessages ? <p role="alert" className="text-sm text-madder">{tempoMessages}</p> : null}
      </fieldset>
      <label className="flex flex-col gap-1 text-sm font-bold text-walnut">
        Note to the students (optional)
        <textarea rows={2} className={inputClass} {...form.register("note")} />
      </label>
      {errors.note ? <p role="alert" className="text-sm text-madder">{errors.note.message}</p> : null}
      <Button type="submit" disabled={isSubmitting}>{isSubmitting ? "Assigning…" : "Assign and e-mail"}</Button>
    </form>
  );
}
