"use client";
import { useRouter } from "next/navigation";
import { startTransition, useActionState, useEffect, useRef } from "react";
import { Button } from "@/components/ui/button";
import { FormMessage } from "@/components/ui/field";
import { assignSheetFormAction } from "./actions";
import { tempoGoalName } from "./assignment-form-data";
import type { OverSpan } from "./student-fit";

const inputClass = "rounded-xl border border-line bg-card px-3 py-2 text-base outline-none focus:border-walnut";
/** Fields that show their own messages; any other field's message joins the form's message. */
const SHOWN = ["studentMembershipIds", "dueDate", "tempoGoals", "note"];

function FieldError({ messages }: { messages?: string[] }) {
  return messages?.length ? <p role="alert" className="text-sm text-madder">{messages.join(" ")}</p> : null;
}

/**
 * Assign one sheet to students with a due date and a tempo goal per drill. A plain form: the server
 * action checks it with the assignment schema and answers with a message per field.
 */
export function AssignForm({ sheet, students, today, overSpan = {} }: {
  sheet: { id: string; drills: { id: string; title: string; target: number | null }[] };
  students: { membershipId: string; name: string }[];
  today: string;
  /** Per student: the drills too wide for their hand (checked on the server). Assigning still works. */
  overSpan?: Record<string, OverSpan[]>;
}) {
  const router = useRouter();
  const formRef = useRef<HTMLFormElement>(null);
  const [result, submit, pending] = useActionState(assignSheetFormAction, null);
  const errors = result && !result.ok ? result.fieldErrors ?? {} : {};
  useEffect(() => {
    if (!result?.ok) return;
    formRef.current?.reset();
    router.refresh();
  }, [result, router]);

  function onSubmit(e: React.FormEvent<HTMLFormElement>) {
    // Dispatched by hand rather than through `action`, so the fields keep what was typed when the
    // server refuses it; the form is cleared only after a successful assignment.
    e.preventDefault();
    const form = new FormData(e.currentTarget);
    startTransition(() => submit(form));
  }

  const other = Object.entries(errors).filter(([k]) => !SHOWN.includes(k)).flatMap(([, m]) => m);
  const message = result
    ? result.ok
      ? {
          ok: true,
          text:
            `Assigned to ${result.data.ids.length} student${result.data.ids.length === 1 ? "" : "s"}; ` +
            (result.data.undelivered.length
              ? `the e-mail to ${result.data.undelivered.join(", ")} could not be sent and waits in the outbox — share the link from their sheet instead.`
              : "each got an e-mail with the link."),
        }
      : { ok: false, text: [result.message, ...other].join(" ") }
    : null;
  return (
    <form ref={formRef} onSubmit={onSubmit} className="flex flex-col gap-4" noValidate aria-label="Assign this sheet">
      {message ? (message.ok ? <p role="status" className="text-sm text-sage">{message.text}</p> : <FormMessage message={message.text} />) : null}
      <input type="hidden" name="sheetId" value={sheet.id} />
      <fieldset>
        <legend className="text-sm font-bold text-walnut">Students</legend>
        <div className="mt-1 flex flex-wrap gap-2">
          {students.map((s) => {
            const over = overSpan[s.membershipId] ?? [];
            return (
              <div key={s.membershipId} className="flex flex-col gap-1">
                <label className="flex items-center gap-1.5 rounded-full border border-line bg-card px-3 py-1.5 text-sm">
                  <input type="checkbox" name="studentMembershipIds" value={s.membershipId} /> {s.name}
                </label>
                {over.length > 0 ? (
                  <ul data-testid="student-over-span" aria-label={`Drills too wide for ${s.name}`} className="max-w-xs pl-3 text-xs text-madder">
                    {over.map((o) => <li key={o.drillId}>Too wide for {s.name}&apos;s hand: {o.label} ({o.stretches.join(", ")})</li>)}
                  </ul>
                ) : null}
              </div>
            );
          })}
        </div>
        {Object.values(overSpan).some((l) => l.length > 0) ? (
          <p className="mt-1 text-xs text-muted">You can still assign; those students see the warning on their sheet and handout.</p>
        ) : null}
        <FieldError messages={errors.studentMembershipIds} />
      </fieldset>
      <label className="flex flex-col gap-1 text-sm font-bold text-walnut">
        Due date
        <input type="date" name="dueDate" defaultValue={today} className={inputClass} aria-invalid={Boolean(errors.dueDate)} />
      </label>
      <FieldError messages={errors.dueDate} />
      <fieldset className="flex flex-col gap-2">
        <legend className="text-sm font-bold text-walnut">Tempo goal per drill (♩ per minute)</legend>
        {sheet.drills.map((d, i) => (
          <label key={d.id} className="flex items-center justify-between gap-3 text-sm">
            <span>{i + 1}. {d.title}</span>
            <input
              type="number"
              inputMode="numeric"
              name={tempoGoalName(d.id)}
              defaultValue={d.target ?? undefined}
              className={`${inputClass} w-24`}
              aria-label={`Tempo goal for ${d.title}`}
              aria-invalid={Boolean(errors.tempoGoals)}
            />
          </label>
        ))}
        <FieldError messages={errors.tempoGoals} />
      </fieldset>
      <label className="flex flex-col gap-1 text-sm font-bold text-walnut">
        Note to the students (optional)
        <textarea name="note" rows={2} className={inputClass} />
      </label>
      <FieldError messages={errors.note} />
      <Button type="submit" disabled={pending}>{pending ? "Assigning…" : "Assign and e-mail"}</Button>
    </form>
  );
}
